import { describe, expect, it } from "vitest";
import { layoutGeometry, starterDocument } from "~/analysis";
import {
  addBoundaryPoint,
  addMarshalPoint,
  deleteBoundaryPoint,
  deleteMarshalPoint,
  distanceToSegment,
  moveMarshalPoint,
  placeDriverStand,
  rectangleBoundary,
  removeDriverStand,
  setTrackWidth,
} from "~/lib/editor/site-ops";
import { fitView, layoutBounds, screenToWorld, worldToScreen, zoomAt } from "~/lib/editor/view";

const doc = () => starterDocument("Site test", 3);

describe("site operations", () => {
  it("adds, moves and removes marshal points (numbered by their order)", () => {
    const one = addMarshalPoint(doc(), { x: 1.23456, y: 2 })!;
    expect(one.doc.marshalPoints).toEqual([{ x: 1.235, y: 2 }]);
    const two = addMarshalPoint(one.doc, { x: 5, y: 5 })!;
    expect(two.index).toBe(1);
    expect(moveMarshalPoint(two.doc, 0, { x: 9, y: 9 }).marshalPoints[0]).toEqual({ x: 9, y: 9 });
    expect(deleteMarshalPoint(two.doc, 0).marshalPoints).toEqual([{ x: 5, y: 5 }]);
  });

  it("places the driver stand with a default eye height, keeps a set one when moved, and removes it", () => {
    const placed = placeDriverStand(doc(), { x: 3, y: -6 });
    expect(placed.driverStand).toEqual({ x: 3, y: -6, eyeHeight: 2.5 });
    const raised = placeDriverStand(placed, { x: 3, y: -6 }, 4);
    expect(placeDriverStand(raised, { x: 0, y: 0 }).driverStand).toEqual({ x: 0, y: 0, eyeHeight: 4 });
    expect(removeDriverStand(raised).driverStand).toBeUndefined();
  });

  it("draws a boundary around the layout, bends the nearest edge and keeps three corners", () => {
    const withBox = rectangleBoundary(doc(), { minX: 0, minY: 0, maxX: 30, maxY: 16 }, 5);
    expect(withBox.siteBoundary).toEqual([
      [-5, -5],
      [35, -5],
      [35, 21],
      [-5, 21],
    ]);
    // a point just below the bottom edge bends that edge: inserted after corner 0
    const bent = addBoundaryPoint(withBox, { x: 15, y: -8 })!;
    expect(bent.index).toBe(1);
    expect(bent.doc.siteBoundary![1]).toEqual([15, -8]);
    // a point beside the right edge goes between corners 1 and 2
    expect(addBoundaryPoint(withBox, { x: 37, y: 8 })!.index).toBe(2);
    let poly = withBox;
    poly = deleteBoundaryPoint(poly, 0)!;
    expect(poly.siteBoundary).toHaveLength(3);
    expect(deleteBoundaryPoint(poly, 0)).toBeNull();
    expect(setTrackWidth(doc(), 20).trackWidth).toBe(10);
  });

  it("measures the distance from a point to a segment", () => {
    expect(distanceToSegment({ x: 5, y: 3 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBe(3);
    expect(distanceToSegment({ x: 13, y: 4 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBe(5);
  });
});

describe("plan view camera", () => {
  it("maps plan metres to screen pixels with Y up, and back", () => {
    const v = { scale: 10, ox: 100, oy: 300 };
    expect(worldToScreen(v, { x: 2, y: 3 })).toEqual({ x: 120, y: 270 });
    expect(screenToWorld(v, { x: 120, y: 270 })).toEqual({ x: 2, y: 3 });
  });

  it("zooms about the cursor: the plan point under it stays under it", () => {
    const v = { scale: 10, ox: 100, oy: 300 };
    const at = { x: 250, y: 120 };
    const before = screenToWorld(v, at);
    const z = zoomAt(v, at, 1.7);
    expect(z.scale).toBeCloseTo(17, 12);
    const after = screenToWorld(z, at);
    expect(after.x).toBeCloseTo(before.x, 9);
    expect(after.y).toBeCloseTo(before.y, 9);
    expect(zoomAt(v, at, 1e6).scale).toBe(400);
  });

  it("fits the layout into the canvas with padding", () => {
    const d = doc();
    const b = layoutBounds(d, layoutGeometry(d).line);
    // the starter oval: x from -8 - 1.5 to 30 + 8 + 1.5, y from -1.5 to 16 + 1.5
    expect(b.minX).toBeCloseTo(-9.5, 1);
    expect(b.maxX).toBeCloseTo(39.5, 1);
    expect(b.minY).toBeCloseTo(-1.5, 1);
    expect(b.maxY).toBeCloseTo(17.5, 1);
    const v = fitView(b, 800, 500, 20);
    for (const [x, y] of [
      [b.minX, b.minY],
      [b.maxX, b.maxY],
    ]) {
      const s = worldToScreen(v, { x, y });
      expect(s.x).toBeGreaterThanOrEqual(19.99);
      expect(s.x).toBeLessThanOrEqual(780.01);
      expect(s.y).toBeGreaterThanOrEqual(19.99);
      expect(s.y).toBeLessThanOrEqual(480.01);
    }
  });
});
