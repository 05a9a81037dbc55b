import { describe, expect, it } from "vitest";
import type { JumpSection } from "~/analysis/format/layout-document";
import {
  jumpProfile,
  profileHeightAt,
  SWEET_SPOT_FRACTION,
  type JumpProfile,
} from "~/analysis/track/jump-profile";

const DEG = Math.PI / 180;
const BACK = Math.tan(40 * DEG); // mound back sides, MOUND_BACK_SLOPE_DEG

const tabletop: JumpSection = {
  id: "t",
  kind: "jump",
  preset: "tabletop",
  faceHeight: 0.45,
  faceAngleDeg: 30,
  tableLength: 3,
  landingAngleDeg: 25,
};
const double: JumpSection = {
  id: "d",
  kind: "jump",
  preset: "double",
  faceHeight: 0.45,
  faceAngleDeg: 30,
  gap: 4,
  landingHeight: 0.4,
  landingAngleDeg: 25,
};
const triple: JumpSection = {
  id: "tr",
  kind: "jump",
  preset: "triple",
  faceHeight: 0.45,
  faceAngleDeg: 30,
  gap: 6,
  landingHeight: 0.45,
  landingAngleDeg: 25,
};
const stepUp: JumpSection = {
  id: "u",
  kind: "jump",
  preset: "step-up",
  faceHeight: 0.35,
  faceAngleDeg: 30,
  gap: 2.5,
  landingHeight: 0.6,
  deckLength: 3,
  landingAngleDeg: 25,
};
const stepDown: JumpSection = {
  id: "sd",
  kind: "jump",
  preset: "step-down",
  faceHeight: 0.6,
  faceAngleDeg: 20,
  gap: 2.5,
  landingHeight: 0.3,
  landingAngleDeg: 20,
};
const whoops: JumpSection = {
  id: "w",
  kind: "jump",
  preset: "whoops",
  count: 6,
  bumpHeight: 0.15,
  spacing: 1,
};
const custom: JumpSection = {
  id: "c",
  kind: "jump",
  preset: "custom",
  profile: [
    [0, 0],
    [0.8, 0.4],
    [3.8, 0.4],
    [4.8, 0],
  ],
  lipIndex: 1,
  landingStartIndex: 2,
  landingEndIndex: 3,
};

/** The shape rules every generated profile keeps (they make the jump a closed piece of ground). */
function expectWellFormed(p: JumpProfile) {
  expect(p.d[0]).toBe(0);
  expect(p.h[0]).toBe(0);
  expect(p.h[p.h.length - 1]).toBeCloseTo(0, 12);
  for (let k = 1; k < p.d.length; k++) expect(p.d[k]).toBeGreaterThan(p.d[k - 1]);
  for (const h of p.h) expect(h).toBeGreaterThanOrEqual(-1e-12);
  expect(p.lipIndex).toBeGreaterThan(0);
  expect(p.landingStartIndex).toBeGreaterThan(p.lipIndex);
  expect(p.landingEndIndex).toBeGreaterThan(p.landingStartIndex);
  expect(p.length).toBe(p.d[p.d.length - 1]);
}

describe("jump profiles", () => {
  it("all presets give well-formed profiles", () => {
    for (const s of [tabletop, double, triple, stepUp, stepDown, whoops, custom])
      expectWellFormed(jumpProfile(s));
  });

  it("tabletop: face, table and landing of the given sizes (exact geometry)", () => {
    const p = jumpProfile(tabletop);
    const face = 0.45 / Math.tan(30 * DEG);
    const down = 0.45 / Math.tan(25 * DEG);
    expect(p.d).toEqual([0, face, face + 3, face + 3 + down]);
    expect(p.h[p.lipIndex]).toBe(0.45);
    expect(p.faceAngle).toBeCloseTo(30 * DEG, 12);
    expect(p.sweetSpot).toBeCloseTo(face + 3 + down / 3, 12);
  });

  it("double: lip, valley on the ground, landing crest one gap after the lip", () => {
    const p = jumpProfile(double);
    const lip = p.d[p.lipIndex];
    expect(p.d[p.landingStartIndex] - lip).toBeCloseTo(4, 12);
    expect(p.h[p.landingStartIndex]).toBe(0.4);
    // The gap is long enough for a flat valley between the mounds.
    expect(profileHeightAt(p, lip + 2)).toBe(0);
    expect(profileHeightAt(p, lip + 0.45 / BACK / 2)).toBeCloseTo(0.45 / 2, 12);
    const down = p.d[p.landingEndIndex] - p.d[p.landingStartIndex];
    expect(down).toBeCloseTo(0.4 / Math.tan(25 * DEG), 12);
    expect(p.sweetSpot - p.d[p.landingStartIndex]).toBeCloseTo(SWEET_SPOT_FRACTION * down, 12);
  });

  it("double with a short gap: the mounds meet in a raised valley", () => {
    const p = jumpProfile({ ...double, gap: 1, landingHeight: 0.45 } as JumpSection);
    const lip = p.d[p.lipIndex];
    // Equal heights and 40 deg backs meet half way, 0.5 * tan(40 deg) below the crests.
    expect(profileHeightAt(p, lip + 0.5)).toBeCloseTo(0.45 - 0.5 * BACK, 12);
    expectWellFormed(p);
  });

  it("triple: a middle hump half way between lip and landing", () => {
    const p = jumpProfile(triple);
    const lip = p.d[p.lipIndex];
    expect(profileHeightAt(p, lip + 3)).toBeCloseTo(0.45, 12);
    expect(p.d[p.landingStartIndex] - lip).toBeCloseTo(6, 12);
    const crests = p.h.filter((h, k) => k > 0 && k < p.h.length - 1 && h > p.h[k - 1] && h >= p.h[k + 1]);
    expect(crests).toHaveLength(3);
  });

  it("step-up: the car lands on the upper deck", () => {
    const p = jumpProfile(stepUp);
    expect(p.h[p.landingStartIndex]).toBe(0.6);
    expect(p.h[p.landingEndIndex]).toBe(0.6);
    expect(p.d[p.landingEndIndex] - p.d[p.landingStartIndex]).toBeCloseTo(3, 12);
    expect(p.h[p.lipIndex]).toBe(0.35);
  });

  it("step-down: the landing crest is below the lip", () => {
    const p = jumpProfile(stepDown);
    expect(p.h[p.landingStartIndex]).toBe(0.3);
    expect(p.h[p.lipIndex]).toBe(0.6);
    expect(p.faceAngle).toBeCloseTo(20 * DEG, 12);
  });

  it("whoops: a row of equal bumps, crest to crest one spacing apart", () => {
    const p = jumpProfile(whoops);
    expect(p.length).toBeCloseTo(6, 12);
    expect(Math.max(...p.h)).toBeCloseTo(0.15, 12);
    expect(p.d[p.landingStartIndex] - p.d[p.lipIndex]).toBeCloseTo(1, 12);
    expect(p.h[p.lipIndex]).toBeCloseTo(0.15, 12);
  });

  it("custom: the given points, lip and landing", () => {
    const p = jumpProfile(custom);
    expect(p.d).toEqual([0, 0.8, 3.8, 4.8]);
    expect(p.faceAngle).toBeCloseTo(Math.atan2(0.4, 0.8), 12);
    expect(profileHeightAt(p, 0.4)).toBeCloseTo(0.2, 12);
    expect(profileHeightAt(p, 4.3)).toBeCloseTo(0.2, 12);
    expect(profileHeightAt(p, 10)).toBe(0);
  });
});
