import { describe, expect, it } from "vitest";
import {
  calibrate,
  initialPlacement,
  moveBackground,
  pixelToPlan,
  planToPixel,
  type Background,
} from "~/lib/editor/background";

const bg: Background = {
  fileId: "f1",
  x: 10,
  y: 50,
  metresPerPixel: 0.05,
  rotationDeg: 30,
  opacity: 0.5,
  hidden: false,
};

describe("photo placement", () => {
  it("puts the top-left pixel at (x, y) and runs pixel rows down the plan", () => {
    const flat = { ...bg, rotationDeg: 0 };
    expect(pixelToPlan(flat, 0, 0)).toEqual({ x: 10, y: 50 });
    const p = pixelToPlan(flat, 100, 200);
    expect(p.x).toBeCloseTo(15, 12);
    expect(p.y).toBeCloseTo(40, 12);
  });

  it("maps plan to pixel and back with a rotated photo", () => {
    const p = pixelToPlan(bg, 123, 45);
    const q = planToPixel(bg, p);
    expect(q.u).toBeCloseTo(123, 9);
    expect(q.v).toBeCloseTo(45, 9);
    // 100 px along the rotated u axis is 5 m at 30 degrees: (5 cos 30, 5 sin 30)
    const u = pixelToPlan(bg, 100, 0);
    expect(u.x - 10).toBeCloseTo(5 * Math.cos(Math.PI / 6), 12);
    expect(u.y - 50).toBeCloseTo(2.5, 12);
  });

  it("places a new photo centred on the layout, covering it", () => {
    const b = { minX: 0, minY: 0, maxX: 40, maxY: 20 };
    const placed = initialPlacement("f2", 800, 600, b);
    const topLeft = pixelToPlan(placed, 0, 0);
    const bottomRight = pixelToPlan(placed, 800, 600);
    expect((topLeft.x + bottomRight.x) / 2).toBeCloseTo(20, 2);
    expect((topLeft.y + bottomRight.y) / 2).toBeCloseTo(10, 2);
    expect(bottomRight.x - topLeft.x).toBeGreaterThanOrEqual(48 - 0.01);
    expect(topLeft.y - bottomRight.y).toBeGreaterThanOrEqual(24 - 0.01);
    expect(moveBackground(placed, 1, -1).x).toBeCloseTo(placed.x + 1, 9);
  });
});

describe("calibration from two points and a distance", () => {
  it("scales the photo so the clicked points are the typed distance apart, keeping the first point still", () => {
    const a = pixelToPlan(bg, 100, 100);
    const b = pixelToPlan(bg, 400, 500); // 500 px apart on the photo (a 3-4-5 triangle)
    const out = calibrate(bg, a, b, 20);
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.background.metresPerPixel).toBeCloseTo(20 / 500, 9);
    const a2 = pixelToPlan(out.background, 100, 100);
    const b2 = pixelToPlan(out.background, 400, 500);
    expect(a2.x).toBeCloseTo(a.x, 3);
    expect(a2.y).toBeCloseTo(a.y, 3);
    expect(Math.hypot(b2.x - a2.x, b2.y - a2.y)).toBeCloseTo(20, 6);
  });

  it("refuses a missing distance or two points on top of each other, naming what is wrong", () => {
    const a = pixelToPlan(bg, 100, 100);
    expect(calibrate(bg, a, pixelToPlan(bg, 300, 100), 0)).toMatchObject({ ok: false, field: "distance" });
    expect(calibrate(bg, a, pixelToPlan(bg, 300, 100), Number.NaN)).toMatchObject({
      ok: false,
      field: "distance",
    });
    expect(calibrate(bg, a, pixelToPlan(bg, 100.5, 100), 10)).toMatchObject({ ok: false, field: "points" });
  });
});
