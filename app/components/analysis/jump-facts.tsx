import { WHOOPS_WORDS, type JumpAnalysis, type JumpWhoops } from "~/analysis";
import { degrees, metres, seconds, speed } from "./format";

const range = (w: JumpWhoops["doubles"]) =>
  w.window
    ? `${w.window.min.toFixed(1)} to ${w.window.max.toFixed(1)} m/s, ${w.jumps} jumps a pass`
    : "out of reach";

/** A whoops row's ways through it and the speed each needs. */
function whoopsRows(w: JumpWhoops): [string, string][] {
  return [
    ["Way through at this approach", `${WHOOPS_WORDS[w.technique]} (${speed(w.speed)})`],
    ["Skimming over the tops needs", speed(w.skimSpeed)],
    ["Jumping through in doubles", range(w.doubles)],
    ["Jumping through in triples", w.triples ? range(w.triples) : "row too short"],
    [
      "One hop of the chosen way",
      w.technique === "roll"
        ? "no flight: the wheels follow the bumps"
        : `${seconds(w.airtime)} in the air, equivalent fall height ${metres(w.equivalentFallHeight)}`,
    ],
  ];
}

const LANDED: Record<string, string> = {
  short: "short of the ramp (cases the jump)",
  ramp: "on the landing ramp",
  overshoot: "past the ramp (overshoot)",
};

/** The jump's numbers at the planned takeoff speed, each with its unit. */
export function JumpFacts({ jump: j }: { jump: JumpAnalysis }) {
  if (j.whoops)
    return (
      <FactList rows={[["Most the approach allows", speed(j.approachMaxSpeed)], ...whoopsRows(j.whoops)]} />
    );
  const rows: [string, string][] = [
    [
      "Planned takeoff speed",
      j.flownOverBy ? `none: flown over from ${j.flownOverBy}` : speed(j.takeoffSpeed),
    ],
    ["Most the approach allows", speed(j.approachMaxSpeed)],
    [
      "Speed window",
      j.window
        ? `${j.window.min.toFixed(1)} to ${j.window.max.toFixed(1)}${j.window.maxIsSearchLimit ? " or more" : ""} m/s (slower cases it, faster overshoots)`
        : "none: the landing cannot be reached",
    ],
    ["Face angle at the lip", degrees(j.faceAngleDeg)],
    ["Airtime", seconds(j.airtime)],
    [
      "Apex",
      j.apex ? `${metres(j.apex.z)} high, ${metres(j.apex.d)} along, at ${seconds(j.apex.t)}` : "\u2013",
    ],
    [
      "Landing point",
      j.landing ? `${metres(j.landing.d)} along the jump, ${LANDED[j.landing.landedOn]}` : "\u2013",
    ],
    ["Landing speed", j.landing ? speed(j.landing.speed) : "\u2013"],
    [
      "Speed into the ground",
      j.landing
        ? `${j.landing.normalSpeed.toFixed(2)} m/s (path ${degrees(j.landing.flightPathDeg)}, ramp ${degrees(j.landing.surfaceSlopeDeg)})`
        : "\u2013",
    ],
    ["Equivalent fall height (EFH)", metres(j.equivalentFallHeight)],
    [
      "Turn it lands into",
      j.turn
        ? `${j.turn.side} turn of ${degrees(j.turn.angleDeg)}, radius ${metres(j.turn.radius)}, ${metres(j.turn.distance)} after touchdown (entry ${j.turn.entrySpeed.toFixed(1)} m/s)`
        : j.nextTurnDistance !== null
          ? `none within reach (next turn ${metres(j.nextTurnDistance)} after touchdown)`
          : "none",
    ],
  ];
  return <FactList rows={rows} />;
}

function FactList({ rows }: { rows: [string, string][] }) {
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[auto_1fr]">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-500">{term}</dt>
          <dd className="tabular-nums text-ink-900">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
