import { PLAN } from "~/components/editor/colours";
import { flightCurve, ticks } from "./elevation-path";

export type ElevationData = {
  /** Ground profile along the section: distance m, height m. */
  d: number[];
  h: number[];
  lipIndex: number;
  landingStartIndex: number;
  landingEndIndex: number;
  /** Planned touchdown point along the section, m. */
  sweetSpot: number;
  lip: { d: number; z: number };
  apex: { d: number; z: number } | null;
  landing: { d: number; z: number; speed: number } | null;
};

/** Drawing widths: a wide screen and paper, and a phone (about its width in px, so text stays 11 px+). */
const WIDE = 900;
const PHONE = 340;
const M = { left: 52, right: 16, top: 18, bottom: 44 };

/**
 * The jump's side elevation drawn to scale (one metre is as long across as it is up), metres on
 * both axes: the ground profile, the landing ramp, the overshoot zone beyond it, and the flight
 * path at the planned takeoff speed with its lip, apex and touchdown.
 */
export function JumpElevation({ e, name }: { e: ElevationData; name: string }) {
  return (
    <figure>
      <ElevationSvg e={e} name={name} W={WIDE} id="elevation" className="hidden sm:block print:block" />
      <ElevationSvg e={e} name={name} W={PHONE} id="elevation-phone" className="sm:hidden print:hidden" />
      <figcaption className="mt-2 text-xs text-ink-500">
        To scale, heights not stretched. Thick line: the landing ramp; hatched: the overshoot zone (the
        hardest landing). Dashed: the flight path at the planned takeoff speed (the model's point mass, with
        air drag), drawn through the computed lip, apex and touchdown. Upright tick on the ramp: the planned
        touchdown, a third of the way down.
      </figcaption>
    </figure>
  );
}

function ElevationSvg({
  e,
  name,
  W,
  id,
  className,
}: {
  e: ElevationData;
  name: string;
  W: number;
  id: string;
  className: string;
}) {
  // A phone's drawing leaves out the two labels the caption names, and keeps the rest inside.
  const narrow = W < 500;
  const end = Math.max(e.d[e.d.length - 1], e.landing?.d ?? 0) + 1.5;
  const x0 = -0.5;
  const zMin = Math.min(0, ...e.h) - 0.1;
  const zMax = Math.max(...e.h, e.apex?.z ?? 0, e.lip.z) + 0.3;
  const k = (W - M.left - M.right) / (end - x0);
  const H = M.top + M.bottom + (zMax - zMin) * k;
  const X = (d: number) => M.left + (d - x0) * k;
  const Z = (z: number) => M.top + (zMax - z) * k;
  const ground = e.d.map((d, i) => `${X(d).toFixed(1)},${Z(e.h[i]).toFixed(1)}`);
  const groundArea = `M ${X(x0)} ${Z(0)} L ${ground.join(" L ")} L ${X(end)} ${Z(0)} L ${X(end)} ${Z(zMin)} L ${X(x0)} ${Z(zMin)} Z`;
  const ramp = e.d
    .slice(e.landingStartIndex, e.landingEndIndex + 1)
    .map((d, i) => `${X(d)},${Z(e.h[e.landingStartIndex + i])}`)
    .join(" ");
  const rampEnd = e.d[e.landingEndIndex];
  const path = flightCurve(e.lip, e.apex, e.landing)
    .map(([d, z]) => `${X(d).toFixed(1)},${Z(z).toFixed(1)}`)
    .join(" ");
  const sweetZ = interp(e.d, e.h, e.sweetSpot);
  const touchdown = e.landing ? `touchdown ${e.landing.speed.toFixed(1)} m/s` : "";
  // Inter's characters are about 0.6 of the text size wide.
  const fitsRight = e.landing ? X(e.landing.d) + 8 + touchdown.length * 12 * 0.6 < W - 4 : true;
  const label = {
    fontSize: 12,
    fill: PLAN.text,
    paintOrder: "stroke" as const,
    stroke: "white",
    strokeWidth: 3,
  };
  return (
    <svg
      viewBox={`0 0 ${W} ${H.toFixed(0)}`}
      className={`h-auto w-full rounded-lg border border-sand-200 bg-white ${className}`}
      role="img"
      aria-labelledby={`${id}-title ${id}-desc`}
      fontFamily="Inter, sans-serif"
    >
      <title id={`${id}-title`}>{`Side elevation of ${name}, drawn to scale`}</title>
      <desc id={`${id}-desc`}>
        {e.landing
          ? `The car leaves the lip at ${e.lip.d.toFixed(1)} m, height ${e.lip.z.toFixed(2)} m, flies up to ${e.apex?.z.toFixed(2) ?? e.lip.z.toFixed(2)} m and touches down at ${e.landing.d.toFixed(1)} m.`
          : "No flight is drawn: the car does not fly this jump at the planned speed."}
      </desc>
      <rect
        x={X(rampEnd)}
        y={M.top}
        width={Math.max(0, X(end) - X(rampEnd))}
        height={Z(0) - M.top}
        fill={`url(#${id}-overshoot)`}
      />
      <defs>
        <pattern
          id={`${id}-overshoot`}
          width="8"
          height="8"
          patternUnits="userSpaceOnUse"
          patternTransform="rotate(45)"
        >
          <line x1="0" y1="0" x2="0" y2="8" stroke={PLAN.conflict} strokeOpacity="0.25" strokeWidth="3" />
        </pattern>
      </defs>
      {narrow ? null : (
        <text x={X(end) - 6} y={M.top + 14} textAnchor="end" {...label} fill={PLAN.conflict}>
          overshoot zone: hardest landing
        </text>
      )}
      {ticks(x0, end).map((t) => (
        <g key={`x${t}`}>
          <line x1={X(t)} x2={X(t)} y1={M.top} y2={Z(zMin)} stroke={PLAN.gridMinor} />
          <text x={X(t)} y={Z(zMin) + 16} fontSize={11} textAnchor="middle" fill={PLAN.centre}>
            {t}
          </text>
        </g>
      ))}
      {ticks(zMin, zMax, 4).map((t) => (
        <g key={`z${t}`}>
          <line x1={M.left} x2={W - M.right} y1={Z(t)} y2={Z(t)} stroke={PLAN.gridMinor} />
          <text x={M.left - 6} y={Z(t) + 4} fontSize={11} textAnchor="end" fill={PLAN.centre}>
            {t}
          </text>
        </g>
      ))}
      <text x={(M.left + W) / 2} y={H - 8} fontSize={12} textAnchor="middle" fill={PLAN.text}>
        Distance along the jump (m)
      </text>
      <text
        x={14}
        y={M.top + (Z(zMin) - M.top) / 2}
        fontSize={12}
        textAnchor="middle"
        fill={PLAN.text}
        transform={`rotate(-90 14 ${M.top + (Z(zMin) - M.top) / 2})`}
      >
        Height (m)
      </text>
      <path d={groundArea} fill={PLAN.band} stroke={PLAN.bandEdge} strokeWidth={1.5} />
      <polyline points={ramp} fill="none" stroke={PLAN.landing} strokeWidth={6} strokeLinecap="round" />
      {narrow ? null : (
        <text
          x={(X(e.d[e.landingStartIndex]) + X(rampEnd)) / 2}
          y={Z(0) - 4}
          textAnchor="middle"
          {...label}
          fontSize={11}
        >
          landing ramp
        </text>
      )}
      <line
        x1={X(e.sweetSpot)}
        x2={X(e.sweetSpot)}
        y1={Z(sweetZ) - 10}
        y2={Z(sweetZ) + 10}
        stroke={PLAN.stand}
        strokeWidth={2}
      />
      <circle cx={X(e.lip.d)} cy={Z(e.lip.z)} r={4} fill={PLAN.lip} />
      <text x={X(e.lip.d) - 6} y={Z(e.lip.z) + 18} textAnchor="end" {...label}>
        lip
      </text>
      {path ? (
        <polyline points={path} fill="none" stroke={PLAN.selected} strokeWidth={2.5} strokeDasharray="7 4" />
      ) : null}
      {e.apex && e.landing ? (
        <text x={X(e.apex.d)} y={Z(e.apex.z) - 8} textAnchor="middle" {...label}>
          apex {e.apex.z.toFixed(2)} m
        </text>
      ) : null}
      {e.landing ? (
        <g>
          <circle
            cx={X(e.landing.d)}
            cy={Z(e.landing.z)}
            r={5}
            fill="white"
            stroke={PLAN.selected}
            strokeWidth={2.5}
          />
          <text
            x={X(e.landing.d) + (fitsRight ? 8 : -8)}
            y={Z(e.landing.z) - 8}
            textAnchor={fitsRight ? "start" : "end"}
            {...label}
          >
            {touchdown}
          </text>
        </g>
      ) : null}
    </svg>
  );
}

function interp(d: number[], h: number[], x: number): number {
  for (let i = 1; i < d.length; i++)
    if (x <= d[i]) return h[i - 1] + ((h[i] - h[i - 1]) * (x - d[i - 1])) / (d[i] - d[i - 1] || 1);
  return h[h.length - 1];
}
