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
    <>
      <PointCards plan={plan} />
      <div className="hidden overflow-x-auto rounded-lg border border-sand-200 bg-white sm:block print:block">
        <table className="risk-points w-full min-w-[44rem] text-sm print:min-w-0">
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
    </>
  );
}

/** On a phone: one card per point, the column titles as labels (not printed: paper gets the table). */
function PointCards({ plan }: { plan: Pick<MarshalPlan, "points" | "hotspots"> }) {
  const rows = pointRows(plan);
  return (
    <ol className="space-y-3 sm:hidden print:hidden" aria-label="Marshal points">
      {rows.map((row, i) => (
        <li key={row.point} className="rounded-lg border border-sand-200 bg-white p-3 text-sm">
          <h3 className="font-semibold">{row.point}</h3>
          <dl className="mt-1 space-y-1">
            {POINT_COLUMNS.slice(1).map((c) => (
              <div key={c.id}>
                <dt className="text-xs font-medium text-ink-500">{c.title}</dt>
                <dd
                  className={
                    c.id === "warnings" && plan.points[i].warnings.length ? "font-medium text-danger-700" : ""
                  }
                >
                  {row[c.id]}
                </dd>
              </div>
            ))}
          </dl>
        </li>
      ))}
    </ol>
  );
}
