/**
 * The track drawing's marks over the lines: the start, speeds at each corner and straight, the
 * driver stand, the numbered marshal points and the jumps (a mark whose shape gives the verdict,
 * a link to the jump's page).
 */
import type { AnalysisOverlay, LayoutDocument } from "~/analysis";
import { VERDICT_MARK_OUTLINE, VERDICT_MARKS } from "~/lib/verdict-marks";
import { PLAN } from "~/components/editor/colours";
import { MARK, type DrawingLabel } from "./drawing-labels";
import type { Pen } from "./track-pen";

/** Placed labels by id (drawing-labels.ts); a label that is missing was dropped for want of room. */
export type Labels = ReadonlyMap<string, DrawingLabel>;

/** One placed label's text, centred in its box, with the paper halo. */
export function LabelText({
  label,
  pen,
  fill = PLAN.text,
}: {
  label: DrawingLabel | undefined;
  pen: Pen;
  fill?: string;
}) {
  if (!label) return null;
  return (
    <text
      x={label.x + label.width / 2}
      y={label.y + label.height / 2}
      fontSize={label.size}
      fontWeight={label.bold ? 600 : undefined}
      textAnchor="middle"
      dominantBaseline="central"
      fill={fill}
      {...pen.halo}
    >
      {label.text}
    </text>
  );
}

/** The start bar and chevron, "Start" beside it, and the slowest and fastest speeds along the lap. */
export function StartAndSpeeds({
  pts,
  trackWidth,
  labels,
  pen,
}: {
  pts: [number, number][];
  trackWidth: number;
  labels: Labels;
  pen: Pen;
}) {
  return (
    <>
      <path
        d={startMark(pts, trackWidth)}
        fill="none"
        stroke={PLAN.text}
        strokeWidth={2}
        vectorEffect="non-scaling-stroke"
      />
      <LabelText label={labels.get("start")} pen={pen} />
      {[...labels.keys()]
        .filter((id) => id.startsWith("speed-"))
        .map((id) => (
          <LabelText key={id} label={labels.get(id)} pen={pen} />
        ))}
    </>
  );
}

/** The driver stand (a square) and the marshal points (diamonds), each with its placed label. */
export function SiteMarks({
  site,
  labels,
  pen,
}: {
  site: Pick<LayoutDocument, "driverStand" | "marshalPoints">;
  labels: Labels;
  pen: Pen;
}) {
  const { fs } = pen;
  const s = fs * MARK.stand;
  const m = fs * MARK.marshal;
  return (
    <>
      {site.driverStand ? (
        <g>
          <rect
            x={site.driverStand.x - s}
            y={-site.driverStand.y - s}
            width={2 * s}
            height={2 * s}
            fill={PLAN.stand}
          />
          <LabelText label={labels.get("stand")} pen={pen} />
        </g>
      ) : null}
      {site.marshalPoints.map((p, i) => (
        <g key={`m${i}`}>
          <path
            d={`M 0 ${-m} L ${m} 0 L 0 ${m} L ${-m} 0 Z`}
            transform={`translate(${p.x} ${-p.y})`}
            fill={PLAN.marshal}
          />
          <LabelText label={labels.get(`marshal-${i}`)} pen={pen} />
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
  labels,
  pen,
}: {
  jumps: AnalysisOverlay["jumps"];
  numbers: Record<string, number>;
  names: Record<string, string>;
  jumpHref: (sectionId: string) => string;
  labels: Labels;
  pen: Pen;
}) {
  const { fs } = pen;
  return jumps.map((j) => {
    const r = fs * MARK.jump;
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
        <LabelText label={labels.get(`jump-${j.sectionId}`)} pen={pen} />
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
