import type { ReactNode } from "react";
import { isLoopClosed, type Closure } from "~/analysis";
import { formatLength, type LengthUnit } from "~/lib/editor/units";
import { toleranceText } from "./close-loop-proposal";

/**
 * The loop's closure, always in view: the gap and the heading error, whether that is within the
 * closure tolerance (which it names), and the button that proposes a change to close it.
 */
export function ClosureBar({
  closure,
  units,
  editable,
  message,
  proposing = false,
  onClose,
  children,
}: {
  closure: Closure;
  units: LengthUnit;
  editable: boolean;
  message: string | null;
  /** A proposal is on screen (the button would make it again). */
  proposing?: boolean;
  onClose?(): void;
  /** The proposal, below the closure. */
  children?: ReactNode;
}) {
  const closed = isLoopClosed(closure);
  return (
    <div
      className={`flex flex-wrap items-center gap-x-3 gap-y-1 rounded-md px-3 py-1.5 text-sm ${closed ? "bg-ok-100 text-ok-700" : "bg-clay-100 text-clay-700"}`}
      data-testid="closure"
    >
      <span role="status" aria-live="polite" className="flex flex-wrap items-center gap-x-3">
        <span className="font-semibold">{closed ? "✓ Loop closed" : "⚠ Loop open"}</span>
        <span className="tabular-nums">
          gap {formatLength(closure.gap, units, 2)} · heading off by {Math.abs(closure.headingDeg).toFixed(1)}
          °
        </span>
        <span className="text-xs">(closed means within {toleranceText(units)})</span>
      </span>
      {editable && onClose ? (
        <button
          type="button"
          className="ml-auto rounded-md bg-pine-700 px-2.5 py-1 text-sm font-medium text-white hover:bg-pine-800 disabled:opacity-50"
          disabled={closed || proposing}
          onClick={onClose}
        >
          Close the loop…
        </button>
      ) : null}
      {message ? <span className="basis-full text-xs text-ink-700">{message}</span> : null}
      {children}
    </div>
  );
}
