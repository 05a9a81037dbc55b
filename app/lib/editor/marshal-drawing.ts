/**
 * The marshal plan drawn on the editor's plan canvas, in screen space: each zone's outline and the
 * hatch lines inside it (the same 45° hatching as the corner-risk sheet, so it reads in black and
 * white), and whether an answer still fits the drawing. Pure: no konva.
 */
import type { Hotspot, LayoutDocument, PlanXY } from "~/analysis";
import { hatchSegments } from "~/lib/hatch";
import { groupHotspots } from "~/lib/risk-sheet-rows";
import { worldToScreen, type View } from "./view";

/** Hatch lines this many px apart, whatever the zoom. */
export const ZONE_HATCH_PX = 9;
/** Half a hotspot triangle, px; hotspots closer than 2.5 of these share one mark. */
export const HOTSPOT_MARK_PX = 7;

export interface ZoneOnScreen {
  /** The outline as konva points [x1, y1, x2, y2, ...], px. */
  outline: number[];
  /** Hatch segments as [x1, y1, x2, y2], px. */
  hatch: [number, number, number, number][];
}

/** A zone polygon (plan m, Y up) as screen points and hatch lines `spacing` px apart. */
export function zoneOnScreen(polygon: readonly PlanXY[], view: View, spacing = ZONE_HATCH_PX): ZoneOnScreen {
  const screen = polygon.map(([x, y]) => {
    const p = worldToScreen(view, { x, y });
    return [p.x, p.y] as const;
  });
  return {
    outline: screen.flat(),
    hatch: hatchSegments(screen, spacing, 45).map(([a, b]) => [a[0], a[1], b[0], b[1]]),
  };
}

/**
 * True when a marshal plan made for `planDoc` still stands in the right place on `doc`: the same
 * track (sections, start, width) and car classes. Otherwise its zones would be drawn in the wrong
 * place and are hidden until the new answer; when only the points or the site changed they are
 * shown faded.
 */
export function marshalPlanFits(
  planDoc: Pick<LayoutDocument, "sections" | "start" | "trackWidth" | "carClasses"> | null,
  doc: Pick<LayoutDocument, "sections" | "start" | "trackWidth" | "carClasses">,
): boolean {
  return (
    planDoc !== null &&
    planDoc.sections === doc.sections &&
    planDoc.start === doc.start &&
    planDoc.trackWidth === doc.trackWidth &&
    planDoc.carClasses === doc.carClasses
  );
}

/** The hotspot marks on screen: close hotspots share one ("H3,H4"), at the first one's spot, px. */
export function hotspotMarks(
  hotspots: readonly Pick<Hotspot, "id" | "x" | "y">[],
  view: View,
): { ids: string[]; x: number; y: number }[] {
  return groupHotspots(hotspots, (HOTSPOT_MARK_PX * 2.5) / view.scale).map((g) => ({
    ids: g.ids,
    ...worldToScreen(view, g),
  }));
}
