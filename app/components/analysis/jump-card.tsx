import { Link } from "react-router";
import { REASON_TEXT, verdictKind, type JumpAnalysis, type SkillLevel } from "~/analysis";
import { jumpName, metres, percent, seconds, signedSeconds, speedShort } from "./format";
import { VerdictMark } from "./verdict-mark";

/** The speed window as the table and the card write it: "5.1–6.8 m/s", "none". */
export function windowText(j: JumpAnalysis): string {
  if (!j.window) return "none";
  return `${speedShort(j.window.min)}\u2013${speedShort(j.window.max)}${j.window.maxIsSearchLimit ? "+" : ""} m/s`;
}

/** What the jump lands into, in a few words: "left turn 180° 1.5 m after touchdown". */
export function landsIntoText(j: JumpAnalysis): string {
  if (j.turn)
    return `${j.turn.side} turn ${Math.round(j.turn.angleDeg)}° ${metres(j.turn.distance)} after touchdown`;
  return `no turn${j.nextTurnDistance !== null ? ` (next in ${metres(j.nextTurnDistance)})` : ""}`;
}

/**
 * One jump as a card for a phone: its number as on the plan, the verdict first (mark, word and
 * reason), then takeoff speed, speed window, airtime, landing hardness and what it lands into. The
 * whole card links to the jump's page.
 */
export function JumpCard({
  jump: j,
  number,
  skill,
  href,
}: {
  jump: JumpAnalysis;
  number: number;
  skill: SkillLevel;
  href: string;
}) {
  const v = j.verdicts[skill];
  const flown = j.flownOverBy !== null;
  const facts: [string, string][] = [
    ["Takeoff", flown ? REASON_TEXT["flown-over"] : `${speedShort(j.takeoffSpeed)} m/s`],
    ["Speed window", windowText(j)],
    ["Airtime", flown ? "\u2013" : seconds(j.airtime)],
    ["Landing (EFH)", flown ? "\u2013" : metres(j.equivalentFallHeight)],
    ["Lands into", landsIntoText(j)],
  ];
  if (j.plan?.feasible)
    facts.push(["Expected gain", `${signedSeconds(v.expectedGain)} (${percent(v.successRate)} clean)`]);
  return (
    <li className="min-w-0">
      <Link
        to={href}
        className="block h-full rounded-lg border border-sand-200 bg-white p-3 hover:border-pine-600 focus-visible:border-pine-600"
        data-testid="jump-card"
      >
        <p className="flex items-baseline gap-2">
          <span className="rounded bg-ink-900 px-1.5 py-0.5 text-sm font-semibold text-white tabular-nums">
            J{number}
          </span>
          <VerdictMark kind={verdictKind(v)} size={16} className="text-base font-semibold" />
        </p>
        <p className="mt-1 text-sm text-ink-700">{v.reasonText}</p>
        <p className="mt-1 truncate text-sm font-medium text-pine-700">{jumpName(j)}</p>
        <dl className="mt-2 grid grid-cols-2 gap-x-3 gap-y-1 text-sm">
          {facts.map(([term, value]) => (
            <div key={term} className={`min-w-0 ${term === "Lands into" ? "col-span-2" : ""}`}>
              <dt className="text-xs text-ink-500">{term}</dt>
              <dd className="tabular-nums">{value}</dd>
            </div>
          ))}
        </dl>
      </Link>
    </li>
  );
}

/** The jumps in lap order as cards (one column on a phone, more on wider screens). */
export function JumpCards({
  jumps,
  numbers,
  skill,
  jumpHref,
}: {
  jumps: JumpAnalysis[];
  numbers: Record<string, number>;
  skill: SkillLevel;
  jumpHref: (sectionId: string) => string;
}) {
  return (
    <ol className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3" aria-label="Jumps in lap order">
      {[...jumps]
        .sort((a, b) => numbers[a.sectionId] - numbers[b.sectionId])
        .map((j) => (
          <JumpCard
            key={j.sectionId}
            jump={j}
            number={numbers[j.sectionId]}
            skill={skill}
            href={jumpHref(j.sectionId)}
          />
        ))}
    </ol>
  );
}
