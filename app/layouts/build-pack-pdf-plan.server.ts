/**
 * The plan on the marking-out PDF, drawn to scale: site boundary, track edges and centre line,
 * the line from datum A to datum B, turn centres, jump lips and the centre-line stations (every
 * few numbered), with a scale bar and the grid north arrow.
 */
import { rgb, type PDFFont, type PDFPage } from "pdf-lib";
import type { BuildSheet } from "./build-pack-sheet.server";

type Box = { x: number; y: number; w: number; h: number };
type Pt = [number, number];

const INK = rgb(0.08, 0.11, 0.14);
const TRACK = rgb(0.55, 0.58, 0.62);
const PINE = rgb(0.12, 0.36, 0.3);
const CLAY = rgb(0.82, 0.41, 0.18);

/** Draws the sheet's plan into the box (PDF points, origin bottom left). */
export function drawPlan(page: PDFPage, box: Box, sheet: BuildSheet, font: PDFFont, bold: PDFFont): void {
  const { plan } = sheet;
  const marks: Pt[] = [
    ...sheet.datums.map((d): Pt => [d.x, d.y]),
    ...sheet.turns.map((t): Pt => [t.centre.x, t.centre.y]),
  ];
  const all = [...plan.left, ...plan.right, ...(plan.boundary ?? []), ...marks];
  const minX = Math.min(...all.map((p) => p[0]));
  const maxX = Math.max(...all.map((p) => p[0]));
  const minY = Math.min(...all.map((p) => p[1]));
  const maxY = Math.max(...all.map((p) => p[1]));
  const pad = 14;
  const scale = Math.min(
    (box.w - 2 * pad) / Math.max(maxX - minX, 1),
    (box.h - 2 * pad) / Math.max(maxY - minY, 1),
  );
  const ox = box.x + (box.w - (maxX - minX) * scale) / 2;
  const oy = box.y + (box.h - (maxY - minY) * scale) / 2;
  const P = (x: number, y: number) => ({ x: ox + (x - minX) * scale, y: oy + (y - minY) * scale });
  // drawSvgPath puts the SVG origin at (x, y) with y running down the page.
  const top = box.y + box.h;
  const path = (pts: Pt[], close = false) =>
    pts
      .map(([x, y], i) => `${i ? "L" : "M"}${(P(x, y).x - box.x).toFixed(2)} ${(top - P(x, y).y).toFixed(2)}`)
      .join(" ") + (close ? " Z" : "");
  const stroke = (pts: Pt[], color = TRACK, width = 0.6, dash?: number[], close = false) =>
    page.drawSvgPath(path(pts, close), {
      x: box.x,
      y: top,
      borderColor: color,
      borderWidth: width,
      borderDashArray: dash,
    });
  const label = (text: string, x: number, y: number, size = 6, f = font, color = INK) =>
    page.drawText(text, { x, y, size, font: f, color });

  page.drawRectangle({
    x: box.x,
    y: box.y,
    width: box.w,
    height: box.h,
    borderColor: TRACK,
    borderWidth: 0.5,
  });
  if (plan.boundary) stroke(plan.boundary, TRACK, 0.6, [3, 2], true);
  stroke(plan.left);
  stroke(plan.right);
  stroke(plan.centre, INK, 0.4, [1.5, 1.5]);

  const [a, b] = sheet.datums;
  stroke(
    [
      [a.x, a.y],
      [b.x, b.y],
    ],
    CLAY,
    0.8,
    [4, 2],
  );
  for (const [d, name] of [
    [a, "A"],
    [b, "B"],
  ] as const) {
    const p = P(d.x, d.y);
    page.drawSvgPath("M0 -5 L4.5 3 L-4.5 3 Z", { x: p.x, y: p.y, color: CLAY });
    label(name, p.x + 5, p.y + 2, 9, bold, CLAY);
  }
  for (const t of sheet.turns) {
    const p = P(t.centre.x, t.centre.y);
    page.drawLine({
      start: { x: p.x - 3, y: p.y },
      end: { x: p.x + 3, y: p.y },
      thickness: 0.6,
      color: PINE,
    });
    page.drawLine({
      start: { x: p.x, y: p.y - 3 },
      end: { x: p.x, y: p.y + 3 },
      thickness: 0.6,
      color: PINE,
    });
    label(`T${t.number}`, p.x + 3, p.y + 2, 6, font, PINE);
  }
  for (const j of sheet.jumps) {
    const lip = j.points.find((q) => q.kind === "jump-lip") ?? j.points[0];
    const p = P(lip.x, lip.y);
    page.drawRectangle({ x: p.x - 2, y: p.y - 2, width: 4, height: 4, color: CLAY });
    label(`J${j.number}`, p.x + 3, p.y - 7, 6.5, bold, CLAY);
  }
  const centres = sheet.stations.filter((s) => s.kind === "centre");
  const every = Math.max(1, Math.ceil(centres.length / 40));
  centres.forEach((s, i) => {
    const p = P(s.x, s.y);
    page.drawCircle({ x: p.x, y: p.y, size: 0.9, color: INK });
    if (i % every === 0) label(s.id, p.x + 2, p.y + 2, 5);
  });

  // Scale bar: the longest round length under a fifth of the box, and the grid north arrow.
  const metres = [500, 200, 100, 50, 20, 10, 5, 2].find((m) => m * scale <= box.w / 5) ?? 1;
  const sx = box.x + 8;
  const sy = box.y + 8;
  page.drawLine({
    start: { x: sx, y: sy },
    end: { x: sx + metres * scale, y: sy },
    thickness: 1.2,
    color: INK,
  });
  label(`${metres} m`, sx, sy + 3, 6.5);
  const nx = box.x + box.w - 14;
  const ny = box.y + box.h - 26;
  page.drawLine({ start: { x: nx, y: ny }, end: { x: nx, y: ny + 16 }, thickness: 0.8, color: INK });
  page.drawSvgPath("M0 0 L3 6 L-3 6 Z", { x: nx, y: ny + 22, color: INK });
  label("grid N", nx - 10, ny - 8, 6);
}
