import { describe, expect, it } from "vitest";
import { EXAMPLE_LAYOUT, parseLayoutDocument, type LayoutDocument } from "~/analysis/format/layout-document";
import { layoutRuleReport, measureLayout } from "~/analysis/track/layout-measure";
import {
  checkRules,
  GUIDANCE_SETS,
  guidanceValues,
  JUMP_RULE_DEFAULTS,
  RULES_NOTE,
  type RuleMeasurements,
} from "~/analysis/track/rules";

function example(edit: (d: LayoutDocument) => void = () => {}): LayoutDocument {
  const r = parseLayoutDocument(structuredClone(EXAMPLE_LAYOUT));
  if (!r.ok) throw new Error("example must parse");
  edit(r.document);
  return r.document;
}

const good: RuleMeasurements = {
  trackWidth: 3,
  lapLength: 200,
  standDistance: 40,
  startStraight: 25,
  hiddenLength: 0,
  marshalGapRatio: 1.2,
  landingRunOut: 5,
  landingFallHeight: 0.2,
  speedWindow: 0.5,
};

describe("track guidance sets", () => {
  it("carry the values quoted from sanctioning bodies' public rulebooks", () => {
    // engine.md, "Sanctioning bodies' track guidance as quoted in their public rulebooks":
    // width 2.4 m (3 m national), length 120 m, stand 50 m, start straight 20 m, nothing hidden.
    expect(GUIDANCE_SETS.club.values).toMatchObject({
      minTrackWidth: 2.4,
      minLapLength: 120,
      maxStandDistance: 50,
      minStartStraight: 20,
      maxHiddenLength: 0,
    });
    expect(GUIDANCE_SETS.national.values.minTrackWidth).toBe(3);
  });

  it("fail on a 2 m wide track and pass on 3 m", () => {
    for (const set of ["club", "national"] as const) {
      const narrow = checkRules({ ...good, trackWidth: 2 }, set).checks.find(
        (c) => c.id === "minTrackWidth",
      )!;
      const wide = checkRules({ ...good, trackWidth: 3 }, set).checks.find((c) => c.id === "minTrackWidth")!;
      expect(narrow.status).toBe("fail");
      expect(wide.status).toBe("pass");
      expect(narrow.measured).toBe(2);
      expect(narrow.source).toMatch(/rulebook/);
    }
  });

  it("measure a real layout: 2 m fails and 3 m passes the width rule", () => {
    const narrow = example((d) => (d.trackWidth = 2));
    const wide = example((d) => (d.trackWidth = 3));
    const width = (d: LayoutDocument) =>
      layoutRuleReport(d, measureLayout(d)).checks.find((c) => c.id === "minTrackWidth")!.status;
    expect(width(narrow)).toBe("fail");
    expect(width(wide)).toBe("pass");
  });

  it("check every rule, with the note that the rulebook decides", () => {
    const all = checkRules(good, "club");
    expect(all.checks.map((c) => c.status)).toEqual(Array(9).fill("pass"));
    expect(all.note).toBe(RULES_NOTE);
    expect(all.note).toMatch(/current rulebook decides/);
    const bad = checkRules(
      {
        trackWidth: 2,
        lapLength: 100,
        standDistance: 60,
        startStraight: 12,
        hiddenLength: 3,
        marshalGapRatio: 2.5,
        landingRunOut: 1.5,
        landingFallHeight: 0.8,
        speedWindow: 0.1,
      },
      "club",
    );
    expect(bad.failed).toBe(9);
    expect(bad.checks.find((c) => c.id === "minLapLength")!.detail).toBe(
      "100 m measured; at least 120 m required",
    );
  });

  it("cannot check the stand without one; no marshal points fails the spread", () => {
    const r = checkRules(
      { ...good, standDistance: null, hiddenLength: null, marshalGapRatio: null },
      "national",
    );
    expect(r.checks.find((c) => c.id === "maxStandDistance")!.status).toBe("not checked");
    expect(r.checks.find((c) => c.id === "maxHiddenLength")!.status).toBe("not checked");
    expect(r.checks.find((c) => c.id === "maxMarshalGapRatio")!.status).toBe("fail");
    expect(r.notChecked).toBe(2);
    // Without jump measurements the jump rules are not checked (a layout without jumps).
    const plain = checkRules(
      { ...good, landingRunOut: null, landingFallHeight: undefined, speedWindow: null },
      "club",
    );
    expect(plain.notChecked).toBe(3);
    expect(plain.checks.find((c) => c.id === "minLandingRunOut")!.detail).toBe("no jump lands before a turn");
  });

  it("take a club's overrides and say so in the source", () => {
    const r = checkRules({ ...good, trackWidth: 2 }, "club", { minTrackWidth: 1.8 });
    const width = r.checks.find((c) => c.id === "minTrackWidth")!;
    expect(width.status).toBe("pass");
    expect(width.value).toBe(1.8);
    expect(width.source).toMatch(/^Club setting \(the club set says 2.4 m\)/);
    expect(() => guidanceValues("club", { minLapLength: -5 })).toThrow("overrides.minLapLength");
    expect(() => guidanceValues("club", { nonsense: 1 } as never)).toThrow("overrides.nonsense");
  });

  it("the example layout measures as expected", () => {
    const d = example();
    const m = measureLayout(d);
    const r = layoutRuleReport(d, m);
    const byId = Object.fromEntries(r.checks.map((c) => [c.id, c]));
    // The example oval is 2 x 24 m + 2 pi 7 m: under the 120 m minimum (exact geometry).
    expect(byId.minLapLength.measured).toBeCloseTo(48 + 14 * Math.PI, 2);
    expect(byId.minLapLength.status).toBe("fail");
    expect(byId.minStartStraight.measured).toBe(24);
    expect(byId.maxMarshalGapRatio.status).toBe("pass");
  });

  it("carry the three jump rules with defaults marked as estimates or common practice, not a rulebook", () => {
    for (const set of ["club", "national"] as const)
      expect(GUIDANCE_SETS[set].values).toMatchObject(JUMP_RULE_DEFAULTS);
    const r = checkRules(good, "club");
    const byId = Object.fromEntries(r.checks.map((c) => [c.id, c]));
    expect(byId.minLandingRunOut).toMatchObject({ value: 3, unit: "m", comparison: "at least" });
    expect(byId.maxLandingFallHeight).toMatchObject({ value: 0.5, unit: "m", comparison: "at most" });
    expect(byId.minSpeedWindow).toMatchObject({ value: 0.2, unit: "m/s", comparison: "at least" });
    expect(byId.minLandingRunOut.source).toMatch(/common practice/);
    expect(byId.maxLandingFallHeight.source).toMatch(
      /estimate from memory.*Levy, Hubbard, McNeil & Swedberg/,
    );
    expect(byId.minSpeedWindow.source).toMatch(/estimate from memory/);
    for (const id of ["minLandingRunOut", "maxLandingFallHeight", "minSpeedWindow"])
      expect(byId[id].source).not.toMatch(/rulebooks/);
  });

  it("name the worst jump and every other jump that fails, and take a club's values", () => {
    const m: RuleMeasurements = {
      ...good,
      landingRunOut: 1.48,
      where: { minLandingRunOut: "J7 Hairpin table (1/10 four-wheel-drive buggy)" },
      failing: { minLandingRunOut: ["J1 First double", "J7 Hairpin table"] },
    };
    const runOut = checkRules(m, "club").checks.find((c) => c.id === "minLandingRunOut")!;
    expect(runOut.status).toBe("fail");
    expect(runOut.where).toBe("J7 Hairpin table (1/10 four-wheel-drive buggy)");
    expect(runOut.detail).toBe(
      "1.48 m measured at J7 Hairpin table (1/10 four-wheel-drive buggy); at least 3 m required; also J1 First double",
    );
    const relaxed = checkRules(m, "club", { minLandingRunOut: 1.4 }).checks.find(
      (c) => c.id === "minLandingRunOut",
    )!;
    expect(relaxed.status).toBe("pass");
    expect(relaxed.source).toBe("Club setting (the club set says 3 m)");
    expect(() => guidanceValues("club", { minSpeedWindow: -0.1 })).toThrow("overrides.minSpeedWindow");
  });
});
