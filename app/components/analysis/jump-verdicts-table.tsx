import { SKILL_LABELS, SKILL_LEVELS, verdictKind, type JumpAnalysis } from "~/analysis";
import { metres, percent, signedSeconds } from "./format";
import { VerdictMark } from "./verdict-mark";

/** The verdict for each skill level with its numbers and the sentence for drivers. */
export function JumpVerdictsTable({ jump }: { jump: JumpAnalysis }) {
  return (
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
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
