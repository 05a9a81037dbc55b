import { describe, expect, it } from "vitest";
import { CAR_PRESETS } from "~/analysis/format/cars";
import { analyseLayout } from "~/analysis/layout/layout-analysis";
import { marshalPlan } from "~/analysis/marshal/marshal-plan";
import { overshootReach } from "~/analysis/marshal/reach";
import { insideWedge, wedgePolygon, wedgeTest } from "~/analysis/marshal/zones";
import { jumpProfile } from "~/analysis/track/jump-profile";
import { ballisticJumpWindow } from "~/analysis/track/lap-jumps";
import { BIG_DOUBLE, ovalWithJump, ruleOval } from "../analysis-fixtures";

const car = CAR_PRESETS["buggy-2wd-10"];
const TAN15 = Math.tan((15 * Math.PI) / 180);

function planFor(doc: ReturnType<typeof ovalWithJump>, settings = {}) {
  const analysis = analyseLayout(doc);
  return { analysis, plan: marshalPlan(doc, analysis, { settings }) };
}

describe("the overshoot zone beyond a jump", () => {
  const doc = ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"] });
  const { analysis, plan } = planFor(doc);
  const zone = plan.zones.find((z) => z.id === "J1")!;
  const profile = jumpProfile(BIG_DOUBLE);
  const lipD = profile.d[profile.lipIndex];

  it("reaches as far as the flight at the approach's most plus 10 %, then the roll-out under the class's braking", () => {
    const jump = analysis.classes[0].jumps[0];
    const speed = jump.approachMaxSpeed * 1.1;
    expect(speed).toBeGreaterThan(ballisticJumpWindow(profile).windowMax!);
    const r = overshootReach(profile, speed, car.brakeDecel);
    expect(zone.kind).toBe("overshoot");
    expect(zone.byClass).toHaveLength(1);
    expect(zone.byClass[0]).toMatchObject({ classId: "buggy-2wd-10", speed, reach: r.reach });
    expect(zone.byClass[0].stoppingDistance).toBeCloseTo(r.rollOutSpeed ** 2 / (2 * car.brakeDecel), 9);
    expect(zone.wedge.far).toBeCloseTo(r.reach, 9);
    // It starts where the landing ramp ends: landing there is the top of the speed window.
    expect(zone.wedge.near).toBeCloseTo(profile.d[profile.landingEndIndex] - lipD, 9);
  });

  it("is a wedge from the lip across the track, widening 15 deg either side (plane geometry)", () => {
    const { near, far } = zone.wedge;
    const lipX = 25 + lipD; // the jump follows a 25 m straight heading +X from the origin
    expect(zone.wedge).toMatchObject({ x: lipX, y: 0, headingDeg: 0, halfWidth: 1.5 });
    const expected = [
      [lipX + near, -(1.5 + near * TAN15)],
      [lipX + far, -(1.5 + far * TAN15)],
      [lipX + far, 1.5 + far * TAN15],
      [lipX + near, 1.5 + near * TAN15],
    ];
    zone.polygon.forEach(([x, y], k) => {
      expect(x).toBeCloseTo(expected[k][0], 9);
      expect(y).toBeCloseTo(expected[k][1], 9);
    });
  });

  it("follows the club's margin, spread and roll-out braking", () => {
    const { plan: other } = planFor(doc, { speedMargin: 0.2, spreadDeg: 0, rollOutBraking: 0.5 });
    const z = other.zones.find((x) => x.id === "J1")!;
    const speed = analysis.classes[0].jumps[0].approachMaxSpeed * 1.2;
    expect(z.byClass[0].speed).toBeCloseTo(speed, 9);
    expect(z.wedge.far).toBeCloseTo(overshootReach(profile, speed, car.brakeDecel * 0.5).reach, 9);
    expect(z.polygon[1][1]).toBeCloseTo(-1.5, 9);
    expect(z.polygon[2][1]).toBeCloseTo(1.5, 9);
  });

  it("does not exist when the approach cannot carry a car past the landing", () => {
    const { plan: short } = planFor(ovalWithJump(BIG_DOUBLE, { approach: 2, carClasses: ["buggy-2wd-10"] }));
    expect(short.zones.map((z) => z.id)).not.toContain("J1");
  });

  it("keeps the class that reaches farthest and every class's numbers", () => {
    const { plan: two } = planFor(ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10", "sct-10"] }));
    const z = two.zones.find((x) => x.id === "J1")!;
    expect(z.byClass.map((c) => c.classId).sort()).toEqual(["buggy-2wd-10", "sct-10"]);
    expect(z.wedge.far).toBe(Math.max(...z.byClass.map((c) => c.reach)));
    expect(z.byClass.find((c) => c.classId === z.classId)!.reach).toBe(z.wedge.far);
  });
});

describe("the run-off zone past a turn", () => {
  it("runs straight on from the entry for v^2 / (2 a) at the stretch's top speed plus 10 %", () => {
    const doc = ruleOval(3);
    const analysis = analyseLayout(doc);
    const plan = marshalPlan(doc, analysis);
    const t1 = plan.zones.find((z) => z.id === "T1")!;
    // The east turn starts 40 m along the start straight, heading +X.
    expect(t1.wedge).toMatchObject({ x: 40, y: 0, headingDeg: 0, near: 0 });
    expect(t1.kind).toBe("run-off");
    const cls = analysis.classes[0];
    let peak = 0;
    analysis.line.s.forEach((s, i) => {
      if (s <= 40) peak = Math.max(peak, cls.lineSpeed[i]);
    });
    const speed = 1.1 * peak;
    expect(t1.byClass[0].speed).toBeCloseTo(speed, 9);
    // Stopping distance v^2 / (2 a): OpenStax University Physics Vol. 1, section 3.4.
    expect(t1.wedge.far).toBeCloseTo((speed * speed) / (2 * CAR_PRESETS[cls.classId].brakeDecel), 9);
    // What the turn allows: the flat-curve speed sqrt(mu g R) (OpenStax University Physics Vol. 1,
    // section 6.3, flat curve: from memory of the section).
    expect(t1.byClass[0].limitSpeed).toBeCloseTo(Math.sqrt(CAR_PRESETS[cls.classId].mu * 9.81 * 8), 9);
    expect(plan.corners.map((c) => c.title)).toEqual([
      "T1 (180\u00b0 left hairpin)",
      "T2 (180\u00b0 left hairpin)",
    ]);
  });
});

describe("what a zone holds", () => {
  it("the lane back from the hairpin, from where the widening wedge first meets its edge", () => {
    const doc = ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"], approach: 10, after: 20 });
    const zone = marshalPlan(doc, analyseLayout(doc)).zones.find((z) => z.id === "J1")!;
    expect(zone.contents.crosses).toHaveLength(1);
    expect(zone.contents.crosses[0].place).toBe("after T1");
    // The back straight's near edge is 6 - 3 = 3 m beside this lane's edge: the wedge's side
    // meets it 3 / tan 15 deg along (plane geometry), within the 0.5 m the lap is sampled at.
    expect(Math.abs(zone.contents.crosses[0].distance - 3 / TAN15)).toBeLessThan(0.5);
    expect(zone.contents.freeRunOff).toBe(zone.contents.crosses[0].distance);
  });

  it("marshal points in it or beside it, and ground outside the site", () => {
    const doc = ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"] });
    const lipX = 25 + jumpProfile(BIG_DOUBLE).d[jumpProfile(BIG_DOUBLE).lipIndex];
    doc.marshalPoints = [
      { x: lipX + 15, y: -3 },
      { x: lipX + 15, y: -(1.5 + 15 * TAN15) - 2 },
    ];
    doc.siteBoundary = [
      [-10, -20],
      [lipX + 10, -20],
      [lipX + 10, 20],
      [-10, 20],
    ];
    const zone = marshalPlan(doc, analyseLayout(doc)).zones.find((z) => z.id === "J1")!;
    expect(zone.contents.marshalPoints).toEqual(["M1"]);
    expect(zone.contents.besidePoints).toEqual(["M2"]);
    expect(zone.contents.leavesSite).toBe(true);
    // The site ends 10 m past the lip, before the car reaches the far side of the hairpin.
    expect(zone.contents.crosses[0].place).toBe("in T1");
    expect(zone.contents.crosses[0].distance).toBeGreaterThan(10);
    expect(zone.contents.freeRunOff).toBeCloseTo(10, 6);
  });

  it("point tests agree with the polygon", () => {
    const w = wedgeTest({ x: 0, y: 0, heading: Math.PI / 2, near: 2, far: 10, halfWidth: 1, spread: 0.2 });
    const poly = wedgePolygon(w);
    expect(poly[0][0]).toBeCloseTo(1 + 2 * Math.tan(0.2), 12);
    expect(insideWedge(w, 0, 5)).toBe(true);
    expect(insideWedge(w, 0, 1.9)).toBe(false);
    expect(insideWedge(w, 0, 10.1)).toBe(false);
    expect(insideWedge(w, 1 + 10 * Math.tan(0.2) - 0.01, 10)).toBe(true);
    expect(insideWedge(w, 1 + 5 * Math.tan(0.2) + 0.01, 5)).toBe(false);
  });
});
