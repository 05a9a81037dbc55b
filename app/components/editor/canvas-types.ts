/**
 * What the plan canvas needs and reports. Kept apart from the canvas itself so the editor's
 * panels can use the types without loading konva (which only the canvas chunk imports).
 */
import type { CentreLine, ResolvedSection, AnalysisOverlay, LayoutDocument } from "~/analysis";
import type { EditorMarshalPlan } from "~/lib/editor/marshal-plan-types";
import type { Point } from "~/lib/editor/drag-maths";
import type { Selection } from "~/lib/editor/editor-state";
import type { SnapSettings } from "~/lib/editor/snap";
import type { LengthUnit } from "~/lib/editor/units";

/**
 * What a click on the plan does: select things (and drag their handles), place a marshal point,
 * add a boundary corner, place the driver stand, pick a calibration point or move the photo.
 */
export type CanvasMode = "select" | "marshal" | "boundary" | "stand" | "calibrate" | "move-photo";

/** The marshal plan's zones and hotspots to draw (plan m); `stale` while a newer drawing is checked. */
export interface CanvasMarshal {
  zones: EditorMarshalPlan["zones"];
  hotspots: EditorMarshalPlan["hotspots"];
  stale: boolean;
}

export interface DrawingCanvasProps {
  doc: LayoutDocument;
  /** The document's sections chained from the start (computed once by the editor). */
  sections: ResolvedSection[];
  selection: Selection;
  /** False in the read-only plan for marshals and drivers: no handles, nothing moves. */
  editable: boolean;
  mode: CanvasMode;
  snap: SnapSettings;
  units: LengthUnit;
  overlay: AnalysisOverlay | null;
  /** The overlay was computed for an older drawing (shown faded until the new one arrives). */
  overlayStale: boolean;
  /** The centre line "Close the loop" proposes, drawn dashed over the track until applied or dismissed. */
  ghost?: CentreLine | null;
  /** Zones under the track and hotspots over it; null or absent draws none. */
  marshal?: CanvasMarshal | null;
  photoUrl: string | null;
  /** Increase to ask the canvas to fit the layout into view. */
  fitRequest: number;
  /** Calibration points picked so far, plan m. */
  calibrationPoints: Point[];
  onSelect(selection: Selection): void;
  /** A drag moved something: `gesture` is the same for every move of one drag. */
  onChange(doc: LayoutDocument, gesture: string, selection?: Selection): void;
  onGestureEnd(): void;
  /** A click on the plan in a placing mode, plan m. */
  onPlanClick(p: Point): void;
  /** The photo's size once loaded, px. */
  onPhotoSize?(width: number, height: number): void;
}
