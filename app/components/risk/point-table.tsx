import type { MarshalPlan } from "~/analysis";
import { POINT_COLUMNS, pointRows } from "~/lib/risk-sheet-rows";

/** The marshal points, one row each: stretch and place, what to watch, jumps and turns, warnings. */
export function PointTable({ plan }: { plan: Pick<MarshalPlan, "points" | "hotspots"> }) {
  const rows = pointRows(plan);
  if (!rows.length)
    return (
      <p className="text-sm text-ink-700">
        This version has no marshal points. The race director places them in the editor (or asks for a
        suggested set) and publishes the layout again.
      </p>
    );
  return (
    <div className="overflow-x-auto rounded-lg border border-sand-200 bg-white">
      <table className="w-full min-w-[44rem] text-sm">
        <caption className="sr-only">Marshal points and what each one watches</caption>
        <thead className="bg-sand-100 text-left text-ink-700">
          <tr>
            {POINT_COLUMNS.map((c) => (
              <th key={c.id} scope="col" className="px-3 py-2 align-bottom">
                {c.title}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {plan.points.map((p, i) => {
            const row = rows[i];
            const warned = p.warnings.length > 0;
            return (
              <tr key={p.id} className="border-t border-sand-200 align-top">
                <th scope="row" className="px-3 py-2 text-left font-semibold">
                  {row.point}
                </th>
                <td className="px-3 py-2">{row.stretch}</td>
                <td className="px-3 py-2">{row.watch}</td>
                <td className="px-3 py-2">{row.marks}</td>
                <td className={`px-3 py-2 ${warned ? "font-medium text-danger-700" : "text-ink-500"}`}>
                  {warned ? <span aria-hidden="true">⚠ </span> : null}
                  {row.warnings}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
