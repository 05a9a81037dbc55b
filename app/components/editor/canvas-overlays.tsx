/**
 * The plan's DOM overlays (no konva): the scale bar, the speed legend, the key to the marshal
 * zones and hotspots, and the zoom buttons.
 */
import { CAR_PRESETS, type AnalysisOverlay } from "~/analysis";
import { binStyle, legendTicks, SPEED_BINS } from "~/lib/editor/speed-scale";
import { niceStep, type LengthUnit } from "~/lib/editor/units";
import { PLAN } from "./colours";

/** A bar of a round length (at least 60 px) with its length written on it. */
export function ScaleBar({ scale, units }: { scale: number; units: LengthUnit }) {
  const { step, metres } = niceStep(scale, units, 60);
  const px = metres * scale;
  return (
    <div
      className="pointer-events-none absolute bottom-2 left-2 rounded bg-white/85 px-2 py-1 text-xs text-ink-700 shadow-sm"
      aria-label={`Scale: the bar is ${step} ${units}`}
    >
      <div className="h-1.5 border-x-2 border-b-2 border-ink-700" style={{ width: `${px}px` }} />
      <span className="font-medium">
        {step} {units}
      </span>
    </div>
  );
}

/**
 * The speed legend: colour and width both grow with speed; the numbers are printed in m/s and km/h.
 */
export function SpeedLegend({ overlay, stale }: { overlay: AnalysisOverlay; stale: boolean }) {
  const { min, max } = overlay.speedRange;
  return (
    <figure
      className={`pointer-events-none absolute right-2 bottom-2 rounded bg-white/90 px-2 py-1.5 text-xs text-ink-700 shadow-sm ${stale ? "opacity-60" : ""}`}
    >
      <figcaption className="font-semibold">
        Speed (
        {CAR_PRESETS[overlay.classId]?.label ??
          (overlay.classId.startsWith("own-") ? "your car" : overlay.classId)}
        )
      </figcaption>
      <svg width="150" height="14" aria-hidden="true" className="mt-1 block">
        {Array.from({ length: SPEED_BINS }, (_, b) => {
          const s = binStyle(b);
          return (
            <rect
              key={b}
              x={(b * 150) / SPEED_BINS}
              y={7 - s.width / 2}
              width={150 / SPEED_BINS + 0.5}
              height={s.width}
              fill={s.colour}
            />
          );
        })}
      </svg>
      <div className="flex w-[150px] justify-between tabular-nums">
        {legendTicks(min, max).map((v, k) => (
          <span key={k}>{v.toFixed(0)}</span>
        ))}
      </div>
      <p className="tabular-nums text-ink-500">
        m/s · {(min * 3.6).toFixed(0)} to {(max * 3.6).toFixed(0)} km/h · wider is faster
      </p>
    </figure>
  );
}

/** The key to the marshal zones and hotspots, above the scale bar (its hatching is the canvas's). */
export function ZoneKey({ stale, hotspots }: { stale: boolean; hotspots: boolean }) {
  return (
    <figure
      className={`pointer-events-none absolute bottom-14 left-2 rounded bg-white/90 px-2 py-1 text-xs text-ink-700 shadow-sm ${stale ? "opacity-60" : ""}`}
      data-testid="zone-key"
    >
      <figcaption className="flex items-center gap-1.5">
        <svg width="18" height="12" aria-hidden="true">
          <defs>
            <pattern
              id="zone-key-hatch"
              patternUnits="userSpaceOnUse"
              width="5"
              height="5"
              patternTransform="rotate(45)"
            >
              <line x1="0" y1="0" x2="0" y2="5" stroke={PLAN.zone} strokeWidth="1.2" />
            </pattern>
          </defs>
          <rect
            x="1"
            y="1"
            width="16"
            height="10"
            fill="url(#zone-key-hatch)"
            stroke={PLAN.zone}
            strokeDasharray="3 2"
          />
        </svg>
        Overshoot and run-off zones
      </figcaption>
      {hotspots ? (
        <p className="flex items-center gap-1.5">
          <svg width="18" height="12" aria-hidden="true">
            <path d="M9 1 L15 11 L3 11 Z" fill="#ffffff" stroke={PLAN.text} strokeWidth="1.3" />
          </svg>
          Hotspots (H1, H2…): spots to watch
        </p>
      ) : null}
    </figure>
  );
}

export function ZoomControls({ onZoom, onFit }: { onZoom(factor: number): void; onFit(): void }) {
  const cls =
    "h-8 min-w-8 rounded border border-ink-300 bg-white px-2 text-sm font-medium text-ink-900 shadow-sm hover:bg-sand-100";
  return (
    <div className="absolute top-2 right-2 flex gap-1">
      <button type="button" className={cls} onClick={() => onZoom(1.25)} aria-label="Zoom in">
        +
      </button>
      <button type="button" className={cls} onClick={() => onZoom(0.8)} aria-label="Zoom out">
        −
      </button>
      <button type="button" className={cls} onClick={onFit}>
        Fit
      </button>
    </div>
  );
}
