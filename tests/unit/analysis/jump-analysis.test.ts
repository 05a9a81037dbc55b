import { describe, expect, it } from "vitest";
import { CAR_PRESETS, type CarParams } from "~/analysis/format/cars";
import { layoutGeometry } from "~/analysis/track/geometry";
import { analyseJump } from "~/analysis/layout/jump-analysis";
import { jumpProfile } from "~/analysis/track/jump-profile";
import { analyseLayout } from "~/analysis/layout/layout-analysis";
import { lapSpeed } from "~/analysis/track/speed";
import type { JumpSection, LayoutDocument } from "~/analysis/format/layout-document";
import { BIG_DOUBLE, KICKER, ovalWithJump } from "./analysis-fixtures";

const G = 9.81;
const RAD = Math.PI / 180;
const only = (doc: LayoutDocument, options: Parameters<typeof analyseLayout>[1] = {}) =>
  analyseLayout(doc, options).classes[0].jumps[0];
/** An expert who reaches the jump at the same speed every lap (takeoff speed spread 0.02 m/s). */
const STEADY = { speedSigmas: { novice: 0.5, club: 0.3, expert: 0.02 } };

describe("jump verdicts (issue 4 correctness)", () => {
  it('a jump whose landing leads straight into a hairpin gets "set up in the air" for a steady expert', () => {
    const j = only(ovalWithJump(BIG_DOUBLE, { after: 0.5 }), STEADY);
    expect(j.cannotClear).toBe(false);
    expect(j.turn).not.toBeNull();
    expect(j.turn!.sectionId).toBe("hairpin");
    expect(j.turn!.side).toBe("left");
    expect(j.turn!.angleDeg).toBeCloseTo(180, 9);
    expect(j.turn!.radius).toBe(3);
    expect(j.turn!.distance).toBeLessThanOrEqual(j.turn!.lookahead);
    expect(j.plan?.feasible).toBe(true);
    const expert = j.verdicts.expert;
    expect(expert.verdict).toBe("set-up");
    expect(expert.reason).toBeNull();
    expect(expert.reasonText).toBe(`land with the nose ${Math.round(Math.abs(j.plan!.yawDeg))}° left`);
    expect(expert.text).toMatch(/^Set up in the air: steer .* to land with the nose turned \d+° left/);
    expect(expert.expectedGain).toBeGreaterThanOrEqual(expert.minGainPerPass);
    expect(expert.noseTurnDeg).toBeGreaterThanOrEqual(expert.minNoseTurnDeg);
    expect(expert.minGainPerPass).toBe(0.05);
    expect(expert.minNoseTurnDeg).toBeCloseTo(10, 9);
    // The numbers behind it (engine.md section 6): R * psi, then / entry speed.
    const psi = Math.abs(j.plan!.yawDeg) * RAD;
    expect(expert.trackLengthSaved).toBeCloseTo(3 * psi, 9);
    expect(expert.timeSaved).toBeCloseTo((3 * psi) / j.turn!.entrySpeed, 9);
    expect(expert.successRate).toBe(j.plan!.successRate.expert);
    // A novice's timing spread makes the same plan a worse bet.
    expect(j.verdicts.novice.expectedGain).toBeLessThan(expert.expectedGain);
  });

  it("with the usual takeoff speed spread the same expert takes it straight, and the sentence shows why", () => {
    const j = only(ovalWithJump(BIG_DOUBLE, { after: 0.5 }));
    const v = j.verdicts.expert;
    expect(v.verdict).toBe("straight");
    expect(v.reason).toBe("too-risky");
    expect(v.reasonText).toBe("the gain is smaller than the risk");
    // The numbers that decided it are in the sentence: share of clean landings, time saved, cost of a failure.
    const pct = `${Math.round(v.successRate * 100)}% clean`;
    expect(v.text).toContain(
      `the gain is smaller than the risk: ${pct}, ${v.timeSaved.toFixed(2)} s saved, 3.0 s lost`,
    );
    expect(v.expectedGain).toBeLessThanOrEqual(0);
    // The takeoff speed (through the airtime) is the error that matters most here.
    expect(v.mainError).toBe("speed");
    expect(j.plan!.successAlone.speed.expert).toBeLessThan(j.plan!.successAlone.steering.expert);
  });

  it("the club's smallest worthwhile turn of the nose and gain decide, and the sentence names them", () => {
    const doc = ovalWithJump(BIG_DOUBLE, { after: 0.5 });
    const wide = only(doc, { ...STEADY, thresholds: { minNoseTurn: 40 * RAD } });
    expect(wide.verdicts.expert.reason).toBe("nose-turn-too-small");
    expect(wide.verdicts.expert.text).toMatch(
      /the nose turns too little: only \d+(\.\d)?° \(a set-up is worth it from 40°/,
    );
    const greedy = only(doc, { ...STEADY, thresholds: { minGainPerPass: 1 } });
    expect(greedy.verdicts.expert.reason).toBe("gain-too-small");
    expect(greedy.verdicts.expert.text).toMatch(/worth it from 1\.00 s/);
  });

  it('the same jump followed by a long straight gets "take it straight: no turn at the landing"', () => {
    const j = only(ovalWithJump(BIG_DOUBLE, { after: 30 }));
    expect(j.turn).toBeNull();
    expect(j.plan).toBeNull();
    const len = jumpProfile(BIG_DOUBLE).length;
    expect(j.nextTurnDistance).toBeCloseTo(30 + len - j.landing!.d, 6);
    for (const skill of ["novice", "club", "expert"] as const) {
      const v = j.verdicts[skill];
      expect(v.verdict).toBe("straight");
      expect(v.reason).toBe("no-turn");
      expect(v.reasonText).toBe("no turn at the landing");
      expect(v.text.toLowerCase()).toMatch(/^take it straight: no turn at the landing/);
      expect(v.expectedGain).toBe(0);
    }
  });

  it("a jump too short in airtime to rotate gets the airtime reason", () => {
    const j = only(ovalWithJump(KICKER, { after: 0.5 }));
    expect(j.turn).not.toBeNull();
    expect(j.airtime).toBeGreaterThan(0);
    expect(j.airtime).toBeLessThan(0.3);
    expect(j.verdicts.expert.verdict).toBe("straight");
    expect(j.verdicts.expert.reason).toBe("not-enough-airtime");
    expect(j.verdicts.expert.reasonText).toBe("not enough airtime");
    expect(j.verdicts.expert.text).toContain(`${j.airtime.toFixed(2)} s in the air; steering needs 0.30 s`);
  });

  it("a jump the approach is too short for gets the cannot-clear reason and lands short", () => {
    const j = only(ovalWithJump(BIG_DOUBLE, { approach: 1 }));
    expect(j.approachMaxSpeed).toBeLessThan(j.window!.min);
    expect(j.cannotClear).toBe(true);
    expect(j.takeoffSpeed).toBeCloseTo(j.approachMaxSpeed, 2);
    expect(j.landing!.landedOn).toBe("short");
    expect(j.verdicts.club.reason).toBe("cannot-clear");
    expect(j.verdicts.club.reasonText).toBe("the approach is too short");
    expect(j.verdicts.club.text).toMatch(/^Cannot clear: the approach is too short \(at most [\d.]+ m\/s; /);
    expect(j.plan).toBeNull();
  });

  it("a gentle turn after the landing gets the gentle-turn reason", () => {
    const doc = ovalWithJump(BIG_DOUBLE, { after: 0.5 });
    // Split the first hairpin into a 10 deg right kink and the rest of the loop to the left.
    doc.sections.splice(
      3,
      1,
      { id: "kink", kind: "turn", radius: 20, angleDeg: 10, direction: "right" },
      { id: "hairpin", kind: "turn", radius: 3, angleDeg: 190, direction: "left" },
    );
    const j = only(doc);
    expect(j.turn?.sectionId).toBe("kink");
    expect(j.turn?.side).toBe("right");
    expect(j.verdicts.expert.reason).toBe("turn-too-gentle");
  });
});

describe("a whoops row", () => {
  const row = (count: number): JumpSection => ({
    id: "whoops",
    kind: "jump",
    preset: "whoops",
    count,
    bumpHeight: 0.15,
    spacing: 1,
  });

  it("is analysed for the ways through it, with the speed each needs, not as one landing", () => {
    const j = only(ovalWithJump(row(6), { after: 30 }));
    const w = j.whoops!;
    expect(w).not.toBeNull();
    // Skimming: the body falls at most half a bump between crests, g (s / v)^2 / 2 = h / 2.
    expect(w.skimSpeed).toBeCloseTo(1 * Math.sqrt(G / 0.15), 9);
    // Doubles and triples: from one crest back down to crest height past the next crest or the
    // one after it; drag-free range v^2 sin(2a) / g (OpenStax University Physics Vol. 1, section
    // 4.3) gives a lower bound, drag adds a little.
    const range = (v: number) => (v * v * Math.sin(2 * j.faceAngleDeg * RAD)) / G;
    expect(range(w.doubles.window!.min)).toBeGreaterThanOrEqual(1 - 1e-3);
    expect(range(w.doubles.window!.min)).toBeLessThan(1.05);
    expect(range(w.triples!.window!.min)).toBeGreaterThanOrEqual(2 - 1e-3);
    expect(w.doubles.window!.max).toBeLessThan(w.triples!.window!.min);
    expect(w.doubles.jumps).toBe(3);
    expect(w.triples!.jumps).toBe(2);
    expect(j.cannotClear).toBe(false);
    expect(j.plan).toBeNull();
    for (const skill of ["novice", "club", "expert"] as const) {
      expect(j.verdicts[skill].reason).toBe("whoops");
      expect(j.verdicts[skill].text).toMatch(
        /^Whoops: .*skimming needs \d+\.\d m\/s, doubles \d+\.\d to \d+\.\d m\/s/,
      );
    }
    // The hardness reported is one hop of the way chosen, not a single big landing.
    expect(j.equivalentFallHeight).toBe(w.equivalentFallHeight);
    expect(j.equivalentFallHeight).toBeLessThan(0.15);
  });

  it("the approach decides the way: skim when fast enough, jump through when not, roll when slower still", () => {
    const fast = only(ovalWithJump(row(6), { approach: 40, after: 30 }));
    expect(fast.approachMaxSpeed).toBeGreaterThanOrEqual(fast.whoops!.skimSpeed);
    expect(fast.whoops!.technique).toBe("skim");
    expect(fast.verdicts.club.reasonText).toBe("whoops row: skim over the tops");
    const slow = only(ovalWithJump(row(6), { approach: 1.5, after: 30 }));
    const w = slow.whoops!;
    expect(slow.approachMaxSpeed).toBeLessThan(w.skimSpeed);
    const way = w.technique;
    if (slow.approachMaxSpeed < w.doubles.window!.min) {
      expect(way).toBe("roll");
      expect(slow.airtime).toBe(0);
      expect(slow.verdicts.club.text).toMatch(/^Whoops: roll through bump by bump/);
    } else expect(["doubles", "triples"]).toContain(way);
  });
});

describe("jump flight and numbers", () => {
  // A car without drag so that the flight is the exact parabola.
  const noDrag: CarParams = { ...CAR_PRESETS["buggy-2wd-10"], id: "no-drag", cdA: 0 };
  // Lip 0.3 m up, then a flat deck at lip height: the landing ramp is the deck from 2 m to 6 m.
  const deck: JumpSection = {
    id: "deck",
    kind: "jump",
    preset: "custom",
    profile: [
      [0, 0],
      [0.3 / Math.tan(30 * RAD), 0.3],
      [2, 0.3],
      [6, 0.3],
      [7, 0],
    ],
    lipIndex: 1,
    landingStartIndex: 2,
    landingEndIndex: 3,
  };

  it("landing flat at takeoff height gives EFH = apex height above the lip (derived check of Levy, Hubbard, McNeil & Swedberg 2015, engine.md)", () => {
    const doc = { ...ovalWithJump(deck, { after: 30 }), carClasses: ["no-drag"] };
    const j = analyseLayout(doc, { cars: { "no-drag": noDrag } }).classes[0].jumps[0];
    expect(j.landing!.landedOn).toBe("ramp");
    expect(j.landing!.z).toBeCloseTo(0.3, 9);
    expect(j.equivalentFallHeight).toBeCloseTo(j.apex!.z - 0.3, 6);
    // Drag-free range on level ground, R = v^2 sin(2a) / g (OpenStax University Physics Vol. 1, section 4.3, range equation).
    const v = j.takeoffSpeed;
    expect(j.landing!.d - j.lip.d).toBeCloseTo((v * v * Math.sin(60 * RAD)) / G, 6);
    // Planned speed lands on the sweet spot a third of the way down the ramp (to the 0.01 m/s rounding).
    expect(j.landing!.d).toBeCloseTo(2 + 4 / 3, 1);
  });

  it("air drag shortens the flight at the same takeoff speed (flight engine with the class's CdA and mass)", () => {
    const cars = { "no-drag": noDrag, draggy: { ...noDrag, id: "draggy", cdA: 0.06 } };
    const doc = { ...ovalWithJump(deck, { after: 30 }), carClasses: ["no-drag", "draggy"] };
    const [free, dragged] = analyseLayout(doc, { cars }).classes.map((c) => c.jumps[0]);
    // Same sweet spot needs a higher speed with drag, and drag lowers the speed window.
    expect(dragged.sweetSpotSpeed!).toBeGreaterThan(free.sweetSpotSpeed!);
    expect(dragged.window!.min).toBeGreaterThan(free.window!.min);
  });

  it("analyseJump places the lip and the touchdown on the centre line and along the lap", () => {
    const doc = ovalWithJump(BIG_DOUBLE, { after: 30 });
    const geo = layoutGeometry(doc);
    const car = CAR_PRESETS["buggy-4wd-10"];
    const lap = lapSpeed(geo, car);
    const j = analyseJump({
      doc: BIG_DOUBLE,
      sections: geo.sections,
      line: geo.line,
      speed: lap.speed,
      lap: lap.jumps[0],
      car,
    });
    // The near straight runs along +X from the origin.
    expect(Math.abs(j.lip.s - (25 + j.lip.d))).toBeLessThanOrEqual(0.1);
    expect(j.lip.x).toBeCloseTo(j.lip.s, 6);
    expect(j.lip.y).toBeCloseTo(0, 9);
    expect(j.landing!.s).toBeCloseTo(25 + j.landing!.d, 9);
    expect(j.landing!.x).toBeCloseTo(j.landing!.s, 6);
    expect(j.landing!.rollOutSpeed).toBeLessThan(j.landing!.speed);
    expect(j.verdict.skill).toBe("club");
  });
});
