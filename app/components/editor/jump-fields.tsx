/**
 * A jump's own parts of the section panel: the fields of each preset, and the two choices above
 * its side view (its shape, and which straight keeps the loop closed when its size changes).
 */
import { JUMP_PRESET_LABELS, JUMP_PRESETS, type JumpPreset } from "~/analysis";
import { KEEP_CLOSED_LABELS, type KeepClosedBy } from "~/lib/editor/jump-resize";

export const JUMP_FIELDS: Record<
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

const selectClass = "block w-full rounded-md border border-ink-300 bg-white px-2 py-1.5 text-sm";

export function JumpChoices({
  preset,
  keepClosedBy,
  onPreset,
  onKeepClosedBy,
}: {
  preset: JumpPreset;
  keepClosedBy: KeepClosedBy;
  onPreset(preset: JumpPreset): void;
  onKeepClosedBy(by: KeepClosedBy): void;
}) {
  return (
    <>
      <div className="space-y-1">
        <label htmlFor="jump-preset" className="block text-xs font-medium text-ink-700">
          Jump shape
        </label>
        <select
          id="jump-preset"
          className={selectClass}
          value={preset}
          onChange={(e) => onPreset(e.target.value as JumpPreset)}
        >
          {JUMP_PRESETS.map((p) => (
            <option key={p} value={p}>
              {JUMP_PRESET_LABELS[p]}
            </option>
          ))}
        </select>
      </div>
      <div className="space-y-1">
        <label htmlFor="keep-closed" className="block text-xs font-medium text-ink-700">
          When its size changes, keep the loop closed by changing
        </label>
        <select
          id="keep-closed"
          className={selectClass}
          value={keepClosedBy}
          onChange={(e) => onKeepClosedBy(e.target.value as KeepClosedBy)}
        >
          {(Object.keys(KEEP_CLOSED_LABELS) as KeepClosedBy[]).map((k) => (
            <option key={k} value={k}>
              {KEEP_CLOSED_LABELS[k]}
            </option>
          ))}
        </select>
      </div>
    </>
  );
}
