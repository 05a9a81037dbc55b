/**
 * What the editor's live overlay and the plan view draw from an analysis: a compact summary that
 * the analysis API returns beside the full result (`overlay` field of POST /api/analysis and
 * GET /api/layouts/:layoutId/analysis). Plan coordinates in metres, speeds in m/s.
 */
import type { VerdictKind } from "../words";

export interface AnalysisOverlay {
  /** Car class the speeds are for. */
  classId: string;
  lapLength: number;
  lapTime: number;
  closure: { gap: number; headingDeg: number };
  /** The racing (centre) line downsampled to about every 0.5 m: flat arrays of equal length. */
  line: { x: number[]; y: number[]; speed: number[]; sectionIndex: number[] };
  /** Speed range used for the colour scale (m/s). */
  speedRange: { min: number; max: number };
  jumps: OverlayJump[];
  /** Stretches of the track hidden from the driver stand, as polylines. */
  hidden: { points: [number, number][]; length: number }[];
  /** Stretches where two lanes come closer than the track width plus the margin. */
  laneConflicts: { a: [number, number]; b: [number, number]; distance: number }[];
  /** Rule checks that fail, in plain words. */
  ruleFailures: { id: string; label: string; measured: string; required: string }[];
}

export interface OverlayJump {
  sectionId: string;
  /** Where the lip and the touchdown are in plan, m. */
  lip: [number, number];
  landing: [number, number] | null;
  /** Verdict for the chosen skill level. "cannot-clear": the approach is too short to clear it. */
  verdict: VerdictKind;
  /** Short text beside the marker: the verdict's word and its reason, e.g. "Take it straight: no turn at the landing". */
  label: string;
  takeoffSpeed: number;
  airtime: number;
}
