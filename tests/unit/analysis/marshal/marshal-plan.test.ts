import { describe, expect, it } from "vitest";
import { createAnalysisCache } from "~/analysis/layout/analysis-cache";
import { analyseLayout } from "~/analysis/layout/layout-analysis";
import { marshalPlan } from "~/analysis/marshal/marshal-plan";
import { keepOutArea, ringArea } from "~/analysis/marshal/polygons";
import { DEFAULT_MARSHAL_SETTINGS, MARSHAL_SETTINGS, marshalSettings } from "~/analysis/marshal/settings";
import { placeOnLap, trackMarks } from "~/analysis/marshal/track-marks";
import { MARSHAL_NOTE } from "~/analysis/marshal/words";
import type { LayoutDocument } from "~/analysis/format/layout-document";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { BIG_DOUBLE, ovalWithJump, ruleOval } from "../analysis-fixtures";

describe("marshal settings", () => {
  it("default to estimates and common practice, each with its source", () => {
    expect(DEFAULT_MARSHAL_SETTINGS).toEqual({
      speedMargin: 0.1,
      spreadDeg: 15,
      rollOutBraking: 1,
      reach: 3,
      heatSize: 10,
      setback: 1,
      coverDistance: 10,
    });
    for (const s of MARSHAL_SETTINGS)
      expect(s.source).toMatch(/estimate|[Cc]ommon practice|class's own braking/);
    expect(MARSHAL_SETTINGS.find((s) => s.id === "heatSize")!.source).toMatch(/^Common practice/);
  });

  it("refuse a bad club value, naming the setting", () => {
    expect(marshalSettings({ reach: 5 }).reach).toBe(5);
    expect(() => marshalSettings({ reach: -1 })).toThrow("settings.reach: must be between 0.5 and 20");
    expect(() => marshalSettings({ heatSize: 2.5 })).toThrow("settings.heatSize: must be a whole number");
    expect(() => marshalSettings({ spreadDeg: Number.NaN })).toThrow("settings.spreadDeg: must be a number");
    expect(() => marshalSettings({ nonsense: 1 } as never)).toThrow(
      "settings.nonsense: is not a marshal setting",
    );
  });
});

describe("jumps and corners as the pages name them", () => {
  it("J1.. in lap order with their names; T1.. for corners, opposite kinks apart", () => {
    const marks = trackMarks(SUMMER_LAYOUT);
    expect(marks.jumps.map((j) => j.title).slice(0, 3)).toEqual([
      "J1 First double",
      "J2 Whoops",
      "J3 Step-up",
    ]);
    expect(marks.jumps).toHaveLength(9);
    expect(marks.corners.map((c) => c.sectionIds.join("+")).slice(5, 8)).toEqual([
      "kink-1",
      "kink-2",
      "kink-3",
    ]);
    expect(marks.corners[5].title).toBe("T6 (20\u00b0 right kink)");
    expect(placeOnLap(marks, marks.corners[0].entryS + 1)).toBe("in T1");
    expect(placeOnLap(marks, 5)).toBe("after the start line");
  });

  it("turns to the same side that follow each other are one corner, across the start line too", () => {
    const doc: LayoutDocument = {
      ...ruleOval(3),
      sections: [
        { id: "a", kind: "turn", radius: 8, angleDeg: 90, direction: "left" },
        { id: "s1", kind: "straight", length: 40 },
        { id: "b", kind: "turn", radius: 8, angleDeg: 90, direction: "left" },
        { id: "c", kind: "turn", radius: 8, angleDeg: 90, direction: "left" },
        { id: "s2", kind: "straight", length: 40 },
        { id: "d", kind: "turn", radius: 8, angleDeg: 90, direction: "left" },
      ],
    };
    const corners = trackMarks(doc).corners;
    expect(corners.map((c) => [c.id, c.sectionIds, Math.round(c.angleDeg)])).toEqual([
      ["T1", ["b", "c"], 180],
      ["T2", ["d", "a"], 180],
    ]);
    expect(placeOnLap(trackMarks(doc), 1)).toBe("in T2");
  });
});

describe("marshalPlan", () => {
  const doc = ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10", "sct-10"] });
  const analysis = analyseLayout(doc, { marshal: {} });

  it("comes with the layout analysis when asked (without suggested points), the same as on its own", () => {
    const plan = marshalPlan(doc, analysis);
    expect(analysis.risk).toEqual(plan);
    expect(analyseLayout(doc).risk).toBeNull();
    expect(plan.suggested).toBeNull();
    expect(plan.note).toBe(MARSHAL_NOTE);
    expect(plan.note).toMatch(/not a safety certification/);
    expect(plan.classIds).toEqual(["buggy-2wd-10", "sct-10"]);
    expect(JSON.parse(JSON.stringify(plan))).toEqual(plan);
    // The keep-out area for drawing: the zones merged, no larger than their sum (shoelace areas).
    const area = keepOutArea(plan.zones).reduce(
      (a, poly) =>
        a + Math.abs(ringArea(poly[0])) - poly.slice(1).reduce((h, r) => h + Math.abs(ringArea(r)), 0),
      0,
    );
    const sum = plan.zones.reduce((a, z) => a + Math.abs(ringArea(z.polygon)), 0);
    expect(area).toBeGreaterThan(Math.max(...plan.zones.map((z) => Math.abs(ringArea(z.polygon)))));
    expect(area).toBeLessThanOrEqual(sum + 1e-6);
  });

  it("takes the club's settings through the analysis, which remembers them apart", () => {
    const cache = createAnalysisCache();
    expect(analyseLayout(doc, { cache, marshal: { reach: 5 } }).risk!.settings.reach).toBe(5);
    expect(analyseLayout(doc, { cache, marshal: {} }).risk!.settings.reach).toBe(3);
    expect(analyseLayout(doc, { cache }).risk).toBeNull();
    expect(analyseLayout(doc, { marshal: false }).risk).toBeNull();
    expect(() => analyseLayout(doc, { marshal: { heatSize: 0 } })).toThrow("settings.heatSize");
  });

  it("can be limited to some classes, and refuses a class or a layout the analysis does not hold", () => {
    const one = marshalPlan(doc, analysis, { classIds: ["sct-10"] });
    expect(one.zones.every((z) => z.byClass.every((c) => c.classId === "sct-10"))).toBe(true);
    expect(() => marshalPlan(doc, analysis, { classIds: ["buggy-8"] })).toThrow(
      'classIds[0]: the analysis has no class "buggy-8"',
    );
    expect(() => marshalPlan(ruleOval(3), analysis)).toThrow("analysis: was made from another layout");
  });
});
