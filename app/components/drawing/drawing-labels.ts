/**
 * The layout page's drawing's labels (SVG, plan metres with y down), placed by the one label
 * placer the editor's canvas uses too (app/lib/label-placer.ts): J and M numbers, the start, the
 * driver stand, the lanes too close and the speeds along the lap. Widths are estimated from the
 * number of characters (the page is drawn on the server, where text cannot be measured).
 */
import type { AnalysisOverlay, LayoutDocument } from "~/analysis";
import { placeLabels, type Box, type LabelRequest } from "~/lib/label-placer";
import type { Extent } from "./drawing-geometry";
import { speedLabels } from "./drawing-geometry";
import type { Pen } from "./track-pen";

/** A placed label: its box, its text and its text size (m). */
export interface DrawingLabel extends Box {
  text: string;
  size: number;
  bold: boolean;
}

/** Width of a character of Inter, as a share of the text size (digits and capitals; a little generous). */
const CHAR_WIDTH = 0.62;

export interface DrawingLabelInput {
  overlay: AnalysisOverlay;
  site: Pick<LayoutDocument, "driverStand" | "marshalPoints" | "trackWidth">;
  /** The centre line's points, plan m. */
  pts: [number, number][];
  numbers: Record<string, number>;
  pen: Pen;
  box: Extent;
  /** Labels another page adds to the drawing (the corner-risk sheet's hotspot numbers). */
  extra?: readonly ExtraLabel[];
}

/** A label another page adds: its text at a plan point (m), with the mark drawn there. */
export interface ExtraLabel {
  id: string;
  text: string;
  x: number;
  y: number;
  /** Half the size of the mark at the point, as a multiple of the text size (kept clear). */
  mark: number;
  /** Text size as a multiple of the drawing's (default 0.7). */
  size?: number;
  /** Who gives way: J and M numbers are 100 and 90, speeds 25 to 30 (default 50). */
  priority?: number;
}

/** Mark sizes of the drawing as multiples of the text size: verdict mark, marshal diamond, stand. */
export const MARK = { jump: 0.75, marshal: 0.6, stand: 0.6 } as const;

/** Every label of the drawing placed, by id ("jump-<sectionId>", "marshal-0", "start", ...). */
export function drawingLabels({ overlay, site, pts, numbers, pen, box, extra = [] }: DrawingLabelInput) {
  const { fs } = pen;
  const requests: (LabelRequest & { text: string; size: number; bold: boolean })[] = [];
  const obstacles: Box[] = [];
  const svg = (x: number, y: number) => ({ x, y: -y });
  const add = (
    id: string,
    text: string,
    at: { x: number; y: number },
    size: number,
    o: Partial<LabelRequest> & { bold?: boolean },
  ) => {
    const pad = size * 0.15;
    requests.push({
      id,
      text,
      size,
      bold: o.bold ?? false,
      anchor: at,
      width: text.length * size * CHAR_WIDTH + 2 * pad,
      height: size * 1.2 + 2 * pad,
      priority: o.priority ?? 0,
      offset: o.offset ?? 0,
    });
  };
  const square = (at: { x: number; y: number }, half: number) =>
    obstacles.push({ x: at.x - half, y: at.y - half, width: 2 * half, height: 2 * half });

  overlay.jumps.forEach((j) => {
    const at = svg(j.lip[0], j.lip[1]);
    square(at, fs * MARK.jump);
    add(`jump-${j.sectionId}`, `J${numbers[j.sectionId]}`, at, fs * 0.9, {
      priority: 100,
      offset: fs * MARK.jump * 1.2,
      bold: true,
    });
  });
  site.marshalPoints.forEach((m, i) => {
    const at = svg(m.x, m.y);
    square(at, fs * MARK.marshal);
    add(`marshal-${i}`, `M${i + 1}`, at, fs * 0.8, { priority: 90, offset: fs * MARK.marshal * 1.2 });
  });
  if (pts.length)
    add("start", "Start", svg(pts[0][0], pts[0][1]), fs, {
      priority: 80,
      offset: site.trackWidth * 0.6 + fs * 0.2,
    });
  if (site.driverStand) {
    const at = svg(site.driverStand.x, site.driverStand.y);
    square(at, fs * MARK.stand);
    add("stand", "Driver stand", at, fs, { priority: 70, offset: fs * MARK.stand * 1.2 });
  }
  extra.forEach((e) => {
    const at = svg(e.x, e.y);
    square(at, fs * e.mark);
    add(e.id, e.text, at, fs * (e.size ?? 0.7), {
      priority: e.priority ?? 50,
      offset: fs * e.mark * 1.2,
      bold: true,
    });
  });
  overlay.laneConflicts.forEach((c, i) => {
    const at = svg((c.a[0] + c.b[0]) / 2, (c.a[1] + c.b[1]) / 2);
    add(`conflict-${i}`, `${c.distance.toFixed(1)} m apart`, at, fs * 0.8, {
      priority: 60,
      offset: fs * 0.2,
    });
  });
  const speed = overlay.line.speed;
  for (const l of speedLabels(speed, 1, Math.max(10, Math.round(pts.length / 14)))) {
    const [x, y] = pts[l.index];
    const text = `${l.kind === "min" ? "\u25bc" : "\u25b2"}${l.speed.toFixed(1)}`;
    add(`speed-${l.index}`, text, svg(x, y), fs * 0.85, {
      priority: l.kind === "min" ? 30 : 25,
      offset: site.trackWidth / 2,
    });
  }
  const bounds = { x: box.minX, y: -box.maxY, width: box.maxX - box.minX, height: box.maxY - box.minY };
  const { placed } = placeLabels(requests, { bounds, obstacles, gap: fs * 0.1 });
  const byId = new Map(requests.map((r) => [r.id, r]));
  return new Map<string, DrawingLabel>(
    placed.map((p) => {
      const r = byId.get(p.id)!;
      return [
        p.id,
        { x: p.x, y: p.y, width: p.width, height: p.height, text: r.text, size: r.size, bold: r.bold },
      ];
    }),
  );
}
