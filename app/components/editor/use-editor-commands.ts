/**
 * The editor's tools (what a click on the plan does, snapping, units, the jump shape to add, the
 * fit request, calibration points) and the commands built on them: add, move, close the loop, a
 * click on the plan, the site photo, and the keyboard shortcuts.
 */
import { useState } from "react";
import { closeLoop, sampleCentreLine, type JumpPreset } from "~/analysis";
import type { Background } from "~/lib/editor/background";
import type { Point } from "~/lib/editor/drag-maths";
import { insertSection, moveSection, newSection, type NewSectionKind } from "~/lib/editor/section-ops";
import { addBoundaryPoint, addMarshalPoint, placeDriverStand } from "~/lib/editor/site-ops";
import { DEFAULT_SNAP, type SnapSettings } from "~/lib/editor/snap";
import type { LengthUnit } from "~/lib/editor/units";
import { layoutBounds } from "~/lib/editor/view";
import type { CanvasMode } from "./canvas-types";
import type { EditorDocument } from "./use-editor-document";
import { useEditorKeys } from "./use-editor-keys";

export function useEditorTools() {
  const [mode, setMode] = useState<CanvasMode>("select");
  const [snap, setSnap] = useState<SnapSettings>(DEFAULT_SNAP);
  const [units, setUnits] = useState<LengthUnit>("m");
  const [preset, setPreset] = useState<JumpPreset>("tabletop");
  const [fitRequest, setFitRequest] = useState(0);
  const [calibrationPoints, setCalibrationPoints] = useState<Point[]>([]);
  const requestFit = () => setFitRequest((n) => n + 1);
  return {
    mode,
    setMode,
    snap,
    setSnap,
    units,
    setUnits,
    preset,
    setPreset,
    fitRequest,
    requestFit,
    calibrationPoints,
    setCalibrationPoints,
  };
}

export type EditorTools = ReturnType<typeof useEditorTools>;

/** A sentence listing what closing the loop changed, or null when it changed nothing. */
function closeLoopMessage(changes: { index: number; field: string; from: number; to: number }[]) {
  const what = changes.map(
    (c) =>
      `section ${c.index + 1} ${c.field === "angleDeg" ? "angle" : c.field} ${c.from.toFixed(1)} → ${c.to.toFixed(1)}${c.field === "angleDeg" ? "°" : " m"}`,
  );
  return what.length ? `Closed by changing ${what.join(", ")}. Undo brings the old values back.` : null;
}

export function useEditorCommands({ doc, sections, selected, change }: EditorDocument, tools: EditorTools) {
  const [closeMessage, setCloseMessage] = useState<string | null>(null);
  const { mode, setMode, preset, setCalibrationPoints } = tools;
  const bounds = () => layoutBounds(doc, sampleCentreLine(sections, 1));
  const add = (kind: NewSectionKind) => {
    const out = insertSection(doc, newSection(doc, kind, preset), selected);
    change(out.doc, undefined, { kind: "section", index: out.index });
  };
  const move = (step: -1 | 1) => {
    if (selected === null) return;
    const to = selected + step;
    if (to < 0 || to >= doc.sections.length) return;
    change(moveSection(doc, selected, to), undefined, { kind: "section", index: to });
  };
  const closeTheLoop = () => {
    const out = closeLoop(doc);
    if (!out.ok) return setCloseMessage(`Could not close the loop: ${out.reason}.`);
    change(out.document);
    setCloseMessage(closeLoopMessage(out.changes));
  };
  const planClick = (p: Point) => {
    if (mode === "marshal") {
      const out = addMarshalPoint(doc, p);
      if (out) change(out.doc, undefined, { kind: "marshal", index: out.index });
    } else if (mode === "boundary") {
      const out = addBoundaryPoint(doc, p);
      if (out) change(out.doc, undefined, { kind: "boundary", index: out.index });
    } else if (mode === "stand") {
      change(placeDriverStand(doc, p), undefined, { kind: "stand" });
      setMode("select");
    } else if (mode === "calibrate") {
      setCalibrationPoints((pts) => (pts.length >= 2 ? [p] : [...pts, p]));
    }
  };
  const setBackground = (bg: Background | undefined, gesture?: string) => {
    const { background: _old, ...rest } = doc;
    change(bg ? { ...rest, background: bg } : rest, gesture, bg ? { kind: "photo" } : null);
  };
  return { closeMessage, bounds, add, move, closeTheLoop, planClick, setBackground };
}

export type EditorCommands = ReturnType<typeof useEditorCommands>;

/** The editor's keyboard shortcuts (see SHORTCUTS), off while a dialog asks something. */
export function useEditorShortcuts(
  { dispatch, select }: EditorDocument,
  tools: EditorTools,
  save: () => void,
  enabled: boolean,
) {
  useEditorKeys(
    {
      deleteSelected: () => dispatch({ type: "delete-selected" }),
      undo: () => dispatch({ type: "undo" }),
      redo: () => dispatch({ type: "redo" }),
      duplicate: () => dispatch({ type: "duplicate-selected" }),
      nudge: (dx, dy) => dispatch({ type: "nudge", dx, dy }),
      escape: () => {
        tools.setMode("select");
        tools.setCalibrationPoints([]);
        select(null);
      },
      save,
      fit: tools.requestFit,
    },
    enabled,
  );
}
