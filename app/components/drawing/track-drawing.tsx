import { PLAN } from "~/components/editor/colours";
import type { AnalysisOverlay } from "~/analysis";
import type { LayoutDocument } from "~/analysis";
import { binStyle, SPEED_BINS, speedRuns } from "~/lib/editor/speed-scale";
import { extent, speedLabels } from "./drawing-geometry";
import { DrawingLegend } from "./drawing-legend";
import { VERDICT_MARK_OUTLINE, VERDICT_MARKS } from "~/lib/verdict-marks";

type Site = Pick<LayoutDocument, "driverStand" | "marshalPoints" | "siteBoundary" | "trackWidth">;

type Props = {
  overlay: AnalysisOverlay;
  site: Site;
  /** Jump numbers in track order (J1, ...) and names, by section id. */
  numbers: Record<string, number>;
  names: Record<string, string>;
  jumpHref: (sectionId: string) => string;
  title: string;
  classLabel: string;
};

/**
 * The layout drawn to scale from above: the track band, the centre line coloured and widened by
 * the speed of the chosen class, speeds printed at each corner and straight, jump marks whose shape
 * gives the verdict (each a link to the jump's page), the driver stand, marshal points, the site
 * boundary, stretches hidden from the stand and lanes that come too close.
 */
export function TrackDrawing({ overlay, site, numbers, names, jumpHref, title, classLabel }: Props) {
  const { line, speedRange } = overlay;
  const pts: [number, number][] = line.x.map((x, i) => [x, line.y[i]]);
  const others: [number, number][] = [
    ...(site.siteBoundary ?? []).map((p) => [p[0], p[1]] as [number, number]),
    ...site.marshalPoints.map((m) => [m.x, m.y] as [number, number]),
    ...(site.driverStand ? [[site.driverStand.x, site.driverStand.y] as [number, number]] : []),
  ];
  const box = extent([...pts, ...others], site.trackWidth + 2);
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY;
  const fs = Math.max(w, h) / 55;
  const P = (x: number, y: number) => `${x.toFixed(2)},${(-y).toFixed(2)}`;
  const poly = (from: number, to: number) =>
    pts
      .slice(from, to + 1)
      .map(([x, y]) => P(x, y))
      .join(" ");
  const runs = speedRuns(line.speed, speedRange.min, speedRange.max, SPEED_BINS);
  const labels = speedLabels(line.speed, 1, Math.max(10, Math.round(pts.length / 14)));
  const start = startMark(pts, site.trackWidth);
  const halo = {
    paintOrder: "stroke" as const,
    stroke: PLAN.paper,
    strokeWidth: fs * 0.25,
    strokeLinejoin: "round" as const,
  };
  return (
    <figure className="space-y-3">
      <svg
        viewBox={`${box.minX.toFixed(2)} ${(-box.maxY).toFixed(2)} ${w.toFixed(2)} ${h.toFixed(2)}`}
        className="h-auto w-full rounded-lg border border-sand-200"
        style={{ background: PLAN.paper, maxHeight: "70vh" }}
        role="group"
        aria-label={`${title}: plan drawn to scale, ${overlay.jumps.length} jumps marked`}
        fontFamily="Inter, sans-serif"
      >
        {site.siteBoundary ? (
          <polygon
            points={site.siteBoundary.map((p) => P(p[0], p[1])).join(" ")}
            fill="none"
            stroke={PLAN.boundary}
            strokeWidth={1}
            strokeDasharray="4 3"
            vectorEffect="non-scaling-stroke"
          />
        ) : null}
        <polyline
          points={poly(0, pts.length - 1)}
          fill="none"
          stroke={PLAN.band}
          strokeWidth={site.trackWidth}
          strokeLinejoin="round"
        />
        {overlay.hidden.map((hs, i) => (
          <polyline
            key={`h${i}`}
            points={hs.points.map(([x, y]) => P(x, y)).join(" ")}
            fill="none"
            stroke={PLAN.hidden}
            strokeOpacity={0.45}
            strokeWidth={site.trackWidth * 0.9}
            strokeDasharray={`${fs * 0.4} ${fs * 0.4}`}
          />
        ))}
        {runs.map((r, i) => {
          const s = binStyle(r.bin, SPEED_BINS);
          return (
            <polyline
              key={i}
              points={poly(r.from, r.to)}
              fill="none"
              stroke={s.colour}
              strokeWidth={s.width}
              strokeLinecap="round"
              strokeLinejoin="round"
              vectorEffect="non-scaling-stroke"
            />
          );
        })}
        {overlay.laneConflicts.map((c, i) => (
          <g key={`c${i}`}>
            <line
              x1={c.a[0]}
              y1={-c.a[1]}
              x2={c.b[0]}
              y2={-c.b[1]}
              stroke={PLAN.conflict}
              strokeWidth={2}
              vectorEffect="non-scaling-stroke"
            />
            <text
              x={(c.a[0] + c.b[0]) / 2}
              y={-(c.a[1] + c.b[1]) / 2}
              fontSize={fs * 0.8}
              fill={PLAN.conflict}
              {...halo}
            >
              {c.distance.toFixed(1)} m apart
            </text>
          </g>
        ))}
        <path d={start} fill="none" stroke={PLAN.text} strokeWidth={2} vectorEffect="non-scaling-stroke" />
        <text
          x={pts[0][0]}
          y={-pts[0][1] + site.trackWidth + fs}
          fontSize={fs}
          textAnchor="middle"
          fill={PLAN.text}
          {...halo}
        >
          Start
        </text>
        {labels.map((l) => (
          <text
            key={l.index}
            x={pts[l.index][0] + fs * 0.5}
            y={-pts[l.index][1] + fs * 1.2}
            fontSize={fs * 0.85}
            fill={PLAN.text}
            {...halo}
          >
            {l.kind === "min" ? "\u25bc" : "\u25b2"}
            {l.speed.toFixed(1)}
          </text>
        ))}
        {site.driverStand ? (
          <g>
            <rect
              x={site.driverStand.x - fs * 0.6}
              y={-site.driverStand.y - fs * 0.6}
              width={fs * 1.2}
              height={fs * 1.2}
              fill={PLAN.stand}
            />
            <text
              x={site.driverStand.x}
              y={-site.driverStand.y + fs * 1.8}
              fontSize={fs}
              textAnchor="middle"
              fill={PLAN.text}
              {...halo}
            >
              Driver stand
            </text>
          </g>
        ) : null}
        {site.marshalPoints.map((m, i) => (
          <g key={`m${i}`} transform={`translate(${m.x} ${-m.y})`}>
            <path
              d={`M 0 ${-fs * 0.6} L ${fs * 0.6} 0 L 0 ${fs * 0.6} L ${-fs * 0.6} 0 Z`}
              fill={PLAN.marshal}
            />
            <text x={fs * 0.8} y={fs * 0.35} fontSize={fs * 0.8} fill={PLAN.text} {...halo}>
              M{i + 1}
            </text>
          </g>
        ))}
        {overlay.jumps.map((j) => {
          const r = fs * 0.75;
          const n = numbers[j.sectionId];
          return (
            <a
              key={j.sectionId}
              href={jumpHref(j.sectionId)}
              aria-label={`J${n} ${names[j.sectionId] ?? j.sectionId}: ${j.label}`}
            >
              {j.landing ? (
                <line
                  x1={j.lip[0]}
                  y1={-j.lip[1]}
                  x2={j.landing[0]}
                  y2={-j.landing[1]}
                  stroke={PLAN.verdict[j.verdict]}
                  strokeWidth={2}
                  strokeDasharray="3 2"
                  vectorEffect="non-scaling-stroke"
                />
              ) : null}
              <path
                d={VERDICT_MARKS[j.verdict].path}
                transform={`translate(${j.lip[0]} ${-j.lip[1]}) scale(${r})`}
                fill={PLAN.verdict[j.verdict]}
                stroke="white"
                strokeWidth={VERDICT_MARK_OUTLINE}
              />
              <text
                x={j.lip[0]}
                y={-j.lip[1] - r * 1.5}
                fontSize={fs * 0.9}
                fontWeight={600}
                textAnchor="middle"
                fill={PLAN.text}
                {...halo}
              >
                J{n}
              </text>
            </a>
          );
        })}
      </svg>
      <figcaption className="space-y-3">
        <p className="text-sm text-ink-700">
          Drawn to scale from above for the {classLabel}: lap {overlay.lapLength.toFixed(0)} m, speeds from{" "}
          {speedRange.min.toFixed(1)} to {speedRange.max.toFixed(1)} m/s (model estimate).
        </p>
        <DrawingLegend
          min={speedRange.min}
          max={speedRange.max}
          bins={SPEED_BINS}
          hidden={overlay.hidden.length > 0}
          conflicts={overlay.laneConflicts.length > 0}
        />
      </figcaption>
    </figure>
  );
}

/** A bar across the track at the start and a chevron pointing the way the cars go. */
function startMark(pts: [number, number][], width: number): string {
  if (pts.length < 2) return "";
  const [x0, y0] = pts[0];
  const [x1, y1] = pts[Math.min(pts.length - 1, 3)];
  const len = Math.hypot(x1 - x0, y1 - y0) || 1;
  const ux = (x1 - x0) / len;
  const uy = (y1 - y0) / len;
  const nx = -uy;
  const ny = ux;
  const half = width * 0.6;
  const ax = x0 + ux * width;
  const ay = y0 + uy * width;
  const q = width * 0.35;
  const f = (x: number, y: number) => `${x.toFixed(2)} ${(-y).toFixed(2)}`;
  return (
    `M ${f(x0 + nx * half, y0 + ny * half)} L ${f(x0 - nx * half, y0 - ny * half)} ` +
    `M ${f(ax - ux * q + nx * q, ay - uy * q + ny * q)} L ${f(ax, ay)} L ${f(ax - ux * q - nx * q, ay - uy * q - ny * q)}`
  );
}
