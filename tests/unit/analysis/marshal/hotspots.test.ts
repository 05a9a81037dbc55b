import { describe, expect, it } from "vitest";
import { ratioScore } from "~/analysis/marshal/hotspots";
import { marshalPlan } from "~/analysis/marshal/marshal-plan";
import { speedScore } from "~/analysis/marshal/turn-hotspots";
import { zoneScore } from "~/analysis/marshal/zone-words";
import type { MarshalZone } from "~/analysis/marshal/marshal-types";
import { BIG_DOUBLE, ovalWithJump, ruleOval } from "../analysis-fixtures";
import { rectangleWithJump, riskOf } from "./fixtures";

const kinds = (plan: ReturnType<typeof riskOf>["plan"], kind: string) =>
  plan.hotspots.filter((h) => h.kind === kind);

describe("hotspot scores (docs/decisions/0701)", () => {
  it("rate a measure against the club's limit: none under 0.75, then 1 to 5 at 0.75, 1, 1.25, 1.5 and 2", () => {
    expect([0.5, 0.75, 0.99, 1, 1.24, 1.25, 1.49, 1.5, 1.99, 2, 9].map(ratioScore)).toEqual([
      null,
      1,
      1,
      2,
      2,
      3,
      3,
      4,
      4,
      5,
      5,
    ]);
    expect([3, 6, 8.9, 9, 12, 15, 20].map(speedScore)).toEqual([1, 2, 2, 3, 4, 5, 5]);
    const zone = (crosses: number, marshalPoints: string[], leavesSite: boolean) =>
      ({
        contents: {
          crosses: Array(crosses).fill({ fromS: 0, toS: 1, place: "", distance: 1 }),
          marshalPoints,
          besidePoints: [],
          leavesSite,
          freeRunOff: 1,
        },
      }) as unknown as MarshalZone;
    expect(zoneScore(zone(0, [], false))).toBe(1);
    expect(zoneScore(zone(2, [], false))).toBe(3);
    expect(zoneScore(zone(1, ["M1"], false))).toBe(4);
    expect(zoneScore(zone(1, ["M1"], true))).toBe(5);
  });
});

describe("jump hotspots", () => {
  it("a landing 1.4 m before a hairpin scores 5 (hairpin 4, short run-out +1) and says why", () => {
    const { plan } = riskOf(ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"] }));
    const [into] = kinds(plan, "landing-into-turn");
    expect(into.score).toBe(5);
    expect(into.subject).toBe("J1");
    expect(into.reason).toMatch(/^J1 lands 1\.\d m before T1 \(180\u00b0 left hairpin\): /);
    expect(into.reason).toMatch(/less run-out than the 3 m the track guidance asks\.$/);
    // With the club's own 1 m run-out the landing is long enough: the hairpin's 4 alone.
    const { plan: relaxed } = riskOf(ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"] }), {
      overrides: { minLandingRunOut: 1 },
    });
    expect(kinds(relaxed, "landing-into-turn")[0].score).toBe(4);
  });

  it("a landing before a 90 deg turn scores 3, plus 1 for the short run-out", () => {
    const { plan } = riskOf(rectangleWithJump(BIG_DOUBLE));
    const [into] = kinds(plan, "landing-into-turn");
    expect(into.score).toBe(4);
    expect(into.reason).toMatch(/before T1 \(90\u00b0 left turn\)/);
  });

  it("score a hard landing and a narrow window by their ratio to the club's limits", () => {
    const doc = ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"], after: 12 });
    const { analysis } = riskOf(doc);
    const jump = analysis.classes[0].jumps[0];
    const width = jump.window!.max - jump.window!.min;
    const { plan } = riskOf(doc, {
      overrides: { maxLandingFallHeight: jump.equivalentFallHeight / 1.3, minSpeedWindow: width * 1.6 },
    });
    const [hard] = kinds(plan, "hard-landing");
    expect(hard.score).toBe(3);
    expect(hard.reason).toMatch(
      /^J1 lands hard: like a drop of [\d.]+ m onto flat ground; the track guidance allows/,
    );
    const [narrow] = kinds(plan, "narrow-window");
    expect(narrow.score).toBe(4);
    expect(narrow.reason).toMatch(/^J1 has a speed window of only [\d.]+ m\/s/);
    // At the default limits neither is a hotspot, and 12 m of run-out is no landing into a turn.
    const { plan: plain } = riskOf(doc);
    expect(plain.hotspots.map((h) => h.kind)).not.toContain("hard-landing");
    expect(plain.hotspots.map((h) => h.kind)).not.toContain("landing-into-turn");
  });

  it("overshoot: where cars land and who stands there, scored by the zone's contents", () => {
    const doc = ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"] });
    const { plan } = riskOf(doc);
    const zone = plan.zones.find((z) => z.id === "J1")!;
    const [over] = kinds(plan, "overshoot");
    expect(over.zoneId).toBe("J1");
    expect(over.score).toBe(3); // the far side of the hairpin is in it
    expect(over.reason).toMatch(/^Cars that overshoot J1 land on the track in T1, up to \d+ m past the lip/);
    // A marshal in the zone: one more, and the reason names the point.
    const h = (zone.wedge.headingDeg * Math.PI) / 180;
    const u = (zone.wedge.near + zone.wedge.far) / 2;
    doc.marshalPoints = [{ x: zone.wedge.x + u * Math.cos(h), y: zone.wedge.y - 3 }];
    const { plan: manned } = riskOf(doc);
    const [again] = kinds(manned, "overshoot");
    expect(again.score).toBe(4);
    expect(again.reason).toMatch(/land on the track in T1 where M1 stands/);
  });
});

describe("turn, lane and sight hotspots", () => {
  it("a fast turn whose run-off meets the site boundary half way: speed band plus 1", () => {
    const doc = ruleOval(3);
    doc.marshalPoints = [];
    doc.siteBoundary = [
      [-20, -20],
      [44, -20],
      [44, 40],
      [-20, 40],
    ];
    const { plan } = riskOf(doc);
    const [fast] = kinds(plan, "fast-turn").filter((x) => x.subject === "T1");
    const zone = plan.zones.find((z) => z.id === "T1")!;
    const speed = zone.byClass[0].speed;
    expect(zone.contents.freeRunOff).toBeCloseTo(4, 6); // the boundary is 4 m past the entry
    expect(zone.wedge.far).toBeGreaterThan(8);
    expect(fast.score).toBe(Math.min(5, speedScore(speed) + 1));
    expect(fast.reason).toMatch(
      /^Cars that miss their braking for T1 \(180\u00b0 left hairpin\) run straight on at up to \d+ m\/s past the site boundary, with 4\.0 m of the/,
    );
  });

  it("lanes 0.2 m apart edge to edge score 3", () => {
    const { plan, analysis } = riskOf(ovalWithJump(null, { radius: 1.6, carClasses: ["buggy-2wd-10"] }));
    expect(analysis.laneConflicts.length).toBeGreaterThan(0);
    const [lanes] = kinds(plan, "close-lanes");
    expect(lanes.score).toBe(3);
    expect(lanes.reason).toMatch(
      /pass 0\.2 m apart edge to edge: a car that leaves one lane lands on the other\.$/,
    );
  });

  it("a stretch hidden from the driver stand behind a jump, scored by its length", () => {
    const doc = ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"] });
    const { analysis } = riskOf(doc);
    const hidden = {
      ...analysis,
      hiddenFromStand: [{ fromS: 10, toS: 16, length: 6, blockedBy: "big-double" }],
    };
    const plan = marshalPlan(doc, hidden);
    const [h] = kinds(plan, "hidden");
    expect(h.score).toBe(4);
    expect(h.reason).toBe(
      "6 m of track after the start line is hidden from the driver stand behind J1: drivers cannot see a car that crashes there.",
    );
  });

  it("are numbered H1, H2, ... in lap order", () => {
    const { plan } = riskOf(ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"] }));
    expect(plan.hotspots.map((h) => h.id)).toEqual(plan.hotspots.map((_, i) => `H${i + 1}`));
    const s = plan.hotspots.map((h) => h.s);
    expect(s).toEqual([...s].sort((a, b) => a - b));
    for (const h of plan.hotspots) {
      expect(h.score).toBeGreaterThanOrEqual(1);
      expect(h.score).toBeLessThanOrEqual(5);
    }
  });
});
