import type { SheetColumn } from "~/lib/build-pack-rows";

/** A plain table of one of the sheets (the same columns and cells as the PDF). */
export function SheetTable({
  caption,
  columns,
  rows,
}: {
  caption: string;
  columns: SheetColumn[];
  rows: string[][];
}) {
  return (
    <div className="overflow-x-auto print:overflow-visible">
      <table className="w-full border-collapse text-sm print:text-[8pt]">
        <caption className="mb-2 text-left text-base font-semibold">{caption}</caption>
        <thead>
          <tr className="border-b border-ink-700">
            {columns.map((c) => (
              <th
                key={c.title}
                scope="col"
                className={`px-2 py-1 font-semibold ${c.right ? "text-right" : "text-left"}`}
              >
                {c.title}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((cells, r) => (
            <tr key={r} className="border-b border-sand-200 even:bg-sand-50 print:break-inside-avoid">
              {cells.map((cell, i) => {
                const Cell = i === 0 ? "th" : "td";
                return (
                  <Cell
                    key={i}
                    scope={i === 0 ? "row" : undefined}
                    className={`px-2 py-0.5 font-normal ${columns[i].right ? "text-right tabular-nums" : "text-left"}`}
                  >
                    {cell}
                  </Cell>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
