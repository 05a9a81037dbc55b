import { useId, useState } from "react";
import { parseNumberText } from "~/lib/number-text";

const inputClass =
  "block w-full rounded-md border border-ink-300 bg-white px-2 py-1.5 text-sm tabular-nums shadow-sm focus:border-pine-600 aria-[invalid=true]:border-danger-700";

export interface NumberFieldProps {
  label: string;
  /** Unit written after the label and beside the input, e.g. "m", "deg". */
  unit: string;
  value: number;
  /** Decimals shown when the value changes from elsewhere (a drag, undo). */
  decimals?: number;
  /** What the up and down arrow keys add or take away (default 1). */
  step?: number;
  hint?: string;
  /** Gets the typed number; returns an error message for the field, or null when accepted. */
  onValue(value: number): string | null;
  onDone?(): void;
  disabled?: boolean;
}

/**
 * A number input that applies each valid value at once and shows why a value is refused beside
 * it (keeping what was typed, so nothing is lost while correcting it). A text field read by
 * parseNumberText, so "3,5" and "3.5 m" are understood as in the forms; the arrow keys step.
 */
export function NumberField({
  label,
  unit,
  value,
  decimals = 2,
  step,
  hint,
  onValue,
  onDone,
  disabled,
}: NumberFieldProps) {
  const id = useId();
  const [text, setText] = useState(() => format(value, decimals));
  const [error, setError] = useState<string | null>(null);
  const [focused, setFocused] = useState(false);
  const [shown, setShown] = useState(value);
  // Follow changes made elsewhere (a drag, undo); never overwrite what is being typed.
  if (!focused && value !== shown) {
    setShown(value);
    if (parseNumberText(text, unit) !== value) {
      setText(format(value, decimals));
      setError(null);
    }
  }
  const take = (typed: string) => {
    setText(typed);
    const n = parseNumberText(typed, unit);
    if (n === null) {
      setError(`${label} must be a number (${unit}).`);
      return;
    }
    const refused = onValue(n);
    setError(refused ? `${label} ${refused}.` : null);
  };
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-xs font-medium text-ink-700">
        {label} ({unit})
      </label>
      <div className="flex items-center gap-1.5">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          className={inputClass}
          value={text}
          disabled={disabled}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
          onFocus={() => setFocused(true)}
          onBlur={() => {
            setFocused(false);
            onDone?.();
          }}
          onChange={(e) => take(e.target.value)}
          onKeyDown={(e) => {
            if (e.key !== "ArrowUp" && e.key !== "ArrowDown") return;
            const n = parseNumberText(text, unit);
            if (n === null) return;
            e.preventDefault();
            const next = n + (e.key === "ArrowUp" ? 1 : -1) * (step ?? 1);
            take(format(next, Math.max(decimals, stepDecimals(step ?? 1))));
          }}
        />
        <span className="text-xs text-ink-500" aria-hidden="true">
          {unit}
        </span>
      </div>
      {error ? (
        <p id={`${id}-error`} className="text-xs text-danger-700" role="alert">
          {error}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-xs text-ink-500">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

function format(value: number, decimals: number): string {
  return String(Number(value.toFixed(decimals)));
}

/** Decimals a step needs so that stepping does not round it away (0.05 -> 2). */
function stepDecimals(step: number): number {
  const s = String(step);
  return s.includes(".") ? s.length - s.indexOf(".") - 1 : 0;
}
