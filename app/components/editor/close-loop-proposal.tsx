/**
 * "Close the loop" shows what it would change before changing it: the list of changed values here,
 * the new centre line dashed on the plan (drawn by the canvas from the proposal's document).
 */
import { CLOSURE_TOLERANCE, type CloseLoopResult, type LayoutDocument, type SectionChange } from "~/analysis";
import { Button } from "~/components/ui/button";
import { formatLength, type LengthUnit } from "~/lib/editor/units";
import { describeSection } from "./sections-list";

const FIELD_WORDS: Record<SectionChange["field"], string> = {
  length: "length",
  radius: "radius",
  angleDeg: "angle",
};

/** "30.0 → 37.3 m" or "176 → 180°". */
function changeText(c: SectionChange): string {
  if (c.field === "angleDeg") return `${FIELD_WORDS[c.field]} ${c.from.toFixed(1)}° → ${c.to.toFixed(1)}°`;
  return `${FIELD_WORDS[c.field]} ${c.from.toFixed(2)} m → ${c.to.toFixed(2)} m`;
}

/** The tolerance in words: "5 cm and 0.5°". */
export function toleranceText(units: LengthUnit): string {
  const gap =
    units === "m"
      ? `${(CLOSURE_TOLERANCE.gap * 100).toFixed(0)} cm`
      : formatLength(CLOSURE_TOLERANCE.gap, units, 2);
  return `${gap} and ${CLOSURE_TOLERANCE.headingDeg}°`;
}

/** One sentence listing what was changed, for after the change is applied. */
export function appliedText(changes: SectionChange[]): string {
  const what = changes.map((c) => `section ${c.index + 1} ${changeText(c)}`).join(", ");
  return `Closed by changing ${what}. Undo brings the old values back.`;
}

export function CloseLoopProposal({
  doc,
  result,
  units,
  onApply,
  onCancel,
}: {
  doc: LayoutDocument;
  result: CloseLoopResult<LayoutDocument>;
  units: LengthUnit;
  onApply(): void;
  onCancel(): void;
}) {
  if (!result.ok)
    return (
      <div className="basis-full space-y-1 text-sm" data-testid="close-loop-proposal">
        <p role="alert">Could not close the loop: {result.reason}.</p>
        <Button variant="secondary" onClick={onCancel}>
          Dismiss
        </Button>
      </div>
    );
  const { closure } = result;
  return (
    <div className="basis-full space-y-2 text-sm text-ink-900" data-testid="close-loop-proposal">
      <p className="font-semibold">
        Proposed change (the dashed line on the plan). Jumps, their run-outs to the next turn and locked
        sections stay as they are.
      </p>
      <ul className="list-disc space-y-0.5 pl-5" aria-label="Proposed changes">
        {result.changes.map((c) => (
          <li key={`${c.index}-${c.field}`}>
            Section {c.index + 1} ({describeSection(doc.sections[c.index])}): {changeText(c)}
          </li>
        ))}
      </ul>
      <p className={result.closed ? "" : "text-danger-700"}>
        Afterwards the gap is {formatLength(closure.gap, units, 3)} and the heading is off by{" "}
        {Math.abs(closure.headingDeg).toFixed(2)}°:{" "}
        {result.closed
          ? `closed (within ${toleranceText(units)}).`
          : `more than the ${toleranceText(units)} a closed loop allows; with snapping on this is as near as it gets. Switch length snapping off to close it exactly.`}
      </p>
      <div className="flex flex-wrap gap-2">
        <Button onClick={onApply}>Apply the change</Button>
        <Button variant="secondary" onClick={onCancel}>
          Keep the drawing as it is
        </Button>
      </div>
    </div>
  );
}
