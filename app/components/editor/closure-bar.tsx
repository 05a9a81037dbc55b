import type { Closure } from "~/analysis";
import { formatLength, type LengthUnit } from "~/lib/editor/units";

/** Gap below which the loop counts as closed, m, and heading error, deg. */
export const CLOSED_GAP = 0.005;
export const CLOSED_HEADING = 0.05;

export function isClosed(c: Closure): boolean {
  return c.gap < CLOSED_GAP && Math.abs(c.headingDeg) < CLOSED_HEADING;
}

/** The loop's closure, always in view: the gap and the heading error, and one button to close it. */
export function ClosureBar({
  closure,
  units,
  editable,
  message,
  onClose,
}: {
  closure: Closure;
  units: LengthUnit;
  editable: boolean;
  message: string | null;
  onClose?(): void;
}) {
  const closed = isClosed(closure);
  return (
    <div
      className={`flex flex-wrap items-center gap-x-3 gap-y-1 rounded-md px-3 py-1.5 text-sm ${closed ? "bg-ok-100 text-ok-700" : "bg-clay-100 text-clay-700"}`}
      role="status"
      aria-live="polite"
      data-testid="closure"
    >
      <span className="font-semibold">{closed ? "✓ Loop closed" : "⚠ Loop open"}</span>
      <span className="tabular-nums">
        gap {formatLength(closure.gap, units, 2)} · heading off by {Math.abs(closure.headingDeg).toFixed(1)}°
      </span>
      {editable && onClose ? (
        <button
          type="button"
          className="ml-auto rounded-md bg-pine-700 px-2.5 py-1 text-sm font-medium text-white hover:bg-pine-800 disabled:opacity-50"
          disabled={closed}
          onClick={onClose}
        >
          Close the loop
        </button>
      ) : null}
      {message ? <span className="basis-full text-xs text-ink-700">{message}</span> : null}
    </div>
  );
}
