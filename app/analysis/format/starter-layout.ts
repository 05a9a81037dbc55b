import type { LayoutDocument } from "./layout-document";

/** The class a layout is analysed for when nobody chose one: the 1/10 two-wheel-drive buggy. */
export const DEFAULT_CAR_CLASS = "buggy-2wd-10";

/**
 * The loop a new layout starts from: a closed oval (two 30 m straights joined by two 180-degree
 * turns of radius 8 m), for the given car classes (the default class when none are given).
 */
export function starterDocument(
  name: string,
  trackWidth: number,
  carClasses: readonly string[] = [DEFAULT_CAR_CLASS],
): LayoutDocument {
  return {
    format: "loftline-layout",
    formatVersion: 1,
    units: "metres-degrees",
    name,
    surface: "dirt",
    trackWidth,
    start: { x: 0, y: 0, headingDeg: 0 },
    sections: [
      { id: "s1", kind: "straight", length: 30 },
      { id: "t1", kind: "turn", radius: 8, angleDeg: 180, direction: "left" },
      { id: "s2", kind: "straight", length: 30 },
      { id: "t2", kind: "turn", radius: 8, angleDeg: 180, direction: "left" },
    ],
    marshalPoints: [],
    carClasses: [...carClasses],
    guidance: "club",
  };
}
