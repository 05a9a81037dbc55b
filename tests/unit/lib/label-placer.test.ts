import { describe, expect, it } from "vitest";
import { boxAt, boxesOverlap, placeLabels, type LabelRequest } from "~/lib/label-placer";

const bounds = { x: 0, y: 0, width: 200, height: 100 };
const label = (id: string, x: number, y: number, priority: number, width = 40): LabelRequest => ({
  id,
  anchor: { x, y },
  width,
  height: 14,
  priority,
  offset: 6,
});

describe("label placer", () => {
  it("puts a label at its first position when there is room", () => {
    const { placed, dropped } = placeLabels([label("a", 50, 50, 1)], { bounds });
    expect(dropped).toEqual([]);
    expect(placed[0]).toMatchObject({ id: "a", position: "right", x: 56, y: 43, width: 40, height: 14 });
  });

  it("moves a label away from the edge instead of letting it leave the drawing", () => {
    const { placed } = placeLabels([label("edge", 195, 50, 1)], { bounds });
    expect(placed[0].position).toBe("left");
    expect(placed[0].x + placed[0].width).toBeLessThanOrEqual(200);
    const top = placeLabels([label("top", 100, 2, 1, 220 - 200 + 20)], { bounds }).placed[0];
    expect(top.y).toBeGreaterThanOrEqual(0);
  });

  it("never overlaps two labels, nor a label and an obstacle", () => {
    const requests = Array.from({ length: 40 }, (_, k) =>
      label(`l${k}`, 20 + (k % 8) * 22, 20 + Math.floor(k / 8) * 15, k % 3),
    );
    const obstacle = { x: 90, y: 40, width: 20, height: 20 };
    const { placed, dropped } = placeLabels(requests, { bounds, obstacles: [obstacle], gap: 1 });
    expect(placed.length + dropped.length).toBe(40);
    for (let i = 0; i < placed.length; i++) {
      expect(boxesOverlap(placed[i], obstacle)).toBe(false);
      expect(placed[i].x).toBeGreaterThanOrEqual(0);
      expect(placed[i].y + placed[i].height).toBeLessThanOrEqual(100);
      for (let j = i + 1; j < placed.length; j++) expect(boxesOverlap(placed[i], placed[j])).toBe(false);
    }
    expect(dropped.length).toBeGreaterThan(0);
  });

  it("drops the least important label first when there is no room", () => {
    // two labels for the same crowded spot in a drawing just big enough for one
    const small = { x: 0, y: 0, width: 50, height: 20 };
    const requests = [label("minor", 2, 10, 1), label("major", 2, 10, 5)];
    const { placed, dropped } = placeLabels(requests, { bounds: small });
    expect(placed.map((p) => p.id)).toEqual(["major"]);
    expect(dropped).toEqual(["minor"]);
  });

  it("tries a second ring further out before dropping a label", () => {
    const block = boxAt(label("x", 100, 50, 0), "right");
    const ring = [
      "right",
      "above",
      "left",
      "below",
      "above-right",
      "below-right",
      "above-left",
      "below-left",
    ].map((p) => boxAt(label("x", 100, 50, 0), p as never));
    const { placed } = placeLabels([label("far", 100, 50, 1)], { bounds, obstacles: ring });
    expect(placed).toHaveLength(1);
    expect(boxesOverlap(placed[0], block)).toBe(false);
  });
});
