import type { SectionDiffKind } from "~/analysis";
import { extent } from "~/components/drawing/drawing-geometry";
import { PLAN } from "~/components/editor/colours";

type Line = { sectionId: string; kind: SectionDiffKind; points: [number, number][] };

/** How each kind of change is drawn: colour, dash and width, and the word in the legend. */
const STYLE: Record<SectionDiffKind, { stroke: string; dash?: string; width: number; word: string }> = {
  same: { stroke: "var(--color-ink-300)", width: 1, word: "unchanged" },
  changed: { stroke: "var(--color-clay-500)", width: 2, dash: "4 2", word: "changed" },
  added: { stroke: "var(--color-pine-700)", width: 2.2, word: "added" },
  removed: { stroke: "var(--color-danger-700)", width: 1.6, dash: "1.5 2", word: "removed (older version)" },
};

/**
 * Both versions' centre lines from above, to scale: unchanged sections thin and grey, changed ones
 * dashed, added ones thick, removed ones (from the older version) dotted; each changed, added or
 * removed section carries its number from the list beside the drawing, so colour is never the only
 * signal.
 */
export function CompareDrawing({
  lines,
  numbers,
  title,
}: {
  lines: Line[];
  /** The list number of each changed, added or removed section, by section id. */
  numbers: Record<string, number>;
  title: string;
}) {
  const box = extent(
    lines.flatMap((l) => l.points),
    4,
  );
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY;
  const unit = Math.max(w, h) / 200;
  const order: SectionDiffKind[] = ["same", "removed", "changed", "added"];
  return (
    <figure className="space-y-2">
      <svg
        viewBox={`${box.minX.toFixed(2)} ${(-box.maxY).toFixed(2)} ${w.toFixed(2)} ${h.toFixed(2)}`}
        className="h-auto w-full rounded-lg border border-sand-200"
        style={{ background: PLAN.paper, maxHeight: "60vh" }}
        role="img"
        aria-label={`${title}: the two versions' centre lines with the changed, added and removed sections numbered as in the list`}
        fontFamily="Inter, sans-serif"
      >
        {order.flatMap((kind) =>
          lines
            .filter((l) => l.kind === kind)
            .map((l) => (
              <polyline
                key={`${kind}-${l.sectionId}`}
                points={l.points.map(([x, y]) => `${x},${-y}`).join(" ")}
                fill="none"
                stroke={STYLE[kind].stroke}
                strokeWidth={STYLE[kind].width * unit}
                strokeDasharray={STYLE[kind].dash
                  ?.split(" ")
                  .map((d) => Number(d) * unit)
                  .join(" ")}
                strokeLinecap="round"
              />
            )),
        )}
        {lines
          .filter((l) => numbers[l.sectionId] !== undefined)
          .map((l) => {
            const [x, y] = l.points[Math.floor(l.points.length / 2)];
            return (
              <g key={`n-${l.kind}-${l.sectionId}`}>
                <circle
                  cx={x}
                  cy={-y}
                  r={3.2 * unit}
                  fill="white"
                  stroke={STYLE[l.kind].stroke}
                  strokeWidth={0.6 * unit}
                />
                <text
                  x={x}
                  y={-y}
                  fontSize={3.4 * unit}
                  textAnchor="middle"
                  dominantBaseline="central"
                  fill="var(--color-ink-900)"
                >
                  {numbers[l.sectionId]}
                </text>
              </g>
            );
          })}
      </svg>
      <figcaption>
        <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink-700" aria-label="Legend">
          {order.map((kind) => (
            <li key={kind} className="inline-flex items-center gap-2">
              <svg width="32" height="8" aria-hidden="true">
                <line
                  x1="2"
                  y1="4"
                  x2="30"
                  y2="4"
                  stroke={STYLE[kind].stroke}
                  strokeWidth={STYLE[kind].width * 1.5}
                  strokeDasharray={STYLE[kind].dash
                    ?.split(" ")
                    .map((d) => Number(d) * 1.5)
                    .join(" ")}
                />
              </svg>
              {STYLE[kind].word}
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
