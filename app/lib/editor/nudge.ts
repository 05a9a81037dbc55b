/**
 * Arrow-key nudging: moves the selected thing by (dx, dy) m on the plan. A selected section moves
 * the whole track (its start pose), since sections are chained and have no position of their own.
 */
import type { LayoutDocument } from "~/analysis";
import { moveBackground } from "./background";
import type { Selection } from "./editor-state";
import { moveBoundaryPoint, moveMarshalPoint, placeDriverStand } from "./site-ops";

/** Nudge steps, m: an arrow key alone, and with Shift. */
export const NUDGE_STEP = 0.1;
export const NUDGE_STEP_LARGE = 1;

const r = (v: number) => Math.round(v * 1000) / 1000;

/** The document with the selection moved; the same document when nothing is selected. */
export function nudge(doc: LayoutDocument, sel: Selection, dx: number, dy: number): LayoutDocument {
  if (!sel) return doc;
  switch (sel.kind) {
    case "section":
      return { ...doc, start: { ...doc.start, x: r(doc.start.x + dx), y: r(doc.start.y + dy) } };
    case "marshal": {
      const m = doc.marshalPoints[sel.index];
      return m ? moveMarshalPoint(doc, sel.index, { x: m.x + dx, y: m.y + dy }) : doc;
    }
    case "stand":
      return doc.driverStand
        ? placeDriverStand(doc, { x: doc.driverStand.x + dx, y: doc.driverStand.y + dy })
        : doc;
    case "boundary": {
      const p = doc.siteBoundary?.[sel.index];
      return p ? moveBoundaryPoint(doc, sel.index, { x: p[0] + dx, y: p[1] + dy }) : doc;
    }
    case "photo":
      return doc.background ? { ...doc, background: moveBackground(doc.background, dx, dy) } : doc;
  }
}
