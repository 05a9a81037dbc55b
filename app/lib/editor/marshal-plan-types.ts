import type { Hotspot, MarshalWarning, MarshalZone, PlanXY } from "~/analysis";

/** What POST /api/layouts/:layoutId/marshal-plan answers the editor (plan metres). */
export interface EditorMarshalPlan {
  settings: { reach: number; heatSize: number };
  /** The draft's marshal points in order ("M1", ...) with their warnings. */
  points: { id: string; x: number; y: number; warnings: MarshalWarning[] }[];
  zones: Pick<MarshalZone, "id" | "kind" | "title" | "polygon">[];
  /** The spots to watch (H1.., score 1 to 5), m. */
  hotspots: Pick<Hotspot, "id" | "kind" | "score" | "reason" | "x" | "y">[];
  /** The suggested set when asked for: as many points as the heat size, fewer when the ground has no room. */
  suggested: { asked: number; points: { x: number; y: number }[]; uncovered: string[] } | null;
}

/** The suggested points as the document's marshal points (to the centimetre), replacing the old ones. */
export function applySuggested<D extends { marshalPoints: { x: number; y: number }[] }>(
  doc: D,
  points: readonly { x: number; y: number }[],
): D {
  const r = (v: number) => Math.round(v * 100) / 100;
  return { ...doc, marshalPoints: points.map((p) => ({ x: r(p.x), y: r(p.y) })) };
}

/** One line per warning: "M2 · Inside a zone: ... Move it ...". */
export function warningLines(
  plan: Pick<EditorMarshalPlan, "points">,
): { id: string; text: string; moveTo: PlanXY | null }[] {
  return plan.points.flatMap((p) =>
    p.warnings.map((w) => ({ id: p.id, text: `${w.text} ${w.action}`, moveTo: w.moveTo })),
  );
}
