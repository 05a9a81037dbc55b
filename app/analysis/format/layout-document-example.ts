/**
 * A small, closed example layout in the product's file format: an oval with a tabletop and a
 * custom roller on the back straight. Invented for the documentation; see docs/layout-format.md.
 */
import type { LayoutDocumentInput } from "./layout-document";

export const EXAMPLE_LAYOUT = {
  format: "loftline-layout",
  formatVersion: 1,
  units: "metres-degrees",
  name: "Example oval",
  description:
    "A practice oval: a start straight, two half-circle ends, a tabletop and a roller on the back straight.",
  surface: "dirt",
  trackWidth: 3,
  start: { x: 0, y: 0, headingDeg: 0 },
  sections: [
    { id: "start", kind: "straight", length: 24 },
    { id: "far-end", kind: "turn", radius: 7, angleDeg: 180, direction: "left" },
    { id: "run-up", kind: "straight", length: 6 },
    {
      id: "tabletop",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 0.4,
      faceAngleDeg: 30,
      tableLength: 2.5,
      landingAngleDeg: 25,
    },
    { id: "between", kind: "straight", length: 5 },
    {
      id: "roller",
      kind: "jump",
      preset: "custom",
      profile: [
        [0, 0],
        [0.8, 0.35],
        [1.4, 0.35],
        [3, 0],
      ],
      lipIndex: 1,
      landingStartIndex: 2,
      landingEndIndex: 3,
    },
    { id: "back", kind: "straight", length: 5.94938 },
    { id: "near-end", kind: "turn", radius: 7, angleDeg: 180, direction: "left" },
  ],
  siteBoundary: [
    [-10, -6],
    [34, -6],
    [34, 20],
    [-10, 20],
  ],
  driverStand: { x: 12, y: -4, eyeHeight: 3 },
  marshalPoints: [
    { x: 29, y: 7 },
    { x: -5, y: 7 },
  ],
  carClasses: ["buggy-2wd-10", "sct-10"],
  guidance: "club",
} satisfies LayoutDocumentInput;
