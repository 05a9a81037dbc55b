import { describe, expect, it } from "vitest";
import { analyseLayout, DEFAULT_MARSHAL_SETTINGS, marshalPlan } from "~/analysis";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { clubs } from "~/db/schema";
import { applySuggested } from "~/lib/editor/marshal-plan-types";
import { parseForm } from "~/lib/forms";
import { clubMarshalSchema, clubMarshalSettings, DEFAULT_CLUB_MARSHAL } from "~/lib/schemas/marshal-settings";

const form = (fields: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.set(k, v);
  return parseForm(clubMarshalSchema, f);
};

describe("club marshal settings", () => {
  it("default to the engine's values, and the columns' defaults are the same", () => {
    expect(DEFAULT_CLUB_MARSHAL).toEqual({
      reach: DEFAULT_MARSHAL_SETTINGS.reach,
      heatSize: DEFAULT_MARSHAL_SETTINGS.heatSize,
    });
    expect(clubs.marshalReach.default).toBe(DEFAULT_MARSHAL_SETTINGS.reach);
    expect(clubs.heatSize.default).toBe(DEFAULT_MARSHAL_SETTINGS.heatSize);
  });

  it("read a stored row, falling back to the default for a value the engine refuses", () => {
    expect(clubMarshalSettings({ reach: 4.5, heatSize: 8 })).toEqual({ reach: 4.5, heatSize: 8 });
    expect(clubMarshalSettings({ reach: 0, heatSize: 7.5 })).toEqual({ reach: 3, heatSize: 10 });
    expect(clubMarshalSettings({ reach: Number.NaN })).toEqual({ reach: 3, heatSize: 10 });
  });

  it("parse the form: units and a decimal comma accepted, each problem on its field", () => {
    expect(form({ intent: "marshal-settings", reach: " 2,5 m ", heatSize: "12" })).toEqual({
      ok: true,
      data: { intent: "marshal-settings", reach: 2.5, heatSize: 12 },
    });
    const bad = form({ intent: "marshal-settings", reach: "25", heatSize: "ten" });
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.errors.reach?.[0]).toMatch(/between 0.5 and 20 m/);
      expect(bad.errors.heatSize?.[0]).toMatch(/whole number/);
    }
  });

  it("feed the engine: the reach sets the too-far warning and the heat size the suggested count", () => {
    const analysis = analyseLayout(SUMMER_LAYOUT, { skill: "club" });
    const narrow = marshalPlan(SUMMER_LAYOUT, analysis, {
      settings: clubMarshalSettings({ reach: 0.5, heatSize: 4 }),
      suggest: true,
    });
    expect(narrow.settings.reach).toBe(0.5);
    expect(narrow.suggested?.asked).toBe(4);
    expect(narrow.suggested?.points.length).toBeLessThanOrEqual(4);
    // The demo's points stand 0.7 m or more from the edge: with a 0.5 m reach each is too far.
    const far = narrow.points.filter((p) => p.warnings.some((w) => w.kind === "too-far"));
    expect(far.length).toBe(narrow.points.filter((p) => p.edgeDistance > 0.5).length);
    expect(far.length).toBeGreaterThan(0);
    const wide = marshalPlan(SUMMER_LAYOUT, analysis, { settings: clubMarshalSettings({ reach: 20 }) });
    expect(wide.points.flatMap((p) => p.warnings).filter((w) => w.kind === "too-far")).toEqual([]);
  });

  it("apply a suggestion as the document's points, to the centimetre", () => {
    const doc = { name: "x", marshalPoints: [{ x: 1, y: 1 }] };
    expect(applySuggested(doc, [{ x: 1.234, y: -5.678 }])).toEqual({
      name: "x",
      marshalPoints: [{ x: 1.23, y: -5.68 }],
    });
  });
});
