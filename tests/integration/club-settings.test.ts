import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT, WET_WEATHER_LAYOUT } from "~/db/demo-layouts";
import { loadClubGuidance } from "~/clubs/guidance.server";
import { getDb } from "~/db/client.server";
import { layouts } from "~/db/schema";
import { analyseStoredLayout } from "~/layouts/analysis.server";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import { action, loader } from "~/routes/club-settings";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, formRequest, getRequest, run } from "./helpers/requests";

useTestDatabase();

const EMPTY_OVERRIDES = {
  minTrackWidth: "",
  minLapLength: "",
  maxStandDistance: "",
  minStartStraight: "",
  maxHiddenLength: "",
  maxMarshalGapRatio: "",
};

function post(clubId: string, fields: Record<string, string>, cookie: string) {
  return run(() => action(args(formRequest(`/clubs/${clubId}/settings`, fields, cookie), { clubId })));
}

describe("club track guidance settings", () => {
  it("is for directors only: 403 for a marshal, a driver and an outsider, on the page and the form", async () => {
    const { club, marshal, driver, outsider } = await makeClubWithRoles();
    for (const person of [marshal, driver, outsider]) {
      const page = await run(() =>
        loader(args(getRequest(`/clubs/${club.id}/settings`, person.cookie), { clubId: club.id })),
      );
      expect(page.status).toBe(403);
      const save = await post(
        club.id,
        { guidanceSet: "national", ...EMPTY_OVERRIDES, minTrackWidth: "1" },
        person.cookie,
      );
      expect(save.status).toBe(403);
    }
    expect(await loadClubGuidance(club.id)).toEqual({ guidanceSet: "club", overrides: {} });
  });

  it("shows the sets, the club's values and each rule's source to a director", async () => {
    const { club, director } = await makeClubWithRoles();
    const page = await run(() =>
      loader(args(getRequest(`/clubs/${club.id}/settings`, director.cookie), { clubId: club.id })),
    );
    expect(page.status).toBe(200);
    const body = page.data as {
      guidance: unknown;
      sets: { id: string; values: { minTrackWidth: number } }[];
      sources: Record<string, string>;
    };
    expect(body.guidance).toEqual({ guidanceSet: "club", overrides: {} });
    // engine.md: width at least 2.4 m for clubs, 3 m at national level.
    expect(body.sets.map((s) => [s.id, s.values.minTrackWidth])).toEqual([
      ["club", 2.4],
      ["national", 3],
    ]);
    expect(body.sources.minTrackWidth).toMatch(/rulebook/);
  });

  it("refuses a bad value with 400 naming the field, and keeps what was saved", async () => {
    const { club, director } = await makeClubWithRoles();
    const ok = await post(
      club.id,
      { guidanceSet: "national", ...EMPTY_OVERRIDES, maxStandDistance: "60" },
      director.cookie,
    );
    expect(ok.status).toBe(302);
    const r = await post(
      club.id,
      { guidanceSet: "club", ...EMPTY_OVERRIDES, minTrackWidth: "wide", maxStandDistance: "9000" },
      director.cookie,
    );
    expect(r.status).toBe(400);
    const errors = (r.data as { errors: Record<string, string[]> }).errors;
    expect(Object.keys(errors).sort()).toEqual(["maxStandDistance", "minTrackWidth"]);
    expect(errors.minTrackWidth[0]).toMatch(/Narrowest track width must be a number/);
    expect(errors.maxStandDistance[0]).toMatch(/between 5 and 500 m/);
    const bad = await post(club.id, { guidanceSet: "regional", ...EMPTY_OVERRIDES }, director.cookie);
    expect(bad.status).toBe(400);
    expect(Object.keys((bad.data as { errors: object }).errors)).toEqual(["guidanceSet"]);
    expect(await loadClubGuidance(club.id)).toEqual({
      guidanceSet: "national",
      overrides: { maxStandDistance: 60 },
    });
  });

  it("saves the set and the overrides (decimal comma accepted), and clears an emptied field", async () => {
    const { club, director } = await makeClubWithRoles();
    await post(
      club.id,
      { guidanceSet: "national", ...EMPTY_OVERRIDES, minTrackWidth: "2,8", minLapLength: "150" },
      director.cookie,
    );
    expect(await loadClubGuidance(club.id)).toEqual({
      guidanceSet: "national",
      overrides: { minTrackWidth: 2.8, minLapLength: 150 },
    });
    await post(club.id, { guidanceSet: "club", ...EMPTY_OVERRIDES, minLapLength: "150" }, director.cookie);
    expect(await loadClubGuidance(club.id)).toEqual({
      guidanceSet: "club",
      overrides: { minLapLength: 150 },
    });
  });
});

describe("the rule checks follow the club's settings", () => {
  it("checks a saved layout against the club's override and says where the value comes from", async () => {
    const { club, director } = await makeClubWithRoles();
    // The wet-weather demo layout is 3.2 m wide: it passes the national set's 3 m (engine.md).
    const layout = await createLayoutFromDocument(club.id, WET_WEATHER_LAYOUT, director.id);
    const width = async () => {
      const [row] = await (await getDb()).select().from(layouts).where(eq(layouts.id, layout.id));
      const run = await analyseStoredLayout(row, { classIds: ["buggy-2wd-10"], skill: "club" });
      return run.analysis.rules.checks.find((c) => c.id === "minTrackWidth")!;
    };
    await post(club.id, { guidanceSet: "national", ...EMPTY_OVERRIDES }, director.cookie);
    expect(await width()).toMatchObject({ value: 3, status: "pass" });
    await post(
      club.id,
      { guidanceSet: "national", ...EMPTY_OVERRIDES, minTrackWidth: "3.5" },
      director.cookie,
    );
    const overridden = await width();
    expect(overridden).toMatchObject({ value: 3.5, measured: 3.2, status: "fail" });
    expect(overridden.source).toMatch(/^Club setting/);
  });
});

describe("the set-up verdicts follow the club's values", () => {
  it("saves the smallest worthwhile gain and turn of the nose, refuses bad ones naming the field, and the verdicts use them", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const verdict = async () => {
      const [row] = await (await getDb()).select().from(layouts).where(eq(layouts.id, layout.id));
      const run = await analyseStoredLayout(row, { classIds: ["buggy-2wd-10"], skill: "club" });
      return run.analysis.classes[0].jumps.find((j) => j.sectionId === "hairpin-double")!.verdicts.expert;
    };
    // Defaults (estimates): 0.05 s a pass and 10 deg.
    expect(await verdict()).toMatchObject({ minGainPerPass: 0.05, minNoseTurnDeg: 10 });
    const ok = await post(
      club.id,
      { guidanceSet: "club", ...EMPTY_OVERRIDES, minGainPerPass: "0,1", minNoseTurnDeg: "15" },
      director.cookie,
    );
    expect(ok.status).toBe(302);
    expect(await loadClubGuidance(club.id)).toEqual({
      guidanceSet: "club",
      overrides: {},
      verdict: { minGainPerPass: 0.1, minNoseTurnDeg: 15 },
    });
    const v = await verdict();
    expect(v.minGainPerPass).toBe(0.1);
    expect(v.minNoseTurnDeg).toBeCloseTo(15, 9);
    const bad = await post(
      club.id,
      { guidanceSet: "club", ...EMPTY_OVERRIDES, minGainPerPass: "lots", minNoseTurnDeg: "90" },
      director.cookie,
    );
    expect(bad.status).toBe(400);
    const errors = (bad.data as { errors: Record<string, string[]> }).errors;
    expect(Object.keys(errors).sort()).toEqual(["minGainPerPass", "minNoseTurnDeg"]);
    expect(errors.minNoseTurnDeg[0]).toMatch(/between 0 and 45/);
    expect((await loadClubGuidance(club.id)).verdict).toEqual({ minGainPerPass: 0.1, minNoseTurnDeg: 15 });
  });
});
