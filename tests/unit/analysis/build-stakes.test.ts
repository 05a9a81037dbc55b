import { describe, expect, it } from "vitest";
import {
  baseline,
  measureFromDatum,
  planBearing,
  pointFromBearing,
  pointFromOffsets,
  trueBearing,
} from "~/analysis/build/datum";
import { jumpStakePoints } from "~/analysis/build/jump-stakes";
import { markingOut, MAX_STATIONS, stationDistances } from "~/analysis/build/stakes";
import type { LayoutDocument } from "~/analysis/format/layout-document";
import { layoutGeometry, resolveSections, type CentreLine } from "~/analysis/track/geometry";
import { jumpProfile, profileHeightAt } from "~/analysis/track/jump-profile";
import { SUMMER_LAYOUT, WET_WEATHER_LAYOUT } from "~/db/demo-layouts";

const DEG = Math.PI / 180;
const round = (v: number, places: number) => Number(v.toFixed(places));

/**
 * The point of the engine's sampled centre line (samples 1 cm apart, chords between them) nearest
 * to (x, y) among the samples within 1 m of lap distance s: its distance (m) and lap distance (m).
 * Searching near s keeps a lane that passes close by from answering for another.
 */
function nearestOnLine(line: CentreLine, x: number, y: number, s: number) {
  let best = { distance: Infinity, s: 0 };
  for (let i = 0; i + 1 < line.count; i++) {
    if (line.s[i + 1] < s - 1 || line.s[i] > s + 1) continue;
    const ax = line.x[i];
    const ay = line.y[i];
    const dx = line.x[i + 1] - ax;
    const dy = line.y[i + 1] - ay;
    const len2 = dx * dx + dy * dy;
    const t = len2 > 0 ? Math.min(1, Math.max(0, ((x - ax) * dx + (y - ay) * dy) / len2)) : 0;
    const distance = Math.hypot(ax + t * dx - x, ay + t * dy - y);
    if (distance < best.distance) best = { distance, s: line.s[i] + t * (line.s[i + 1] - line.s[i]) };
  }
  return best;
}

describe("datum measures", () => {
  it("bearings run clockwise from the plan's +Y and offsets are positive to the right of A to B", () => {
    // Worked by hand: north (up the page) is 0, east (+X) 90, south 180, west 270 degrees.
    expect(planBearing(0, 1) / DEG).toBeCloseTo(0, 12);
    expect(planBearing(1, 0) / DEG).toBeCloseTo(90, 12);
    expect(planBearing(0, -1) / DEG).toBeCloseTo(180, 12);
    expect(planBearing(-1, 0) / DEG).toBeCloseTo(270, 12);
    expect(planBearing(1, 1) / DEG).toBeCloseTo(45, 12);
    // A at the origin, B 10 m east: a point 5 m east and 2 m south is 2 m to the right of the line.
    const line = baseline({ x: 0, y: 0 }, { x: 10, y: 0 });
    const m = measureFromDatum(line, 5, -2);
    expect(line.bearing / DEG).toBeCloseTo(90, 12);
    expect(m.distance).toBeCloseTo(Math.sqrt(29), 12);
    expect(m.bearing / DEG).toBeCloseTo(90 + Math.atan2(2, 5) / DEG, 12);
    expect(m.along).toBeCloseTo(5, 12);
    expect(m.offset).toBeCloseTo(2, 12);
    expect(measureFromDatum(line, 5, 2).offset).toBeCloseTo(-2, 12);
  });

  it("turns plan bearings into true bearings from the grid's or the baseline's true bearing", () => {
    const line = baseline({ x: 0, y: 0 }, { x: 10, y: 10 }); // A to B runs at 45 degrees on the plan
    // The plan's up direction lies at 350 degrees true: a plan bearing of 20 is 10 degrees true.
    expect(trueBearing(20 * DEG, line, { gridTrueBearing: 350 * DEG }) / DEG).toBeCloseTo(10, 10);
    // A to B measured on site at 100 degrees true: the plan is turned by 55 degrees.
    expect(trueBearing(45 * DEG, line, { abTrueBearing: 100 * DEG }) / DEG).toBeCloseTo(100, 10);
    expect(trueBearing(0, line, { abTrueBearing: 100 * DEG }) / DEG).toBeCloseTo(55, 10);
  });

  it("refuses datums closer than 1 m", () => {
    expect(() => baseline({ x: 1, y: 1 }, { x: 1.5, y: 1.5 })).toThrow(/at least 1 m/);
  });
});

describe("stake positions", () => {
  for (const doc of [SUMMER_LAYOUT, WET_WEATHER_LAYOUT] as LayoutDocument[]) {
    it(`${doc.name}: distance/bearing and offsets, rounded as printed, land within 1 cm of the centre line`, () => {
      const stand = doc.driverStand!;
      const corner = doc.siteBoundary![2];
      const sheet = markingOut(doc, { x: stand.x, y: stand.y }, { x: corner[0], y: corner[1] }, 5);
      const { line } = layoutGeometry(doc, 0.01);
      expect(sheet.stations.length).toBeGreaterThan(line.length / 5);
      const checked = [...sheet.stations.map((st) => st.centre), ...sheet.jumps.flatMap((j) => j.points)];
      for (const stake of checked) {
        const m = stake.measure;
        // As on the sheet and in the CSV: metres to the millimetre, bearings to 0.0001 degree.
        const byBearing = pointFromBearing(
          sheet.baseline.a,
          round(m.distance, 3),
          round(m.bearing / DEG, 4) * DEG,
        );
        const byOffsets = pointFromOffsets(sheet.baseline, round(m.along, 3), round(m.offset, 3));
        for (const p of [byBearing, byOffsets]) {
          const near = nearestOnLine(line, p.x, p.y, stake.s!);
          expect(near.distance, `${stake.id} off the centre line`).toBeLessThan(0.01);
          expect(Math.abs(near.s - stake.s!), `${stake.id} along the lap`).toBeLessThan(0.01);
        }
      }
    });
  }

  it("puts the edges half the width either side, turn centres at the radius, jump points at their heights", () => {
    const doc = SUMMER_LAYOUT;
    const sheet = markingOut(doc, { x: 0, y: -6 }, { x: 60, y: -6 }, 2);
    const half = doc.trackWidth / 2;
    for (const st of sheet.stations) {
      expect(Math.hypot(st.left.x - st.centre.x, st.left.y - st.centre.y)).toBeCloseTo(half, 9);
      expect(Math.hypot(st.right.x - st.centre.x, st.right.y - st.centre.y)).toBeCloseTo(half, 9);
    }
    const sections = resolveSections(doc);
    for (const turn of sheet.turns) {
      const inTurn = sheet.stations.filter((st) => st.centre.sectionIndex === turn.sectionIndex);
      expect(inTurn.length).toBeGreaterThan(0);
      for (const st of inTurn) {
        const r = (p: { x: number; y: number }) => Math.hypot(p.x - turn.centre.x, p.y - turn.centre.y);
        expect(r(st.centre)).toBeCloseTo(turn.radius, 9);
        // The inside edge is the one on the side the car turns to.
        const inner = turn.direction === "left" ? st.left : st.right;
        const outer = turn.direction === "left" ? st.right : st.left;
        expect(r(inner)).toBeCloseTo(turn.innerRadius, 9);
        expect(r(outer)).toBeCloseTo(turn.outerRadius, 9);
      }
      const sec = sections[turn.sectionIndex];
      expect(turn.radius * turn.angle).toBeCloseTo(sec.length, 9);
    }
    expect(sheet.jumps).toHaveLength(9); // the summer layout's nine jumps, J1 to J9
    for (const jump of sheet.jumps) {
      const section = doc.sections[jump.sectionIndex];
      if (section.kind !== "jump") throw new Error("not a jump");
      const profile = jumpProfile(section);
      const kinds = jump.points.map((p) => p.kind);
      expect(kinds[0]).toBe("jump-toe");
      expect(kinds).toContain("jump-lip");
      expect(kinds).toContain("jump-crest");
      expect(kinds).toContain("jump-landing-end");
      const lip = jump.points.find((p) => p.kind === "jump-lip")!;
      expect(lip.height).toBeCloseTo(profile.h[profile.lipIndex], 12);
      for (const p of jump.points) {
        const t = p.s! - sections[jump.sectionIndex].startS;
        if (t > 0 && t < profile.length) expect(p.height).toBeCloseTo(profileHeightAt(profile, t), 9);
      }
    }
  });

  it("places a station on every section boundary and no two closer than a quarter spacing within a section", () => {
    const sections = resolveSections(SUMMER_LAYOUT);
    const stations = stationDistances(sections, 5);
    for (const sec of sections) expect(stations.some((st) => st.s === sec.startS)).toBe(true);
    for (let i = 1; i < stations.length; i++) {
      const gap = stations[i].s - stations[i - 1].s;
      expect(gap).toBeGreaterThan(0);
      expect(gap).toBeLessThanOrEqual(5 + 1e-9);
    }
  });
});

describe("jump points", () => {
  it("names a tabletop's four corners and numbers a whoops row's bumps", () => {
    const table = jumpStakePoints(
      jumpProfile({
        id: "t",
        kind: "jump",
        preset: "tabletop",
        faceHeight: 0.4,
        faceAngleDeg: 30,
        tableLength: 2.5,
        landingAngleDeg: 25,
      }),
      false,
    );
    // Worked by hand: face run 0.4 / tan 30° = 0.692820 m, table 2.5 m, landing run 0.4 / tan 25° = 0.857803 m.
    expect(table.map((p) => [p.code, round(p.d, 6), p.h])).toEqual([
      ["TOE", 0, 0],
      ["LIP", 0.69282, 0.4],
      ["CREST", 3.19282, 0.4],
      ["LAND", 4.050623, 0],
    ]);
    const whoops = jumpStakePoints(
      jumpProfile({ id: "w", kind: "jump", preset: "whoops", count: 4, bumpHeight: 0.15, spacing: 1 }),
      true,
    );
    expect(whoops.map((p) => p.code)).toEqual(["TOE", "LIP", "CREST", "LAND", "BUMP3", "BUMP4", "FOOT"]);
  });
});

describe("limits", () => {
  it("stakes an open loop's end and refuses more stations than a sheet lists", () => {
    const open = { ...SUMMER_LAYOUT, sections: SUMMER_LAYOUT.sections.slice(0, -2) };
    const sheet = markingOut(open, { x: 30, y: -3 }, { x: 0, y: 38 }, 5);
    expect(sheet.closureGap).toBeGreaterThan(1);
    const last = sheet.stations[sheet.stations.length - 1].centre;
    const end = resolveSections(open).at(-1)!.end;
    expect(Math.hypot(last.x - end.x, last.y - end.y)).toBeLessThan(1e-9);
    const long = {
      ...SUMMER_LAYOUT,
      sections: Array.from({ length: 20 }, () => SUMMER_LAYOUT.sections).flat(),
    };
    expect(() => markingOut(long, { x: 30, y: -3 }, { x: 0, y: 38 }, 0.5)).toThrow(
      new RegExp(`more than ${MAX_STATIONS} stations`),
    );
  });
});
