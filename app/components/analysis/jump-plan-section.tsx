import {
  ERROR_WORDS,
  skillPhrase,
  VERDICT_WORDS,
  type JumpAnalysis,
  type JumpPlan,
  type SkillLevel,
} from "~/analysis";
import { degrees, percent } from "./format";
import { pitchAdvice } from "./pitch-advice";
import { planOwner } from "./plan-owner";
import { SteeringChart, type SteeringSeries } from "./steering-chart";
import { steeringWords } from "./steering-words";

const INFEASIBLE: Record<string, string> = {
  "no-wheel-spin": "the wheels are not spinning, so steering cannot turn the car",
  "not-enough-airtime": "the car is not in the air long enough to steer and straighten the wheels again",
  "no-useful-yaw": "no steering turns the nose toward the turn",
  "cannot-land-flat": "no steering turns it and still lands it flat",
  "levelling-costs-turn": "the pulse that levels the car leaves no turn",
};

const side = (deg: number) =>
  Math.abs(deg) < 0.5 ? "straight" : `${Math.abs(deg).toFixed(0)}° ${deg > 0 ? "left" : "right"}`;
const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** Whose plan this is, in one sentence for the chosen skill level. */
function OwnerLine({ jump: j, skill }: { jump: JumpAnalysis; skill: SkillLevel }) {
  const o = planOwner(j, skill);
  const who = skillPhrase(skill);
  const text =
    o.kind === "own"
      ? `The plan for ${who}: ${VERDICT_WORDS["set-up"].toLowerCase()} as below.`
      : o.kind === "other"
        ? `${cap(who)} should take it straight (${j.verdicts[skill].reasonText}). The plan below is the plan for ${skillPhrase(o.owner)}, shown only as such: not for ${who} to fly.`
        : `No skill level is told to fly this plan (${who}: ${j.verdicts[skill].reasonText}). It is the model's best plan, shown for reference only.`;
  return (
    <p className="rounded-md border border-sand-200 bg-sand-100 px-3 py-2 text-sm font-medium" role="note">
      {text}
    </p>
  );
}

/** What turning alone would give and what levelling the car costs. */
function TradeOff({ plan }: { plan: JumpPlan }) {
  const alone = plan.withoutLevelling;
  if (!alone) return null;
  const landing = plan.takeoffPitchDeg + plan.pitchChangeDeg;
  const off = alone.pitchDeg - landing;
  const middle = plan.tradeOff.slice(1, -1);
  return (
    <p className="text-sm text-ink-700">
      <span className="font-medium">Turn or level: </span>
      levelled, the nose turns {plan.feasible ? degrees(Math.abs(plan.yawDeg), 1) : "0\u00b0"}; without the
      pulse it would turn {degrees(Math.abs(alone.yawDeg))} but land {degrees(Math.abs(off))} nose-
      {off >= 0 ? "high" : "low"} (steering{" "}
      {alone.steering.map(([t, deg]) => `${side(deg)} from ${t.toFixed(2)} s`).join(", ")}).
      {middle.length
        ? ` In between (estimates): ${middle.map((m) => `${degrees(Math.abs(m.pitchChangeDeg))} of levelling leaves ${degrees(m.yawDeg)}`).join("; ")}.`
        : ""}
    </p>
  );
}

/** The chosen level's chance of a clean landing and the error that matters most. */
function Errors({ plan, skill }: { plan: JumpPlan; skill: SkillLevel }) {
  const main = plan.mainError[skill];
  return (
    <p className="text-sm text-ink-700">
      For {skillPhrase(skill)}: {percent(plan.successRate[skill])} clean landings with the usual errors
      (timing of the steering and of the pulse, and a takeoff speed that varies by about{" "}
      {plan.speedSigmas[skill].toFixed(2)} m/s).{" "}
      {main
        ? `The error that matters most on this jump: ${ERROR_WORDS[main]}; alone it leaves ${percent(plan.successAlone[main][skill])} clean.`
        : "None of them spoils a landing on its own."}
    </p>
  );
}

/** The mid-air set-up plan: whose it is, the steering chart and steps, the pitch advice, the errors. */
export function JumpPlanSection({
  jump: j,
  steering,
  skill = "club",
}: {
  jump: JumpAnalysis;
  steering: SteeringSeries | null;
  skill?: SkillLevel;
}) {
  const plan = j.plan;
  return (
    <section aria-labelledby="plan-heading" className="space-y-3">
      <h2 id="plan-heading" className="text-lg font-semibold">
        Mid-air set-up plan
      </h2>
      {!plan ? (
        <p className="text-sm text-ink-700">
          {j.whoops
            ? "No plan: a whoops row is skimmed or jumped through, not set up for a turn."
            : j.turn
              ? `No plan: ${j.verdicts[skill].reasonText}.`
              : "No plan: this jump does not land into a turn, so the car should land straight."}
        </p>
      ) : !plan.feasible ? (
        <>
          <p className="text-sm text-ink-700">
            No workable plan: {INFEASIBLE[plan.reason ?? ""] ?? plan.reason}.
          </p>
          <TradeOff plan={plan} />
        </>
      ) : (
        <>
          <OwnerLine jump={j} skill={skill} />
          <p className="text-sm text-ink-700">
            Lands with the nose turned {Math.abs(plan.yawDeg).toFixed(0)}° {j.turn?.side ?? ""} (aiming for{" "}
            {Math.abs(plan.targetYawDeg).toFixed(0)}°), rolled {Math.abs(plan.rollDeg).toFixed(1)}° (within{" "}
            {plan.rollToleranceDeg.toFixed(0)}°). Tightest timing window: {Math.round(plan.timingWindowMs)}{" "}
            ms.
          </p>
          <div className="space-y-1">
            <h3 className="text-sm font-semibold">In plain words</h3>
            <ol className="list-decimal space-y-1 pl-5 text-sm" aria-label="Steering timeline in plain words">
              {steeringWords(plan, j.airtime).map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ol>
          </div>
          {steering ? <SteeringChart plan={plan} series={steering} /> : null}
          <div className="overflow-x-auto">
            <table className="w-full text-sm">
              <caption className="text-left text-sm font-medium text-ink-700">
                Steering and pulse steps (what to command)
              </caption>
              <thead className="text-left text-ink-500">
                <tr>
                  <th scope="col" className="py-1 pr-6 font-medium">
                    From (s after takeoff)
                  </th>
                  <th scope="col" className="py-1 pr-6 font-medium">
                    Command
                  </th>
                  <th scope="col" className="py-1 font-medium">
                    Timing window
                  </th>
                </tr>
              </thead>
              <tbody>
                {steps(plan).map((row, i) => (
                  <tr key={i} className="border-t border-sand-200">
                    <td className="py-1 pr-6 tabular-nums">{row.t.toFixed(2)}</td>
                    <td className="py-1 pr-6">{row.what}</td>
                    <td className="py-1 tabular-nums">
                      {row.window
                        ? `${Math.round(row.window.earlyMs)} ms early to ${Math.round(row.window.lateMs)} ms late`
                        : "\u2013"}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="rounded-md bg-sand-100 px-3 py-2 text-sm">
            <span className="font-medium">Pitch: </span>
            {pitchAdvice(plan)}
          </p>
          <TradeOff plan={plan} />
          <Errors plan={plan} skill={skill} />
        </>
      )}
    </section>
  );
}

/** Steering switches and the pulse's press and release, in time order. */
function steps(plan: JumpPlan) {
  const rows = plan.steering.map(([t, deg]) => ({
    t,
    what: `Steer ${side(deg)}`,
    window: plan.switches.find((s) => Math.abs(s.t - t) < 1e-6),
  }));
  const p = plan.pitchPulse;
  if (p.kind !== "none" && p.duration > 0) {
    const word = p.kind === "brake" ? "brake" : "throttle";
    rows.push(
      { t: p.start, what: `Press the ${word} (${percent(p.strength)})`, window: plan.pulseSwitches[0] },
      { t: p.start + p.duration, what: `Release the ${word}`, window: plan.pulseSwitches[1] },
    );
  }
  return rows.sort((a, b) => a.t - b.t);
}
