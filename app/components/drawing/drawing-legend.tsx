import { binStyle, speedBin } from "~/lib/editor/speed-scale";
import { PLAN } from "~/components/editor/colours";
import { VERDICT_KINDS } from "~/analysis";
import { VerdictMark } from "~/components/analysis/verdict-mark";

/** Bands shown on the legend (the drawing uses finer steps of the same scale). */
const LEGEND_BANDS = 5;

/**
 * The plan's legend: the speed bands with their numbers (m/s and km/h) and line widths, the jump
 * marks with their words, and the other signs. Nothing here depends on telling colours apart.
 */
export function DrawingLegend({
  min,
  max,
  bins,
  hidden,
  conflicts,
}: {
  min: number;
  max: number;
  bins: number;
  hidden: boolean;
  conflicts: boolean;
}) {
  const step = (max - min) / LEGEND_BANDS;
  const bands = Array.from({ length: LEGEND_BANDS }, (_, k) => {
    const lo = min + k * step;
    const hi = lo + step;
    return { lo, hi, style: binStyle(speedBin((lo + hi) / 2, min, max, bins), bins) };
  });
  return (
    <div className="grid gap-4 text-sm sm:grid-cols-2">
      <div>
        <p className="font-medium">Speed along the lap (the line is wider where it is faster)</p>
        <ul className="mt-1 space-y-1">
          {bands.map((b) => (
            <li key={b.lo} className="flex items-center gap-2">
              <svg width="36" height="10" aria-hidden="true">
                <line
                  x1="2"
                  y1="5"
                  x2="34"
                  y2="5"
                  stroke={b.style.colour}
                  strokeWidth={b.style.width}
                  strokeLinecap="round"
                />
              </svg>
              <span className="tabular-nums">
                {b.lo.toFixed(1)} to {b.hi.toFixed(1)} m/s ({Math.round(b.lo * 3.6)} to{" "}
                {Math.round(b.hi * 3.6)} km/h)
              </span>
            </li>
          ))}
        </ul>
        <p className="mt-1 text-xs text-ink-500">
          Numbers on the track: the slowest speed of each corner (&#9660;) and the fastest of each straight
          (&#9650;), m/s.
        </p>
      </div>
      <div>
        <p className="font-medium">Signs</p>
        <ul className="mt-1 space-y-1">
          {VERDICT_KINDS.map((k) => (
            <li key={k} className="flex items-center gap-2">
              <VerdictMark kind={k} /> (mark at the lip, with the jump's number)
            </li>
          ))}
          <li className="flex items-center gap-2">
            <svg width="14" height="14" viewBox="-1 -1 2 2" aria-hidden="true">
              <rect x="-0.8" y="-0.8" width="1.6" height="1.6" fill={PLAN.stand} />
            </svg>
            Driver stand
          </li>
          <li className="flex items-center gap-2">
            <svg width="14" height="14" viewBox="-1 -1 2 2" aria-hidden="true">
              <path d="M 0 -0.9 L 0.9 0 L 0 0.9 L -0.9 0 Z" fill={PLAN.marshal} />
            </svg>
            Marshal point (M1, M2, ...)
          </li>
          <li className="flex items-center gap-2">
            <svg width="36" height="10" aria-hidden="true">
              <line x1="2" y1="5" x2="34" y2="5" stroke={PLAN.boundary} strokeDasharray="4 3" />
            </svg>
            Site boundary
          </li>
          {hidden ? (
            <li className="flex items-center gap-2">
              <svg width="36" height="10" aria-hidden="true">
                <line
                  x1="2"
                  y1="5"
                  x2="34"
                  y2="5"
                  stroke={PLAN.hidden}
                  strokeWidth="6"
                  strokeOpacity="0.45"
                  strokeDasharray="2 2"
                />
              </svg>
              Hidden from the driver stand
            </li>
          ) : null}
          {conflicts ? (
            <li className="flex items-center gap-2">
              <svg width="36" height="10" aria-hidden="true">
                <line x1="2" y1="5" x2="34" y2="5" stroke={PLAN.conflict} strokeWidth="2" />
              </svg>
              Lanes too close (distance written beside it)
            </li>
          ) : null}
        </ul>
      </div>
    </div>
  );
}
