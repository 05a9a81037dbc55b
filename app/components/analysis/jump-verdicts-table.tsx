import { ERROR_WORDS, SKILL_LABELS, SKILL_LEVELS, verdictKind, type JumpAnalysis } from "~/analysis";
import { degrees, metres, percent, signedSeconds } from "./format";
import { VerdictMark } from "./verdict-mark";

/**
 * The verdict for each skill level with its numbers, the sentence for drivers, and the values that
 * decided it (smallest worthwhile gain and turn of the nose, the cost of a failed landing).
 */
export function JumpVerdictsTable({ jump }: { jump: JumpAnalysis }) {
  const any = jump.verdicts.club;
  const plan = jump.plan?.feasible ? jump.plan : null;
  return (
    <div className="space-y-2">
      <div className="overflow-x-auto rounded-lg border border-sand-200 bg-white">
        <table className="w-full min-w-[44rem] text-sm">
          <caption className="sr-only">Verdict per skill level</caption>
          <thead className="bg-sand-100 text-left text-ink-700">
            <tr>
              <th scope="col" className="px-3 py-2">
                Skill
              </th>
              <th scope="col" className="px-3 py-2">
                Verdict
              </th>
              <th scope="col" className="px-3 py-2">
                Nose turn
              </th>
              <th scope="col" className="px-3 py-2">
                Track saved
              </th>
              <th scope="col" className="px-3 py-2">
                Time saved
              </th>
              <th scope="col" className="px-3 py-2">
                Clean landings
              </th>
              <th scope="col" className="px-3 py-2">
                Expected gain
              </th>
              <th scope="col" className="px-3 py-2">
                Error that matters most
              </th>
            </tr>
          </thead>
          <tbody>
            {SKILL_LEVELS.map((level) => {
              const v = jump.verdicts[level];
              const kind = verdictKind(v);
              return (
                <tr key={level} className="border-t border-sand-200 align-top">
                  <th scope="row" className="px-3 py-2 text-left font-medium">
                    {SKILL_LABELS[level]}
                  </th>
                  <td className="px-3 py-2">
                    <VerdictMark kind={kind} className="font-medium" />
                    <span className="block text-xs text-ink-700">{v.text}</span>
                  </td>
                  <td className="px-3 py-2 tabular-nums">{plan ? degrees(v.noseTurnDeg, 1) : "\u2013"}</td>
                  <td className="px-3 py-2 tabular-nums">
                    {jump.plan?.feasible ? metres(v.trackLengthSaved) : "\u2013"}
                  </td>
                  <td className="px-3 py-2 tabular-nums">
                    {jump.plan?.feasible ? `${v.timeSaved.toFixed(2)} s` : "\u2013"}
                  </td>
                  <td className="px-3 py-2 tabular-nums">
                    {jump.plan?.feasible ? percent(v.successRate) : "\u2013"}
                  </td>
                  <td className="px-3 py-2 tabular-nums">
                    {jump.plan?.feasible ? signedSeconds(v.expectedGain) : "\u2013"}
                  </td>
                  <td className="px-3 py-2">{v.mainError ? ERROR_WORDS[v.mainError] : "\u2013"}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-500">
        A set-up is recommended only when it turns the nose at least {degrees(any.minNoseTurnDeg)} and the
        expected gain is at least {any.minGainPerPass.toFixed(2)} s a pass; a failed landing costs{" "}
        {any.failCost.toFixed(1)} s. The club may set its own values; the defaults are estimates.
      </p>
    </div>
  );
}
