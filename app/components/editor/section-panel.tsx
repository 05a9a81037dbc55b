import type { ResolvedSection } from "~/analysis";
import type { OverlayJump } from "~/analysis";
import { jumpMoveBlocker } from "~/lib/editor/drag-maths";
import { checkSectionPatch } from "~/lib/editor/field-check";
import type { SnapSettings } from "~/lib/editor/snap";
import { feetHint } from "~/lib/editor/units";
import {
  JUMP_PRESET_LABELS,
  JUMP_PRESETS,
  type JumpPreset,
  type LayoutDocument,
  type LayoutSection,
} from "~/analysis";
import { JumpSideView } from "./jump-side-view";
import { NumberField } from "./number-field";

interface Props {
  doc: LayoutDocument;
  index: number;
  resolved: ResolvedSection | undefined;
  snap: SnapSettings;
  overlayJump: OverlayJump | undefined;
  /** Applies a changed section; `gesture` groups keystrokes of one field into one undo step. */
  onSection(section: LayoutSection, gesture: string): void;
  onPreset(preset: JumpPreset): void;
  onGestureEnd(): void;
}

const JUMP_FIELDS: Record<
  Exclude<JumpPreset, "custom">,
  { key: string; label: string; unit: string; decimals?: number }[]
> = {
  tabletop: [
    { key: "faceHeight", label: "Face height", unit: "m" },
    { key: "faceAngleDeg", label: "Face angle", unit: "deg", decimals: 1 },
    { key: "tableLength", label: "Table length", unit: "m" },
    { key: "landingAngleDeg", label: "Landing angle", unit: "deg", decimals: 1 },
  ],
  double: gapFields(),
  triple: gapFields(),
  "step-down": gapFields(),
  "step-up": [
    ...gapFields().slice(0, 4),
    { key: "deckLength", label: "Deck length", unit: "m" },
    { key: "landingAngleDeg", label: "Landing angle (off the deck)", unit: "deg", decimals: 1 },
  ],
  whoops: [
    { key: "count", label: "Number of bumps", unit: "bumps", decimals: 0 },
    { key: "bumpHeight", label: "Bump height", unit: "m" },
    { key: "spacing", label: "Crest to crest", unit: "m" },
  ],
};

function gapFields() {
  return [
    { key: "faceHeight", label: "Face height", unit: "m" },
    { key: "faceAngleDeg", label: "Face angle", unit: "deg", decimals: 1 },
    { key: "gap", label: "Gap (lip to landing crest)", unit: "m" },
    { key: "landingHeight", label: "Landing height", unit: "m" },
    { key: "landingAngleDeg", label: "Landing angle", unit: "deg", decimals: 1 },
  ];
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
}: Props) {
  const section = doc.sections[index];
  if (!section) return null;
  const apply = (field: string, value: unknown): string | null => {
    const out = checkSectionPatch(doc, index, { [field]: value } as Partial<LayoutSection>);
    if (!out.ok) return out.issues.find((i) => i.field === field)?.message ?? out.issues[0].message;
    onSection(out.section, `field-${section.id}-${field}`);
    return null;
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
          <div className="space-y-1">
            <label htmlFor="jump-preset" className="block text-xs font-medium text-ink-700">
              Jump shape
            </label>
            <select
              id="jump-preset"
              className="block w-full rounded-md border border-ink-300 bg-white px-2 py-1.5 text-sm"
              value={section.preset}
              onChange={(e) => onPreset(e.target.value as JumpPreset)}
            >
              {JUMP_PRESETS.map((p) => (
                <option key={p} value={p}>
                  {JUMP_PRESET_LABELS[p]}
                </option>
              ))}
            </select>
          </div>
          <JumpSideView
            section={section}
            snap={snap}
            takeoffSpeed={overlayJump?.takeoffSpeed}
            onChange={(s, g) => onSection(s, g)}
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
