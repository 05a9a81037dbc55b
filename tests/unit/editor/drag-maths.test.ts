import { describe, expect, it } from "vitest";
import { resolveSections, type LayoutDocument, defaultJump } from "~/analysis";
import {
  alongTrack,
  jumpMoveBlocker,
  moveJump,
  sectionHandles,
  straightLengthFromPoint,
  turnAngleFromPoint,
  turnCentre,
  turnRadiusFromPoint,
} from "~/lib/editor/drag-maths";

const SNAP = { lengths: true, angles: true };
const FREE = { lengths: false, angles: false };
const east = { x: 0, y: 0, heading: 0 };

// Expected values below are plane geometry worked by hand (derived; no outside source needed).
describe("straight handle", () => {
  it("gives the distance along the straight's heading, snapped to 0.1 m", () => {
    expect(straightLengthFromPoint(east, { x: 12.34, y: 5 }, SNAP)).toBe(12.3);
    expect(straightLengthFromPoint(east, { x: 12.34, y: 5 }, FREE)).toBeCloseTo(12.34, 12);
    expect(straightLengthFromPoint({ x: 1, y: 2, heading: Math.PI / 2 }, { x: -3, y: 10 }, SNAP)).toBe(8);
  });

  it("keeps the length inside 0.5..300 m even when dragged behind the start", () => {
    expect(straightLengthFromPoint(east, { x: -4, y: 0 }, SNAP)).toBe(0.5);
    expect(straightLengthFromPoint(east, { x: 900, y: 0 }, SNAP)).toBe(300);
  });
});

describe("turn handles", () => {
  it("places the centre a radius to the inside of the start", () => {
    expect(turnCentre(east, 5, "left")).toEqual({ x: 0, y: 5 });
    const right = turnCentre(east, 5, "right");
    expect(right.x).toBeCloseTo(0, 12);
    expect(right.y).toBeCloseTo(-5, 12);
  });

  it("gives the radius from the centre handle's distance to the inside", () => {
    expect(turnRadiusFromPoint(east, "left", { x: 3, y: 7.04 }, SNAP)).toBe(7);
    expect(turnRadiusFromPoint(east, "right", { x: 0, y: -7 }, SNAP)).toBe(7);
    // dragged to the outside: the smallest radius the format allows
    expect(turnRadiusFromPoint(east, "left", { x: 0, y: -3 }, SNAP)).toBe(1);
  });

  it("gives the angle swept around the centre in the turn's direction", () => {
    expect(turnAngleFromPoint(east, 5, "left", { x: 5, y: 5 }, 45, SNAP)).toBeCloseTo(90, 9);
    expect(turnAngleFromPoint(east, 5, "left", { x: 0, y: 10 }, 170, SNAP)).toBeCloseTo(180, 9);
    expect(turnAngleFromPoint(east, 5, "left", { x: -5, y: 5 }, 260, SNAP)).toBeCloseTo(270, 9);
    expect(turnAngleFromPoint(east, 5, "right", { x: 5, y: -5 }, 45, SNAP)).toBeCloseTo(90, 9);
    expect(
      turnAngleFromPoint(east, 5, "left", { x: 5 * Math.sin(0.7), y: 5 - 5 * Math.cos(0.7) }, 40, FREE),
    ).toBeCloseTo((0.7 * 180) / Math.PI, 9);
  });

  it("does not jump back to 0 when dragged past a full circle, nor to 360 when dragged below 0", () => {
    const justPastStart = { x: 5 * Math.sin(0.05), y: 5 - 5 * Math.cos(0.05) };
    expect(turnAngleFromPoint(east, 5, "left", justPastStart, 355, SNAP)).toBe(360);
    const justBeforeStart = { x: -5 * Math.sin(0.05), y: 5 - 5 * Math.cos(0.05) };
    expect(turnAngleFromPoint(east, 5, "left", justBeforeStart, 10, SNAP)).toBe(1);
  });
});

function jumpDoc(): Pick<LayoutDocument, "start" | "sections"> {
  return {
    start: { x: 0, y: 0, headingDeg: 0 },
    sections: [
      { id: "a", kind: "straight", length: 10 },
      defaultJump("tabletop", "j"),
      { id: "b", kind: "straight", length: 10 },
      { id: "t", kind: "turn", radius: 8, angleDeg: 180, direction: "left" },
    ],
  };
}

describe("moving a jump along its stretch", () => {
  it("trades length between the straights either side, so nothing after the jump moves", () => {
    const doc = jumpDoc();
    const moved = moveJump(doc, 1, 2.34, SNAP)!;
    expect(moved.sections[0]).toMatchObject({ length: 12.3 });
    expect(moved.sections[2]).toMatchObject({ length: 7.7 });
    const before = resolveSections(doc);
    const after = resolveSections(moved);
    expect(after[1].start.x).toBeCloseTo(12.3, 9);
    expect(after[3].end.x).toBeCloseTo(before[3].end.x, 9);
    expect(after[3].end.y).toBeCloseTo(before[3].end.y, 9);
  });

  it("keeps both straights at least 0.5 m long", () => {
    const moved = moveJump(jumpDoc(), 1, 100, SNAP)!;
    expect(moved.sections[0]).toMatchObject({ length: 19.5 });
    expect(moved.sections[2]).toMatchObject({ length: 0.5 });
    expect(moveJump(jumpDoc(), 1, -100, SNAP)!.sections[0]).toMatchObject({ length: 0.5 });
  });

  it("refuses when the jump has no straight on one side, and says why", () => {
    const doc = jumpDoc();
    doc.sections.splice(2, 1);
    expect(moveJump(doc, 1, 1, SNAP)).toBeNull();
    expect(jumpMoveBlocker(doc, 1)).toMatch(/straight right before it and right after it/);
    expect(jumpMoveBlocker(jumpDoc(), 1)).toBeNull();
  });

  it("puts the move handle in the jump's middle and measures pointer moves along the track", () => {
    const doc = jumpDoc();
    const r = resolveSections(doc);
    const h = sectionHandles(r[1], doc.sections[1], true);
    expect(h.move!.x).toBeCloseTo(10 + r[1].length / 2, 9);
    expect(alongTrack(r[1], h.move!, { x: h.move!.x + 1.5, y: 4 })).toBeCloseTo(1.5, 12);
    expect(sectionHandles(r[1], doc.sections[1], false)).toEqual({});
    expect(sectionHandles(r[3], doc.sections[3], true).centre).toEqual({ x: 20 + r[1].length, y: 8 });
  });
});
