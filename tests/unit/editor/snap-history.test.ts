import { describe, expect, it } from "vitest";
import {
  canRedo,
  canUndo,
  createHistory,
  amend,
  record,
  redo,
  undo,
  HISTORY_LIMIT,
} from "~/lib/editor/history";
import { clamp, snapAngle, snapHeight, snapLength, snapTo } from "~/lib/editor/snap";
import { formatLength, fromDisplay, niceStep, toDisplay } from "~/lib/editor/units";

describe("snapping", () => {
  it("snaps lengths to 0.1 m and angles to 5 degrees, and can be switched off", () => {
    const on = { lengths: true, angles: true };
    const off = { lengths: false, angles: false };
    expect(snapLength(12.349, on)).toBe(12.3);
    expect(snapLength(12.35001, on)).toBe(12.4);
    expect(snapLength(0.1 + 0.2, on)).toBe(0.3);
    expect(snapLength(12.349, off)).toBe(12.349);
    expect(snapAngle(92.4, on)).toBe(90);
    expect(snapAngle(92.6, on)).toBe(95);
    expect(snapAngle(92.6, off)).toBe(92.6);
    expect(snapHeight(0.437, on)).toBe(0.45);
    expect(snapTo(7, 0)).toBe(7);
    expect(clamp(-3, 0.5, 300)).toBe(0.5);
  });
});

describe("undo and redo", () => {
  it("keeps at least 50 steps and walks them back and forth", () => {
    let h = createHistory(0);
    for (let k = 1; k <= 60; k++) h = record(h, k);
    for (let k = 0; k < 60; k++) h = undo(h);
    expect(h.present).toBe(0);
    expect(canUndo(h)).toBe(false);
    for (let k = 0; k < 60; k++) h = redo(h);
    expect(h.present).toBe(60);
    expect(canRedo(h)).toBe(false);
    expect(HISTORY_LIMIT).toBeGreaterThanOrEqual(50);
  });

  it("forgets the oldest steps beyond the limit", () => {
    let h = createHistory(0);
    for (let k = 1; k <= 10; k++) h = record(h, k, 5);
    expect(h.past).toEqual([5, 6, 7, 8, 9]);
    expect(h.present).toBe(10);
  });

  it("clears redo on a new change; amend replaces the present without a new step", () => {
    let h = record(record(createHistory("a"), "b"), "c");
    h = undo(h);
    expect(h.present).toBe("b");
    h = record(h, "d");
    expect(canRedo(h)).toBe(false);
    h = amend(h, "e");
    expect(h.past).toEqual(["a", "b"]);
    expect(undo(h).present).toBe("b");
    expect(record(h, h.present)).toBe(h);
  });
});

describe("display units", () => {
  it("converts metres and international feet (1 ft = 0.3048 m exactly, by definition)", () => {
    expect(toDisplay(0.3048, "ft")).toBeCloseTo(1, 12);
    expect(fromDisplay(100, "ft")).toBeCloseTo(30.48, 12);
    expect(formatLength(10, "ft")).toBe("32.8 ft");
    expect(formatLength(10, "m", 2)).toBe("10.00 m");
  });

  it("picks grid steps of 1, 2 or 5 times a power of ten at least the asked pixels apart", () => {
    expect(niceStep(20, "m", 40)).toEqual({ step: 2, metres: 2 });
    expect(niceStep(20, "m", 100)).toEqual({ step: 5, metres: 5 });
    expect(niceStep(2, "m", 40)).toEqual({ step: 20, metres: 20 });
    const ft = niceStep(20, "ft", 40);
    expect(ft.step).toBe(10);
    expect(ft.metres).toBeCloseTo(3.048, 9);
  });
});
