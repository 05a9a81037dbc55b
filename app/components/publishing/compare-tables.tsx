import {
  JUMP_PRESET_LABELS,
  type ClassComparison,
  type FieldDiff,
  type LayoutSection,
  type SectionDiff,
} from "~/analysis";
import { VerdictMark } from "~/components/analysis/verdict-mark";

const METRES = new Set([
  "length",
  "radius",
  "faceHeight",
  "tableLength",
  "gap",
  "landingHeight",
  "deckLength",
  "bumpHeight",
  "spacing",
  "trackWidth",
]);

/** A field's value in plain words: metres and degrees with their unit, lists and shapes as "…". */
export function valueText(field: string, v: unknown): string {
  if (v === undefined || v === null) return "none";
  if (typeof v === "number")
    return field.endsWith("Deg") ? `${v}°` : METRES.has(field) ? `${v} m` : String(v);
  if (typeof v === "string" || typeof v === "boolean") return String(v);
  if (Array.isArray(v) && v.every((x) => typeof x === "string")) return v.join(", ");
  return "its shape";
}

/** A section in a few words: "Turn right 90°, radius 6 m", "Tabletop 'Back table'". */
export function sectionWords(s: LayoutSection): string {
  const name = s.name ? ` "${s.name}"` : "";
  if (s.kind === "straight") return `Straight${name}, ${s.length} m`;
  if (s.kind === "turn") return `Turn${name} ${s.direction} ${s.angleDeg}°, radius ${s.radius} m`;
  return `${JUMP_PRESET_LABELS[s.preset]}${name}`;
}

const KIND_WORDS = { added: "Added", removed: "Removed", changed: "Changed" } as const;

function changeText(f: FieldDiff): string {
  const from = valueText(f.field, f.from);
  const to = valueText(f.field, f.to);
  return from === "its shape" || to === "its shape" ? `${f.field} changed` : `${f.field} ${from} → ${to}`;
}

/** The numbered list of added, removed and changed sections (numbers as on the drawing). */
export function SectionChangesList({
  changes,
  numbers,
}: {
  changes: SectionDiff[];
  numbers: Record<string, number>;
}) {
  const shown = changes.filter((c) => c.kind !== "same");
  if (!shown.length) return <p className="text-sm text-ink-700">No section was added, removed or changed.</p>;
  return (
    <ol className="space-y-1 text-sm" aria-label="Changed sections">
      {shown.map((c) => {
        const s = (c.to ?? c.from)!;
        const where = c.toIndex !== null ? `section ${c.toIndex + 1}` : `was section ${c.fromIndex! + 1}`;
        return (
          <li key={`${c.kind}-${c.sectionId}`} className="flex gap-2">
            <span className="w-6 shrink-0 text-right font-semibold tabular-nums">
              {numbers[c.sectionId]}.
            </span>
            <span>
              <strong>{KIND_WORDS[c.kind as keyof typeof KIND_WORDS]}</strong>: {sectionWords(s)} ({where})
              {c.fields.length ? ` · ${c.fields.map(changeText).join("; ")}` : ""}
            </span>
          </li>
        );
      })}
    </ol>
  );
}

/** Layout-wide changes (name, width, start, stand, marshal points, classes, ...). */
export function LayoutChangesList({ changes }: { changes: FieldDiff[] }) {
  if (!changes.length) return null;
  return (
    <ul className="list-disc space-y-1 pl-5 text-sm" aria-label="Other changes">
      {changes.map((f) => (
        <li key={f.field}>{changeText(f)}</li>
      ))}
    </ul>
  );
}

const num = (v: number | null, digits: number, unit: string) =>
  v === null ? "–" : `${v.toFixed(digits)}${unit ? ` ${unit}` : ""}`;
function moved(from: number | null, to: number | null, digits: number, unit: string) {
  if (from === null || to === null) return `${num(from, digits, unit)} → ${num(to, digits, unit)}`;
  const d = to - from;
  const sign = d > 0 ? "+" : d < 0 ? "\u2212" : "±";
  return `${num(from, digits, unit)} → ${num(to, digits, unit)} (${sign}${Math.abs(d).toFixed(digits)})`;
}

/** One car class: lap time and speeds in both versions, and each jump's verdict moving. */
export function ClassComparisonTable({
  c,
  numbers,
}: {
  c: ClassComparison;
  numbers: Record<string, number>;
}) {
  return (
    <section aria-labelledby={`cmp-${c.classId}`} className="space-y-2">
      <h3 id={`cmp-${c.classId}`} className="font-semibold">
        {c.label}
      </h3>
      <p className="text-sm text-ink-700">
        Lap time {moved(c.lapTime.from, c.lapTime.to, 2, "s")} · top speed{" "}
        {moved(c.speed.from?.max ?? null, c.speed.to?.max ?? null, 1, "m/s")} · mean speed{" "}
        {moved(c.speed.from?.mean ?? null, c.speed.to?.mean ?? null, 1, "m/s")}
      </p>
      <div className="overflow-x-auto rounded-lg border border-sand-200 bg-white">
        <table className="w-full min-w-[40rem] text-sm">
          <thead className="bg-sand-100 text-left text-ink-700">
            <tr>
              <th scope="col" className="px-3 py-2 font-medium">
                Jump
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Older version
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Newer version
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Takeoff m/s
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Airtime s
              </th>
            </tr>
          </thead>
          <tbody>
            {c.jumps.map((j) => (
              <tr
                key={j.sectionId}
                className="border-t border-sand-200"
                data-testid={`verdict-move-${j.sectionId}`}
              >
                <th scope="row" className="px-3 py-2 text-left font-normal">
                  {numbers[j.sectionId] ? `J${numbers[j.sectionId]} ` : ""}
                  {j.name ?? j.sectionId}
                  {j.from !== j.to ? <strong className="ml-2">moved</strong> : null}
                </th>
                <td className="px-3 py-2">
                  {j.from ? <VerdictMark kind={j.from} size={14} /> : "not there"}
                </td>
                <td className="px-3 py-2">{j.to ? <VerdictMark kind={j.to} size={14} /> : "not there"}</td>
                <td className="px-3 py-2 tabular-nums">
                  {moved(j.takeoffSpeed.from, j.takeoffSpeed.to, 1, "")}
                </td>
                <td className="px-3 py-2 tabular-nums">{moved(j.airtime.from, j.airtime.to, 2, "")}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
