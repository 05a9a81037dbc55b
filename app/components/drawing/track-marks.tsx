/**
 * The track drawing's marks over the lines: the start, speeds at each corner and straight, the
 * driver stand, the numbered marshal points and the jumps (a mark whose shape gives the verdict,
 * a link to the jump's page).
 */
import type { AnalysisOverlay, LayoutDocument } from "~/analysis";
import { VERDICT_MARK_OUTLINE, VERDICT_MARKS } from "~/lib/verdict-marks";
import { PLAN } from "~/components/editor/colours";
import { speedLabels } from "./drawing-geometry";
import type { Pen } from "./track-pen";

/** The start bar and chevron, "Start" beside it, and the slowest and fastest speeds along the lap. */
export function StartAndSpeeds({
  pts,
  speed,
  trackWidth,
  pen,
}: {
  pts: [number, number][];
  speed: readonly number[];
  trackWidth: number;
  pen: Pen;
}) {
  const { fs, halo } = pen;
  const labels = speedLabels(speed, 1, Math.max(10, Math.round(pts.length / 14)));
  return (
    <>
      <path
        d={startMark(pts, trackWidth)}
        fill="none"
        stroke={PLAN.text}
        strokeWidth={2}
        vectorEffect="non-scaling-stroke"
      />
      <text
        x={pts[0][0]}
        y={-pts[0][1] + trackWidth + fs}
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
    </>
  );
}

/** The driver stand (a square) and the marshal points (numbered diamonds). */
export function SiteMarks({
  site,
  pen,
}: {
  site: Pick<LayoutDocument, "driverStand" | "marshalPoints">;
  pen: Pen;
}) {
  const { fs, halo } = pen;
  return (
    <>
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
    </>
  );
}

/** Each jump: its flight from lip to landing (dashed), the verdict's mark and its number; a link. */
export function JumpMarks({
  jumps,
  numbers,
  names,
  jumpHref,
  pen,
}: {
  jumps: AnalysisOverlay["jumps"];
  numbers: Record<string, number>;
  names: Record<string, string>;
  jumpHref: (sectionId: string) => string;
  pen: Pen;
}) {
  const { fs, halo } = pen;
  return jumps.map((j) => {
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
  });
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
