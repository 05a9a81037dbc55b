import { isLoopClosed } from "~/analysis";
import type { SummaryData } from "./summary-data";
import { degrees, metres, seconds, speed } from "./format";

/**
 * The layout's summary: lap length, closure, and per car class the lap time, speeds and the jumps
 * the approach is too short to clear. Every figure is a model estimate (the note says so).
 */
export function AnalysisSummary({ analysis }: { analysis: SummaryData }) {
  const closed = isLoopClosed(analysis.closure);
  return (
    <section aria-labelledby="summary-heading" className="space-y-3">
      <h2 id="summary-heading" className="text-lg font-semibold">
        Summary
      </h2>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Fact term="Lap length" value={metres(analysis.lapLength)} />
        <Fact term="Track width" value={metres(analysis.trackWidth)} />
        <Fact
          term="Loop closure"
          value={
            closed
              ? "Closed"
              : `${metres(analysis.closure.gap)} gap, ${degrees(analysis.closure.headingDeg, 1)} off`
          }
          warn={!closed}
        />
        <Fact term="Start straight" value={metres(analysis.startStraight.length)} />
      </dl>
      <div className="overflow-x-auto rounded-lg border border-sand-200 bg-white">
        <table className="w-full min-w-[34rem] text-sm">
          <caption className="px-3 pt-2 text-left text-sm font-medium text-ink-700">
            Lap time per car class (estimate)
          </caption>
          <thead className="text-left text-ink-500">
            <tr>
              <th scope="col" className="px-3 py-2 font-medium">
                Class
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Lap time
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Top speed
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Slowest point
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Jumps it cannot clear
              </th>
            </tr>
          </thead>
          <tbody>
            {analysis.classes.map((c) => (
              <tr key={c.classId} className="border-t border-sand-200">
                <th scope="row" className="px-3 py-2 text-left font-medium">
                  {c.label}
                </th>
                <td className="px-3 py-2 tabular-nums">{seconds(c.lapTime)}</td>
                <td className="px-3 py-2 tabular-nums">{speed(c.speed.max)}</td>
                <td className="px-3 py-2 tabular-nums">{speed(c.speed.min)}</td>
                <td className="px-3 py-2">{c.cannotClear.length ? c.cannotClear.join(", ") : "none"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {analysis.classes.some((c) => c.tightTurns.length) ? (
        <p className="text-sm text-danger-700" role="note">
          Turns tighter than a car can steer:{" "}
          {analysis.classes
            .flatMap((c) =>
              c.tightTurns.map(
                (t) => `${t.sectionId} (${metres(t.radius)} radius; ${c.label} needs ${metres(t.minRadius)})`,
              ),
            )
            .join("; ")}
          .
        </p>
      ) : null}
      <p className="text-sm text-ink-500">{analysis.note}</p>
    </section>
  );
}

function Fact({ term, value, warn = false }: { term: string; value: string; warn?: boolean }) {
  return (
    <div className="rounded-lg border border-sand-200 bg-white px-3 py-2">
      <dt className="text-xs text-ink-500">{term}</dt>
      <dd className={`text-lg font-semibold tabular-nums ${warn ? "text-danger-700" : "text-ink-900"}`}>
        {value}
      </dd>
    </div>
  );
}
