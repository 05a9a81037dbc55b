import type { StakeRow, TurnRow } from "~/lib/build-pack-rows";

type Pt = [number, number];

export type StakePlanData = {
  plan: { centre: Pt[]; left: Pt[]; right: Pt[]; boundary: Pt[] | null };
  datums: StakeRow[];
  turns: TurnRow[];
  jumps: { number: number; name: string; points: StakeRow[] }[];
  stations: StakeRow[];
};

/**
 * The marking-out plan drawn to scale from above: the site boundary, both track edges, the centre
 * line with its stations (some numbered), the datum stakes A and B and the line between them,
 * turn centres (+) and jump lips (squares), with a scale bar and the grid north arrow.
 */
export function StakePlan({ data, title }: { data: StakePlanData; title: string }) {
  const { plan, datums, turns, jumps } = data;
  const all: Pt[] = [
    ...plan.left,
    ...plan.right,
    ...(plan.boundary ?? []),
    ...datums.map((d): Pt => [d.x, d.y]),
    ...turns.map((t): Pt => [t.centre.x, t.centre.y]),
  ];
  const xs = all.map((p) => p[0]);
  const ys = all.map((p) => p[1]);
  const pad = 3;
  const minX = Math.min(...xs) - pad;
  const maxX = Math.max(...xs) + pad;
  const minY = Math.min(...ys) - pad;
  const maxY = Math.max(...ys) + pad;
  const w = maxX - minX;
  const h = maxY - minY;
  const fs = Math.max(w, h) / 60;
  const P = (x: number, y: number) => `${x.toFixed(2)},${(-y).toFixed(2)}`;
  const line = (pts: Pt[]) => pts.map(([x, y]) => P(x, y)).join(" ");
  const centres = data.stations.filter((s) => s.kind === "centre");
  const every = Math.max(1, Math.ceil(centres.length / 40));
  const bar = [500, 200, 100, 50, 20, 10, 5, 2].find((m) => m <= w / 5) ?? 1;
  const [a, b] = datums;
  return (
    <svg
      viewBox={`${minX.toFixed(2)} ${(-maxY).toFixed(2)} ${w.toFixed(2)} ${h.toFixed(2)}`}
      className="h-auto w-full rounded-lg border border-sand-200 bg-white print:max-h-[16cm]"
      style={{ maxHeight: "70vh" }}
      role="img"
      aria-label={`${title}: plan drawn to scale with datum stakes A and B, ${centres.length} stations, ${turns.length} turn centres and ${jumps.length} jumps`}
      fontFamily="Inter, sans-serif"
    >
      {plan.boundary ? (
        <polygon
          points={line(plan.boundary)}
          fill="none"
          stroke="var(--color-ink-300)"
          strokeDasharray="4 3"
          vectorEffect="non-scaling-stroke"
        />
      ) : null}
      {[plan.left, plan.right].map((edge, i) => (
        <polyline
          key={i}
          points={line(edge)}
          fill="none"
          stroke="var(--color-ink-500)"
          vectorEffect="non-scaling-stroke"
        />
      ))}
      <polyline
        points={line(plan.centre)}
        fill="none"
        stroke="var(--color-ink-900)"
        strokeDasharray="2 2"
        strokeWidth={0.7}
        vectorEffect="non-scaling-stroke"
      />
      {centres.map((s, i) => (
        <g key={s.id}>
          <circle cx={s.x} cy={-s.y} r={fs * 0.15} fill="var(--color-ink-900)" />
          {i % every === 0 ? (
            <text x={s.x + fs * 0.3} y={-s.y - fs * 0.3} fontSize={fs * 0.7} fill="var(--color-ink-700)">
              {s.id}
            </text>
          ) : null}
        </g>
      ))}
      {turns.map((t) => (
        <g key={t.number} stroke="var(--color-pine-700)" strokeWidth={fs * 0.08}>
          <path
            d={`M${t.centre.x - fs * 0.5} ${-t.centre.y} h${fs} M${t.centre.x} ${-t.centre.y - fs * 0.5} v${fs}`}
          />
          <text
            x={t.centre.x + fs * 0.5}
            y={-t.centre.y - fs * 0.3}
            fontSize={fs * 0.8}
            fill="var(--color-pine-700)"
            stroke="none"
          >
            T{t.number}
          </text>
        </g>
      ))}
      {jumps.map((j) => {
        const lip = j.points.find((p) => p.kind === "jump-lip") ?? j.points[0];
        return (
          <g key={j.number} fill="var(--color-clay-700)">
            <rect x={lip.x - fs * 0.35} y={-lip.y - fs * 0.35} width={fs * 0.7} height={fs * 0.7} />
            <text x={lip.x + fs * 0.5} y={-lip.y + fs * 1.1} fontSize={fs * 0.9} fontWeight={700}>
              J{j.number}
            </text>
          </g>
        );
      })}
      <line
        x1={a.x}
        y1={-a.y}
        x2={b.x}
        y2={-b.y}
        stroke="var(--color-clay-500)"
        strokeDasharray="6 3"
        strokeWidth={1.5}
        vectorEffect="non-scaling-stroke"
      />
      {[
        [a, "A"],
        [b, "B"],
      ].map(([d, name]) => {
        const p = d as StakeRow;
        return (
          <g key={name as string} fill="var(--color-clay-500)">
            <path d={`M${p.x} ${-p.y - fs * 0.8} l${fs * 0.7} ${fs * 1.2} h${-fs * 1.4} z`} />
            <text x={p.x + fs * 0.8} y={-p.y - fs * 0.5} fontSize={fs * 1.4} fontWeight={700}>
              {name as string}
            </text>
          </g>
        );
      })}
      <g stroke="var(--color-ink-900)" strokeWidth={fs * 0.12}>
        <line x1={minX + fs} y1={-minY - fs} x2={minX + fs + bar} y2={-minY - fs} />
        <text x={minX + fs} y={-minY - fs * 1.5} fontSize={fs} stroke="none" fill="var(--color-ink-900)">
          {bar} m
        </text>
        <line x1={maxX - fs * 1.5} y1={-maxY + fs * 4} x2={maxX - fs * 1.5} y2={-maxY + fs * 1.5} />
        <path
          d={`M${maxX - fs * 1.5} ${-maxY + fs * 0.8} l${fs * 0.5} ${fs * 1} h${-fs} z`}
          stroke="none"
          fill="var(--color-ink-900)"
        />
        <text
          x={maxX - fs * 3.2}
          y={-maxY + fs * 5.3}
          fontSize={fs * 0.9}
          stroke="none"
          fill="var(--color-ink-900)"
        >
          grid N
        </text>
      </g>
    </svg>
  );
}
