/**
 * The corner-risk sheet's words, columns and rows, shared by its web page and its PDF so both say
 * the same thing in the same order (decision 0712). Pure: it takes the engine's marshal plan.
 */
import {
  HOTSPOT_KIND_WORDS,
  listWords,
  num,
  scoreWords,
  WARNING_KIND_WORDS,
  type Hotspot,
  type MarshalPlan,
  type MarshalPointReport,
} from "~/analysis";

export const RISK_SHEET_TITLE = "Corner-risk sheet";

/** The table's columns, in order, with their share of the width (PDF points on A4 portrait). */
export const POINT_COLUMNS = [
  { id: "point", title: "Point", width: 34 },
  { id: "stretch", title: "Stretch of the lap", width: 86 },
  { id: "watch", title: "What to watch", width: 170 },
  { id: "marks", title: "Jumps, turns", width: 70 },
  { id: "warnings", title: "Warnings", width: 163 },
] as const;
export type PointColumnId = (typeof POINT_COLUMNS)[number]["id"];
export type PointRow = Record<PointColumnId, string>;

/** What a marshal at the track side does, then who decides: the sheet's safety cautions. */
export const MARSHAL_CAUTIONS = [
  "Stay out of the hatched zones: cars that overshoot a landing or miss a turn end up there.",
  "Keep off the outside of fast turns; stand on the inside or well back.",
  "Face the traffic at all times, and stay low when you are close to the track.",
  "Wear closed shoes, eye protection and hi-vis.",
  "Wait for a gap in the traffic before you step onto the track to right a car.",
  "This sheet is an estimate from the drawing and the car class data, not a safety certification.",
  "The race director and your sanctioning body's current rules decide where marshals stand.",
] as const;

/** "12 to 40 m (28 m)", the lap distances from the start line. */
export function stretchText(p: Pick<MarshalPointReport, "stretch">): string {
  const { fromS, toS, length } = p.stretch;
  const across = toS < fromS ? ", across the start" : "";
  return `${num(fromS)} to ${num(toS)} m from the start (${num(length)} m${across})`;
}

/** Which side of the track and how far from its edge. */
export function placeText(p: Pick<MarshalPointReport, "side" | "edgeDistance">): string {
  return p.edgeDistance < 0 ? "on the track" : `${num(p.edgeDistance)} m from the ${p.side}-hand edge`;
}

/** The hotspots a point watches, most dangerous first: "H3 Hard landing (4, very dangerous)". */
export function watchText(p: MarshalPointReport, hotspots: readonly Hotspot[]): string {
  const byId = new Map(hotspots.map((h) => [h.id, h]));
  const items = p.watch.map((w) => {
    const h = byId.get(w.hotspotId);
    const kind = h ? HOTSPOT_KIND_WORDS[h.kind] : "";
    const far = w.covered ? "" : `, ${num(w.distance)} m away`;
    return `${w.hotspotId} ${kind} (${w.score}, ${scoreWords(w.score)}${far})`;
  });
  return items.length ? items.join("; ") : "No hotspot in this stretch: watch the traffic.";
}

/** "J1, J2; T3", or a dash. */
export function marksText(p: Pick<MarshalPointReport, "jumps" | "turns">): string {
  const parts = [p.jumps.join(", "), p.turns.join(", ")].filter(Boolean);
  return parts.length ? parts.join("; ") : "-";
}

/** Each warning with what to do. */
export function warningTexts(p: Pick<MarshalPointReport, "warnings">): string[] {
  return p.warnings.map((w) => `${WARNING_KIND_WORDS[w.kind]}: ${w.text} ${w.action}`);
}

/** One row per marshal point, in the plan's order. */
export function pointRows(plan: Pick<MarshalPlan, "points" | "hotspots">): PointRow[] {
  return plan.points.map((p) => ({
    point: p.id,
    stretch: `${stretchText(p)}; ${placeText(p)}`,
    watch: watchText(p, plan.hotspots),
    marks: marksText(p),
    warnings: warningTexts(p).join(" ") || "None",
  }));
}

/** One line per hotspot: "H2 · 4 very dangerous · Hard landing: reason". */
export function hotspotLine(h: Hotspot): string {
  return `${h.id} · score ${h.score} (${scoreWords(h.score)}) · ${HOTSPOT_KIND_WORDS[h.kind]}: ${h.reason}`;
}

/** "J1 Tabletop, J2 Hairpin double and T3 ..." for the legend under the plan. */
export function marksLegend(plan: Pick<MarshalPlan, "jumps">): string {
  return listWords(plan.jumps.map((j) => j.title));
}

/** Hotspots closer than `near` (m) to the first of a group share one mark: "H9,H10,H11". */
export function groupHotspots(
  hotspots: readonly Pick<Hotspot, "id" | "x" | "y">[],
  near: number,
): { ids: string[]; x: number; y: number }[] {
  const groups: { ids: string[]; x: number; y: number }[] = [];
  for (const h of hotspots) {
    const g = groups.find((q) => Math.hypot(q.x - h.x, q.y - h.y) < near);
    if (g) g.ids.push(h.id);
    else groups.push({ ids: [h.id], x: h.x, y: h.y });
  }
  return groups;
}
