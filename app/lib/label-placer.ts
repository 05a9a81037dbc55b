/**
 * The one label placer of every plan drawing: the editor's canvas (konva, screen pixels) and the
 * layout page's drawing (SVG, metres) both ask it where their labels go
 * (docs/decisions/0513-one-label-placer.md). Pure: boxes in, boxes out, any unit, y down.
 *
 * Greedy by importance: the most important label is placed first at the first of its positions
 * around its anchor that stays inside the drawing and clear of every label already placed and of
 * every obstacle (symbols, buttons over the canvas); a label with no such position is dropped, so
 * the least important go first when there is no room. Two placed labels never overlap.
 */

/** A rectangle: top-left corner, width and height (y grows downwards). */
export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

export type LabelPosition =
  | "right"
  | "above"
  | "left"
  | "below"
  | "above-right"
  | "above-left"
  | "below-right"
  | "below-left"
  | "centre";

export interface LabelRequest {
  id: string;
  /** The point the label names (a symbol's centre, a point of the track). */
  anchor: { x: number; y: number };
  width: number;
  height: number;
  /** Higher is more important: placed first, dropped last. */
  priority: number;
  /** Gap between the anchor and the label's nearest side (the symbol's radius), default 0. */
  offset?: number;
  /** Positions to try, in order of preference; default DEFAULT_POSITIONS. */
  positions?: readonly LabelPosition[];
}

export interface PlacedLabel extends Box {
  id: string;
  position: LabelPosition;
}

export const DEFAULT_POSITIONS: readonly LabelPosition[] = [
  "right",
  "above",
  "left",
  "below",
  "above-right",
  "below-right",
  "above-left",
  "below-left",
];

export interface PlaceOptions {
  /** The drawing: labels stay wholly inside it. */
  bounds: Box;
  /** Boxes no label may cover. */
  obstacles?: readonly Box[];
  /** Space kept between labels, and between a label and an obstacle or the edge (default 0). */
  gap?: number;
}

/** True when the boxes share some area (touching edges do not count). */
export function boxesOverlap(a: Box, b: Box, gap = 0): boolean {
  return (
    a.x < b.x + b.width + gap &&
    b.x < a.x + a.width + gap &&
    a.y < b.y + b.height + gap &&
    b.y < a.y + a.height + gap
  );
}

/** The label's box at one position around its anchor. */
export function boxAt(r: LabelRequest, position: LabelPosition, offset = r.offset ?? 0): Box {
  const { x, y } = r.anchor;
  const w = r.width;
  const h = r.height;
  const d = offset;
  // A corner position keeps the box's corner a little in from the anchor's diagonal.
  const c = d * Math.SQRT1_2;
  switch (position) {
    case "right":
      return { x: x + d, y: y - h / 2, width: w, height: h };
    case "left":
      return { x: x - d - w, y: y - h / 2, width: w, height: h };
    case "above":
      return { x: x - w / 2, y: y - d - h, width: w, height: h };
    case "below":
      return { x: x - w / 2, y: y + d, width: w, height: h };
    case "above-right":
      return { x: x + c, y: y - c - h, width: w, height: h };
    case "above-left":
      return { x: x - c - w, y: y - c - h, width: w, height: h };
    case "below-right":
      return { x: x + c, y: y + c, width: w, height: h };
    case "below-left":
      return { x: x - c - w, y: y + c, width: w, height: h };
    case "centre":
      return { x: x - w / 2, y: y - h / 2, width: w, height: h };
  }
}

function inside(b: Box, bounds: Box, gap: number): boolean {
  return (
    b.x >= bounds.x + gap &&
    b.y >= bounds.y + gap &&
    b.x + b.width <= bounds.x + bounds.width - gap &&
    b.y + b.height <= bounds.y + bounds.height - gap
  );
}

/**
 * Places the labels. Each is tried at its positions at its offset, then once more at twice the
 * offset plus its own height (a second ring further out) before it is dropped.
 * @returns the placed labels (in the order they were placed) and the ids of those dropped.
 */
export function placeLabels(
  requests: readonly LabelRequest[],
  options: PlaceOptions,
): { placed: PlacedLabel[]; dropped: string[] } {
  const gap = options.gap ?? 0;
  const obstacles = options.obstacles ?? [];
  const order = requests.map((r, k) => ({ r, k })).sort((a, b) => b.r.priority - a.r.priority || a.k - b.k);
  const placed: PlacedLabel[] = [];
  const dropped: string[] = [];
  for (const { r } of order) {
    const positions = r.positions ?? DEFAULT_POSITIONS;
    const base = r.offset ?? 0;
    let found: PlacedLabel | null = null;
    for (const offset of [base, 2 * base + r.height]) {
      for (const position of positions) {
        const b = boxAt(r, position, offset);
        if (!inside(b, options.bounds, gap)) continue;
        if (placed.some((p) => boxesOverlap(b, p, gap))) continue;
        if (obstacles.some((o) => boxesOverlap(b, o, gap))) continue;
        found = { id: r.id, position, ...b };
        break;
      }
      if (found) break;
    }
    if (found) placed.push(found);
    else dropped.push(r.id);
  }
  return { placed, dropped };
}
