/**
 * The plan on the corner-risk PDF, drawn to scale as vector lines: the track band and centre
 * line, the site boundary, each zone outlined (dashed) and hatched, the jumps (J), hotspots (H),
 * marshal points (M) and the driver stand, with a scale bar. Black-and-white safe: zones are
 * hatched and outlined, marks differ by shape and label. The J, M and H numbers and the stand's
 * name are placed by the one label placer every plan drawing uses, so none overlaps another.
 */
import { rgb, type PDFFont, type PDFPage } from "pdf-lib";
import { hatchSegments } from "~/lib/hatch";
import { placeLabels, type Box as LabelBox, type LabelRequest } from "~/lib/label-placer";
import { groupHotspots } from "~/lib/risk-sheet-rows";
import type { RiskSheet } from "./risk-sheet.server";

type Box = { x: number; y: number; w: number; h: number };
type Pt = readonly [number, number];

const INK = rgb(0.08, 0.11, 0.14);
const BAND = rgb(0.87, 0.82, 0.73);
const ZONE = rgb(0.64, 0.15, 0.11);
const MARSHAL = rgb(0.82, 0.41, 0.18);

/** Draws the sheet's plan into the box (PDF points, origin bottom left). */
export function drawRiskPlan(page: PDFPage, box: Box, sheet: RiskSheet, font: PDFFont, bold: PDFFont): void {
  const { overlay, site, plan } = sheet;
  const line: Pt[] = overlay.line.x.map((x, i) => [x, overlay.line.y[i]]);
  const all: Pt[] = [
    ...line,
    ...(site.siteBoundary ?? []),
    ...plan.zones.flatMap((z) => z.polygon),
    ...site.marshalPoints.map((m): Pt => [m.x, m.y]),
  ];
  const half = site.trackWidth / 2;
  const minX = Math.min(...all.map((p) => p[0])) - half;
  const maxX = Math.max(...all.map((p) => p[0])) + half;
  const minY = Math.min(...all.map((p) => p[1])) - half;
  const maxY = Math.max(...all.map((p) => p[1])) + half;
  const pad = 12;
  const scale = Math.min(
    (box.w - 2 * pad) / Math.max(maxX - minX, 1),
    (box.h - 2 * pad) / Math.max(maxY - minY, 1),
  );
  const ox = box.x + (box.w - (maxX - minX) * scale) / 2;
  const oy = box.y + (box.h - (maxY - minY) * scale) / 2;
  const P = (p: Pt) => ({ x: ox + (p[0] - minX) * scale, y: oy + (p[1] - minY) * scale });
  const top = box.y + box.h;
  // drawSvgPath puts the SVG origin at (x, y) with y running down the page.
  const path = (pts: readonly Pt[], close = false) =>
    pts
      .map((q, i) => `${i ? "L" : "M"}${(P(q).x - box.x).toFixed(2)} ${(top - P(q).y).toFixed(2)}`)
      .join(" ") + (close ? " Z" : "");
  const stroke = (pts: readonly Pt[], color = INK, width = 0.6, dash?: number[], close = false) =>
    page.drawSvgPath(path(pts, close), {
      x: box.x,
      y: top,
      borderColor: color,
      borderWidth: width,
      borderDashArray: dash,
    });
  const label = (text: string, at: { x: number; y: number }, size: number, f = bold, color = INK) =>
    page.drawText(text, { x: at.x, y: at.y, size, font: f, color });
  // Labels go to the placer (y down: the page's y negated), then are drawn in one pass at the end.
  const wanted: (LabelRequest & { text: string; size: number; f: PDFFont })[] = [];
  const obstacles: LabelBox[] = [];
  const want = (
    id: string,
    text: string,
    at: { x: number; y: number },
    size: number,
    f: PDFFont,
    priority: number,
    mark: number,
  ) => {
    obstacles.push({ x: at.x - mark, y: -at.y - mark, width: 2 * mark, height: 2 * mark });
    wanted.push({
      id,
      text,
      size,
      f,
      anchor: { x: at.x, y: -at.y },
      width: f.widthOfTextAtSize(text, size) + 1,
      height: size * 1.15,
      priority,
      offset: mark + 0.8,
    });
  };

  page.drawRectangle({ x: box.x, y: box.y, width: box.w, height: box.h, borderColor: INK, borderWidth: 0.4 });
  if (site.siteBoundary) stroke(site.siteBoundary, INK, 0.6, [3, 2], true);
  for (const z of plan.zones) {
    const pts = z.polygon.map((q) => P(q));
    for (const [a, b] of hatchSegments(
      pts.map((p) => [p.x, p.y] as const),
      4,
    ))
      page.drawLine({ start: { x: a[0], y: a[1] }, end: { x: b[0], y: b[1] }, thickness: 0.4, color: ZONE });
    stroke(z.polygon, ZONE, 0.8, [3, 1.5], true);
  }
  // The track band as a wide stroke of the track's width, then the centre line.
  page.drawSvgPath(path(line, true), {
    x: box.x,
    y: top,
    borderColor: BAND,
    borderWidth: site.trackWidth * scale,
  });
  stroke(line, INK, 0.4, [1.5, 1.5], true);

  for (const g of groupHotspots(plan.hotspots, 6 / scale)) {
    const p = P([g.x, g.y]);
    page.drawSvgPath("M0 -3 L2.6 2 L-2.6 2 Z", {
      x: p.x,
      y: p.y,
      color: rgb(1, 1, 1),
      borderColor: INK,
      borderWidth: 0.7,
    });
    want(`hotspot-${g.ids[0]}`, g.ids.join(","), p, 5.5, font, 85, 3);
  }
  for (const j of overlay.jumps) {
    const mark = plan.jumps.find((m) => m.sectionId === j.sectionId);
    const p = P(j.lip);
    page.drawRectangle({ x: p.x - 2.5, y: p.y - 2.5, width: 5, height: 5, color: INK });
    if (mark) want(`jump-${j.sectionId}`, mark.id, p, 7.5, bold, 100, 3);
  }
  site.marshalPoints.forEach((m, i) => {
    const p = P([m.x, m.y]);
    page.drawSvgPath("M0 -4 L4 0 L0 4 L-4 0 Z", {
      x: p.x,
      y: p.y,
      color: MARSHAL,
      borderColor: INK,
      borderWidth: 0.6,
    });
    want(`marshal-${i}`, `M${i + 1}`, p, 8, bold, 90, 4);
  });
  if (site.driverStand) {
    const p = P([site.driverStand.x, site.driverStand.y]);
    page.drawRectangle({ x: p.x - 3, y: p.y - 3, width: 6, height: 6, borderColor: INK, borderWidth: 0.8 });
    want("stand", "Driver stand", p, 6.5, font, 70, 3);
  }
  const metres = [500, 200, 100, 50, 20, 10, 5, 2].find((m) => m * scale <= box.w / 5) ?? 1;
  const sx = box.x + 8;
  const sy = box.y + 8;
  page.drawLine({
    start: { x: sx, y: sy },
    end: { x: sx + metres * scale, y: sy },
    thickness: 1.2,
    color: INK,
  });
  label(`${metres} m`, { x: sx, y: sy + 3 }, 6.5, font);
  obstacles.push({ x: sx, y: -(sy + 10), width: Math.max(metres * scale, 24), height: 11 });
  const { placed } = placeLabels(wanted, {
    bounds: { x: box.x + 1, y: -(top - 1), width: box.w - 2, height: box.h - 2 },
    obstacles,
    gap: 0.6,
  });
  const byId = new Map(wanted.map((w) => [w.id, w]));
  for (const p of placed) {
    const w = byId.get(p.id)!;
    label(w.text, { x: p.x + 0.5, y: -(p.y + p.height) + w.size * 0.25 }, w.size, w.f);
  }
}
