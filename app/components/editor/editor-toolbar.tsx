import type { NewSectionKind } from "~/lib/editor/section-ops";
import type { SnapSettings } from "~/lib/editor/snap";
import type { LengthUnit } from "~/lib/editor/units";
import { JUMP_PRESET_LABELS, JUMP_PRESETS, type JumpPreset } from "~/analysis";

export const toolClass =
  "inline-flex items-center rounded-md border border-ink-300 bg-white px-2.5 py-1.5 text-sm font-medium text-ink-900 hover:bg-sand-100 disabled:cursor-not-allowed disabled:opacity-45";

interface Props {
  sectionSelected: boolean;
  canUndo: boolean;
  canRedo: boolean;
  preset: JumpPreset;
  snap: SnapSettings;
  units: LengthUnit;
  onPreset(p: JumpPreset): void;
  onAdd(kind: NewSectionKind): void;
  onDelete(): void;
  onDuplicate(): void;
  onMove(step: -1 | 1): void;
  onUndo(): void;
  onRedo(): void;
  onSnap(s: SnapSettings): void;
  onUnits(u: LengthUnit): void;
}

/** Adding, changing and ordering sections, undo and redo, snapping and units. */
export function EditorToolbar(p: Props) {
  const where = p.sectionSelected ? "after the selected section" : "at the end of the lap";
  return (
    <div
      role="toolbar"
      aria-label="Drawing tools"
      className="flex flex-wrap items-end gap-x-4 gap-y-2 rounded-md border border-ink-300/60 bg-white/70 p-2"
    >
      <fieldset className="flex flex-wrap items-center gap-1.5">
        <legend className="sr-only">Add a section {where}</legend>
        <span className="text-xs text-ink-500">Add {where}:</span>
        <button type="button" className={toolClass} onClick={() => p.onAdd("straight")}>
          Straight
        </button>
        <button type="button" className={toolClass} onClick={() => p.onAdd("turn-left")}>
          Left turn
        </button>
        <button type="button" className={toolClass} onClick={() => p.onAdd("turn-right")}>
          Right turn
        </button>
        <label className="sr-only" htmlFor="add-jump-preset">
          Jump shape to add
        </label>
        <select
          id="add-jump-preset"
          className="rounded-md border border-ink-300 bg-white px-1.5 py-1.5 text-sm"
          value={p.preset}
          onChange={(e) => p.onPreset(e.target.value as JumpPreset)}
        >
          {JUMP_PRESETS.map((x) => (
            <option key={x} value={x}>
              {JUMP_PRESET_LABELS[x]}
            </option>
          ))}
        </select>
        <button type="button" className={toolClass} onClick={() => p.onAdd("jump")}>
          Jump
        </button>
      </fieldset>
      <div className="flex flex-wrap items-center gap-1.5">
        <button type="button" className={toolClass} disabled={!p.sectionSelected} onClick={p.onDelete}>
          Delete
        </button>
        <button type="button" className={toolClass} disabled={!p.sectionSelected} onClick={p.onDuplicate}>
          Duplicate
        </button>
        <button
          type="button"
          className={toolClass}
          disabled={!p.sectionSelected}
          onClick={() => p.onMove(-1)}
        >
          Move earlier
        </button>
        <button type="button" className={toolClass} disabled={!p.sectionSelected} onClick={() => p.onMove(1)}>
          Move later
        </button>
      </div>
      <div className="flex items-center gap-1.5">
        <button
          type="button"
          className={toolClass}
          disabled={!p.canUndo}
          onClick={p.onUndo}
          aria-keyshortcuts="Control+Z"
        >
          Undo
        </button>
        <button
          type="button"
          className={toolClass}
          disabled={!p.canRedo}
          onClick={p.onRedo}
          aria-keyshortcuts="Control+Shift+Z"
        >
          Redo
        </button>
      </div>
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <label className="inline-flex items-center gap-1.5">
          <input
            type="checkbox"
            checked={p.snap.lengths}
            onChange={(e) => p.onSnap({ ...p.snap, lengths: e.target.checked })}
          />
          Snap lengths (0.1 m)
        </label>
        <label className="inline-flex items-center gap-1.5">
          <input
            type="checkbox"
            checked={p.snap.angles}
            onChange={(e) => p.onSnap({ ...p.snap, angles: e.target.checked })}
          />
          Snap angles (5°)
        </label>
        <label className="inline-flex items-center gap-1.5">
          Plan in
          <select
            className="rounded-md border border-ink-300 bg-white px-1.5 py-1 text-sm"
            value={p.units}
            onChange={(e) => p.onUnits(e.target.value as LengthUnit)}
          >
            <option value="m">metres</option>
            <option value="ft">feet</option>
          </select>
        </label>
      </div>
    </div>
  );
}
