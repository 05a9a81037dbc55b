/**
 * The labels of both plan drawings come from the one label placer: on the demo layouts none
 * overlaps another or leaves the drawing, and the J and M numbers are always there.
 */
import { describe, expect, it } from "vitest";
import { resolveSections, sampleCentreLine, type AnalysisOverlay, type LayoutDocument } from "~/analysis";
import { canvasLabels } from "~/components/editor/canvas/canvas-labels";
import { drawingLabels } from "~/components/drawing/drawing-labels";
import { extent } from "~/components/drawing/drawing-geometry";
import { makePen } from "~/components/drawing/track-pen";
import { DEMO_LAYOUTS } from "~/db/demo-layouts";
import { fitView, layoutBounds } from "~/lib/editor/view";
import { boxesOverlap, placeLabels, type Box } from "~/lib/label-placer";

/** An overlay made from the drawing itself: speeds rising and falling, every jump with its lip. */
function overlayOf(doc: LayoutDocument): AnalysisOverlay {
  const sections = resolveSections(doc);
  const line = sampleCentreLine(sections, 0.5);
  const x = Array.from(line.x);
  const speed = x.map((_, i) => 8 + 4 * Math.sin(i / 25));
  const jumps = sections
    .filter((r) => r.profile)
    .map((r) => {
      const d = r.profile!.d[r.profile!.lipIndex];
      const lip: [number, number] = [
        r.start.x + d * Math.cos(r.start.heading),
        r.start.y + d * Math.sin(r.start.heading),
      ];
      return {
        sectionId: r.id,
        lip,
        landing: [lip[0] + 3 * Math.cos(r.start.heading), lip[1] + 3 * Math.sin(r.start.heading)] as [
          number,
          number,
        ],
        verdict: "straight" as const,
        label: "Take it straight: no turn at the landing",
        takeoffSpeed: 9,
        airtime: 0.6,
      };
    });
  return {
    classId: "buggy-2wd-10",
    lapLength: line.length,
    lapTime: 30,
    closure: { gap: 0, headingDeg: 0 },
    line: { x, y: Array.from(line.y), speed, sectionIndex: Array.from(line.section) },
    speedRange: { min: 4, max: 12 },
    jumps,
    hidden: [],
    laneConflicts: [{ a: [10, 2], b: [10, 6], distance: 1.2 }],
    ruleFailures: [],
  };
}

function expectApart(boxes: Box[], bounds: Box) {
  for (let i = 0; i < boxes.length; i++) {
    const b = boxes[i];
    expect(b.x).toBeGreaterThanOrEqual(bounds.x - 1e-9);
    expect(b.y).toBeGreaterThanOrEqual(bounds.y - 1e-9);
    expect(b.x + b.width).toBeLessThanOrEqual(bounds.x + bounds.width + 1e-9);
    expect(b.y + b.height).toBeLessThanOrEqual(bounds.y + bounds.height + 1e-9);
    for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(b, boxes[j])).toBe(false);
  }
}

describe("the plan labels of the demo layouts", () => {
  for (const doc of DEMO_LAYOUTS) {
    it(`${doc.name}: the layout page's drawing (SVG)`, () => {
      const overlay = overlayOf(doc);
      const pts = overlay.line.x.map((x, i) => [x, overlay.line.y[i]] as [number, number]);
      const box = extent(pts, doc.trackWidth + 2);
      const pen = makePen(Math.max(box.maxX - box.minX, box.maxY - box.minY));
      const numbers = Object.fromEntries(overlay.jumps.map((j, k) => [j.sectionId, k + 1]));
      const labels = drawingLabels({ overlay, site: doc, pts, numbers, pen, box });
      expectApart([...labels.values()], {
        x: box.minX,
        y: -box.maxY,
        width: box.maxX - box.minX,
        height: box.maxY - box.minY,
      });
      for (const j of overlay.jumps)
        expect(labels.get(`jump-${j.sectionId}`)?.text).toBe(`J${numbers[j.sectionId]}`);
      doc.marshalPoints.forEach((_, i) => expect(labels.get(`marshal-${i}`)?.text).toBe(`M${i + 1}`));
      expect(labels.has("start")).toBe(true);
    });

    it(`${doc.name}: the editor's canvas at the fitted zoom`, () => {
      const overlay = overlayOf(doc);
      const sections = resolveSections(doc);
      const width = 900;
      const height = 560;
      const view = fitView(layoutBounds(doc, sampleCentreLine(sections, 1)), width, height);
      const input = {
        doc,
        sections,
        view,
        width,
        height,
        overlay,
        selectedSection: 2,
        editable: true,
        units: "m" as const,
        calibrationPoints: [],
        measure: (text: string, font: { size: number }) => text.length * font.size * 0.6,
      };
      const { labels, obstacles } = canvasLabels(input);
      const { placed, dropped } = placeLabels(labels, {
        bounds: { x: 0, y: 0, width, height },
        obstacles,
        gap: 1,
      });
      expectApart(placed, { x: 0, y: 0, width, height });
      for (const p of placed) for (const o of obstacles) expect(boxesOverlap(p, o)).toBe(false);
      const ids = new Set(placed.map((p) => p.id));
      for (const j of overlay.jumps) expect(ids.has(`jump-${j.sectionId}`)).toBe(true);
      doc.marshalPoints.forEach((_, i) => expect(ids.has(`marshal-${i}`)).toBe(true));
      // what gives way first is the least important: section numbers and verdict words
      for (const id of dropped) expect(id).toMatch(/^(section|verdict|hidden|conflict)-/);
    });
  }

  it("the editor's hotspot numbers join the canvas's placer: apart from every label and mark, J and M numbers kept", () => {
    const doc = DEMO_LAYOUTS[0];
    const overlay = overlayOf(doc);
    const sections = resolveSections(doc);
    const width = 900;
    const height = 560;
    const view = fitView(layoutBounds(doc, sampleCentreLine(sections, 1)), width, height);
    // A hotspot at every jump's lip: the worst crowding the editor can have.
    const hotspots = overlay.jumps.map((j, k) => ({
      id: `H${k + 1}`,
      kind: "overshoot" as const,
      score: 3,
      reason: "",
      x: j.lip[0],
      y: j.lip[1],
    }));
    const { labels, obstacles } = canvasLabels({
      doc,
      sections,
      view,
      width,
      height,
      overlay,
      selectedSection: null,
      editable: true,
      units: "m" as const,
      calibrationPoints: [],
      marshal: { zones: [], hotspots, stale: false },
      measure: (text: string, font: { size: number }) => text.length * font.size * 0.6,
    });
    expect(labels.filter((l) => l.kind === "hotspot").length).toBeGreaterThan(0);
    const { placed } = placeLabels(labels, { bounds: { x: 0, y: 0, width, height }, obstacles, gap: 1 });
    expectApart(placed, { x: 0, y: 0, width, height });
    for (const p of placed) for (const o of obstacles) expect(boxesOverlap(p, o)).toBe(false);
    const ids = new Set(placed.map((p) => p.id));
    for (const j of overlay.jumps) expect(ids.has(`jump-${j.sectionId}`)).toBe(true);
    doc.marshalPoints.forEach((_, i) => expect(ids.has(`marshal-${i}`)).toBe(true));
    expect([...ids].some((id) => id.startsWith("hotspot-"))).toBe(true);
  });

  it("the corner-risk sheet's hotspot numbers join the same placer: none lands on a J or M number", () => {
    const doc = DEMO_LAYOUTS[0];
    const overlay = overlayOf(doc);
    const pts = overlay.line.x.map((x, i) => [x, overlay.line.y[i]] as [number, number]);
    const box = extent(pts, doc.trackWidth + 2);
    const pen = makePen(Math.max(box.maxX - box.minX, box.maxY - box.minY));
    const numbers = Object.fromEntries(overlay.jumps.map((j, k) => [j.sectionId, k + 1]));
    // A hotspot at every jump's lip and every marshal point: the worst crowding a sheet can have.
    const extra = [
      ...overlay.jumps.map((j, k) => ({
        id: `hotspot-H${k + 1}`,
        text: `H${k + 1}`,
        x: j.lip[0],
        y: j.lip[1],
      })),
      ...doc.marshalPoints.map((m, k) => ({ id: `hotspot-HM${k + 1}`, text: `H${20 + k}`, x: m.x, y: m.y })),
    ].map((e) => ({ ...e, mark: 0.4, size: 0.6, priority: 85 }));
    const labels = drawingLabels({ overlay, site: doc, pts, numbers, pen, box, extra });
    expectApart([...labels.values()], {
      x: box.minX,
      y: -box.maxY,
      width: box.maxX - box.minX,
      height: box.maxY - box.minY,
    });
    for (const j of overlay.jumps)
      expect(labels.get(`jump-${j.sectionId}`)?.text).toBe(`J${numbers[j.sectionId]}`);
    for (const e of extra) expect(labels.get(e.id)?.text).toBe(e.text);
  });
});
