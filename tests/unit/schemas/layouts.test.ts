import { describe, expect, it } from "vitest";
import { parseForm } from "~/lib/forms";
import { FIELD_LIMITS } from "~/analysis";
import { RULE_FIELDS } from "~/lib/schemas/club-settings";
import {
  createLayoutSchema,
  layoutActionSchema,
  LIST_FIELDS,
  TRACK_WIDTH_MAX_M,
  TRACK_WIDTH_MIN_M,
} from "~/lib/schemas/layouts";

const form = (fields: Record<string, string | string[]>) => {
  const fd = new FormData();
  for (const [k, v] of Object.entries(fields)) for (const x of [v].flat()) fd.append(k, x);
  return fd;
};
const CLASSES = ["buggy-2wd-10"];
const create = (fields: Record<string, string | string[]>) =>
  parseForm(createLayoutSchema, form({ carClasses: CLASSES, ...fields }), LIST_FIELDS);
const width = (trackWidth: string) => create({ name: "Loop", surface: "dirt", trackWidth });
const ok = (trackWidth: number) => ({
  ok: true,
  data: { name: "Loop", surface: "dirt", trackWidth, carClasses: CLASSES },
});

describe("createLayoutSchema", () => {
  it("reads the track width in metres, with a decimal point or comma, within 1 to 10 m", () => {
    expect(width("3.5")).toEqual(ok(3.5));
    expect(width(" 2,75 ")).toEqual(ok(2.75));
    // The same reading as the editor's number fields: the unit may follow the number.
    expect(width("3,5 m")).toEqual(ok(3.5));
    expect(width(String(TRACK_WIDTH_MIN_M)).ok).toBe(true);
    expect(width(String(TRACK_WIDTH_MAX_M)).ok).toBe(true);
    expect(width("0.99")).toEqual({
      ok: false,
      errors: { trackWidth: ["Track width must be at least 1 m."] },
    });
    expect(width("10.01")).toEqual({
      ok: false,
      errors: { trackWidth: ["Track width must be at most 10 m."] },
    });
    expect(width("")).toEqual({ ok: false, errors: { trackWidth: ["Enter the track width in metres."] } });
    for (const bad of ["three", "3 ft", "0x3", "1,000.5"])
      expect(width(bad)).toEqual({
        ok: false,
        errors: { trackWidth: ["Enter the track width as a number of metres, like 3.5."] },
      });
  });

  it("uses one set of width limits: the layout file's, the editor's and the club rule's", () => {
    expect([TRACK_WIDTH_MIN_M, TRACK_WIDTH_MAX_M]).toEqual([
      FIELD_LIMITS.trackWidth.min,
      FIELD_LIMITS.trackWidth.max,
    ]);
    const rule = RULE_FIELDS.find((f) => f.id === "minTrackWidth")!;
    expect([rule.min, rule.max]).toEqual([TRACK_WIDTH_MIN_M, TRACK_WIDTH_MAX_M]);
  });

  it("needs one to ten class presets, each counted once", () => {
    expect(
      create({ name: "L", surface: "dirt", trackWidth: "3", carClasses: ["sct-10", "sct-10"] }),
    ).toMatchObject({
      ok: true,
      data: { carClasses: ["sct-10"] },
    });
    expect(create({ name: "L", surface: "dirt", trackWidth: "3", carClasses: [] })).toEqual({
      ok: false,
      errors: { carClasses: ["Choose at least one car class."] },
    });
  });

  it("accepts the four surfaces only and needs a name", () => {
    for (const surface of ["dirt", "clay", "turf", "carpet"]) {
      expect(create({ name: "L", surface, trackWidth: "3" }).ok).toBe(true);
    }
    expect(create({ name: "  ", surface: "sand", trackWidth: "3" })).toEqual({
      ok: false,
      errors: {
        name: ["Enter a name for the layout."],
        surface: ["Choose a surface: dirt, clay, turf or carpet."],
      },
    });
  });
});

describe("layoutActionSchema", () => {
  it("needs the version a change started from, as a whole number", () => {
    expect(parseForm(layoutActionSchema, form({ intent: "archive", version: "7" }))).toEqual({
      ok: true,
      data: { intent: "archive", version: 7 },
    });
    const bad = parseForm(layoutActionSchema, form({ intent: "unarchive", version: "7.5" }));
    expect(bad).toEqual({
      ok: false,
      errors: { version: ["The form's layout version is not valid; reload the page."] },
    });
  });

  it("deletes only when the confirmation is ticked", () => {
    expect(parseForm(layoutActionSchema, form({ intent: "delete", confirm: "yes" })).ok).toBe(true);
    const r = parseForm(layoutActionSchema, form({ intent: "delete" }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.confirm?.[0]).toMatch(/Tick the box/);
  });

  it("refuses an unknown intent, naming the field", () => {
    const r = parseForm(layoutActionSchema, form({ intent: "rename-all" }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.errors)).toEqual(["intent"]);
  });
});
