import {
  type ResolvedSection,
  type OverlayJump,
  JUMP_PRESET_LABELS,
  type JumpPreset,
  type LayoutDocument,
  type LayoutSection,
} from "~/analysis";
import { jumpMoveBlocker } from "~/lib/editor/drag-maths";
import { checkSectionPatch } from "~/lib/editor/field-check";
import type { KeepClosedBy } from "~/lib/editor/jump-resize";
import type { SnapSettings } from "~/lib/editor/snap";
import { feetHint } from "~/lib/editor/units";
import { JUMP_FIELDS, JumpChoices } from "./jump-fields";
import { JumpSideView } from "./jump-side-view";
import { NumberField } from "./number-field";

interface Props {
  doc: LayoutDocument;
  index: number;
  resolved: ResolvedSection | undefined;
  snap: SnapSettings;
  overlayJump: OverlayJump | undefined;
  /**
   * Applies a changed section; `gesture` groups keystrokes of one field into one undo step.
   * @returns why it was refused (the end of a sentence), or null when applied.
   */
  onSection(section: LayoutSection, gesture: string): string | null;
  onPreset(preset: JumpPreset): void;
  onGestureEnd(): void;
  /** Which straight keeps the loop closed when the jump changes size. */
  keepClosedBy: KeepClosedBy;
  onKeepClosedBy(by: KeepClosedBy): void;
}

/** What a turn reads as in the trade's words (common practice, no source). */
export function turnWord(radius: number, angleDeg: number): string {
  if (angleDeg >= 150 && radius <= 8) return "hairpin";
  if (radius >= 15) return "sweeper";
  return "turn";
}

/** The selected section's fields, checked like the file format checks them, with units. */
export function SectionPanel({
  doc,
  index,
  resolved,
  snap,
  overlayJump,
  onSection,
  onPreset,
  onGestureEnd,
  keepClosedBy,
  onKeepClosedBy,
}: Props) {
  const section = doc.sections[index];
  if (!section) return null;
  const where = `section ${index + 1}`;
  const apply = (field: string, value: unknown): string | null => {
    const out = checkSectionPatch(doc, index, { [field]: value } as Partial<LayoutSection>);
    if (!out.ok) return out.issues.find((i) => i.field === field)?.message ?? out.issues[0].message;
    return onSection(out.section, `field-${section.id}-${field}`);
  };
  const num = (
    key: string,
    label: string,
    unit: string,
    value: number,
    decimals = 2,
    hint?: string,
    offset = 0,
  ) => (
    <NumberField
      key={`${section.id}-${key}`}
      label={label}
      unit={unit}
      value={value}
      decimals={decimals}
      hint={hint ?? (unit === "m" ? feetHint(value) : undefined)}
      where={where}
      onValue={(v) => apply(key, v - offset)}
      onDone={onGestureEnd}
    />
  );
  const title =
    section.kind === "turn"
      ? `${section.direction === "left" ? "Left" : "Right"} ${turnWord(section.radius, section.angleDeg)}`
      : section.kind === "jump"
        ? JUMP_PRESET_LABELS[section.preset]
        : "Straight";
  return (
    <div className="space-y-3">
      <p className="text-sm">
        <span className="font-semibold">
          Section {index + 1} of {doc.sections.length}: {title}
        </span>
        {resolved ? (
          <span className="text-ink-500"> · {resolved.length.toFixed(1)} m along the track</span>
        ) : null}
      </p>
      <div className="space-y-1">
        <label htmlFor="section-name" className="block text-xs font-medium text-ink-700">
          Name (optional)
        </label>
        <input
          id="section-name"
          key={section.id}
          className="block w-full rounded-md border border-ink-300 bg-white px-2 py-1.5 text-sm"
          defaultValue={section.name ?? ""}
          maxLength={60}
          placeholder={`e.g. ${section.kind === "jump" ? "Back tabletop" : section.kind === "turn" ? "Pit hairpin" : "Start straight"}`}
          onChange={(e) => apply("name", e.target.value.trim() === "" ? undefined : e.target.value)}
          onBlur={onGestureEnd}
        />
      </div>
      <label className="flex items-start gap-2 text-xs text-ink-700">
        <input
          type="checkbox"
          className="mt-0.5"
          checked={section.locked === true}
          onChange={(e) => apply("locked", e.target.checked ? true : undefined)}
        />
        <span>
          <span className="font-medium">Locked</span>: <em>Close the loop</em> and the automatic adjustments
          (a jump&apos;s new size, moving a jump) never change this section. You still can.
        </span>
      </label>
      {section.kind === "straight" ? num("length", "Length", "m", section.length) : null}
      {section.kind === "turn" ? (
        <div className="grid grid-cols-2 gap-2">
          {num("radius", "Radius", "m", section.radius)}
          {num("angleDeg", "Angle", "deg", section.angleDeg, 1)}
          <div className="col-span-2 space-y-1">
            <label htmlFor="turn-direction" className="block text-xs font-medium text-ink-700">
              Direction
            </label>
            <select
              id="turn-direction"
              className="block w-full rounded-md border border-ink-300 bg-white px-2 py-1.5 text-sm"
              value={section.direction}
              onChange={(e) => apply("direction", e.target.value)}
            >
              <option value="left">Left</option>
              <option value="right">Right</option>
            </select>
          </div>
        </div>
      ) : null}
      {section.kind === "jump" ? (
        <>
          <JumpChoices
            preset={section.preset}
            keepClosedBy={keepClosedBy}
            onPreset={onPreset}
            onKeepClosedBy={onKeepClosedBy}
          />
          <JumpSideView
            section={section}
            snap={snap}
            takeoffSpeed={overlayJump?.takeoffSpeed}
            onChange={(s, g) => void onSection(s, g)}
            onGestureEnd={onGestureEnd}
          />
          <div className="grid grid-cols-2 gap-2">
            {section.preset === "custom"
              ? (["lipIndex", "landingStartIndex", "landingEndIndex"] as const).map((k) =>
                  num(
                    k,
                    k === "lipIndex"
                      ? "Lip is point"
                      : k === "landingStartIndex"
                        ? "Landing starts at point"
                        : "Landing ends at point",
                    "no.",
                    section[k] + 1,
                    0,
                    "Counting from 1",
                    1,
                  ),
                )
              : JUMP_FIELDS[section.preset].map((f) =>
                  num(
                    f.key,
                    f.label,
                    f.unit,
                    (section as unknown as Record<string, number>)[f.key],
                    f.decimals ?? 2,
                  ),
                )}
          </div>
          <p className="text-xs text-ink-500">
            {jumpMoveBlocker(doc, index) ??
              "Drag the diamond on the plan to move the jump along the track; the straights either side give and take the length."}
          </p>
        </>
      ) : null}
    </div>
  );
}
