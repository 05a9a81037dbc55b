import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { CAR_NUMBER_FIELDS } from "~/analysis";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { carProfiles } from "~/db/schema";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import { publishDraft } from "~/layouts/publishing.server";
import { profileFormValues } from "~/lib/schemas/car-profiles";
import { presetProfile } from "~/cars/profiles.server";
import { action as apiAnalysis } from "~/routes/api-analysis";
import { loader as apiLayoutAnalysis } from "~/routes/api-layout-analysis";
import { loader as jumpLoader } from "~/routes/jump-page";
import { loader as pageLoader } from "~/routes/layout-page";
import { loader as planLoader } from "~/routes/layout-drawing";
import * as edit from "~/routes/profile-edit";
import { loader as exportLoader } from "~/routes/profile-export";
import * as create from "~/routes/profile-new";
import { loader as listLoader } from "~/routes/profiles";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles, makeUser } from "./helpers/factories";
import { args, formRequest, getRequest, jsonRequest, run } from "./helpers/requests";

const { db } = useTestDatabase();

type Errors = Record<string, string[]>;
const errorsOf = (r: { data: unknown }) => (r.data as { errors: Errors }).errors;
const presetForm = (overrides: Record<string, string> = {}) => ({
  preset: "buggy-2wd-10",
  ...profileFormValues(presetProfile("buggy-2wd-10")!),
  label: "Club racer",
  ...overrides,
});
const save = (fields: Record<string, string>, cookie: string) =>
  run(() => create.action(args(formRequest("/profiles/new", fields, cookie))));
const update = (id: string, fields: Record<string, string>, cookie: string) =>
  run(() => edit.action(args(formRequest(`/profiles/${id}`, fields, cookie), { profileId: id })));
const openProfile = (id: string, cookie: string) =>
  run(() => edit.loader(args(getRequest(`/profiles/${id}`, cookie), { profileId: id })));
const stored = async (userId: string) =>
  (await db()).select().from(carProfiles).where(eq(carProfiles.userId, userId));

async function newProfile(cookie: string, overrides: Record<string, string> = {}) {
  const r = await save(presetForm(overrides), cookie);
  expect(r.status).toBe(302);
  return r.location!.split("/").pop()!;
}

describe("own car profiles", () => {
  it("starts from a class preset with every value marked an estimate; a changed value is the owner's", async () => {
    const driver = await makeUser();
    const page = await run(() =>
      create.loader(args(getRequest("/profiles/new?preset=sct-10", driver.cookie))),
    );
    const values = (page.data as { values: Record<string, string> }).values;
    for (const f of CAR_NUMBER_FIELDS) expect(Number(values[f.name]), f.name).toBeGreaterThan(f.min - 1e-12);
    const id = await newProfile(driver.cookie, { massKg: "1,72 kg", "inertia.2": "0.031" });
    const opened = await openProfile(id, driver.cookie);
    const d = opened.data as { label: string; values: Record<string, string>; estimates: string[] };
    expect(d.label).toBe("Club racer");
    expect(d.values.massKg).toBe("1.72");
    expect(d.estimates).not.toContain("massKg");
    expect(d.estimates).not.toContain("inertia.2");
    expect(d.estimates).toContain("casterDeg");
    expect(d.estimates).toHaveLength(CAR_NUMBER_FIELDS.length - 2);
  });

  it("names every bad field (400), keeps everything typed, and saves nothing", async () => {
    const driver = await makeUser();
    const r = await save(
      presetForm({ label: "", massKg: "1600", "frontWheel.radius": "41 mm", casterDeg: "", drive: "6wd" }),
      driver.cookie,
    );
    expect(r.status).toBe(400);
    const errors = errorsOf(r);
    expect(Object.keys(errors).sort()).toEqual([
      "casterDeg",
      "drive",
      "frontWheel.radius",
      "label",
      "massKg",
    ]);
    expect(errors.massKg[0]).toMatch(/Mass must be at most 20 kg/);
    expect(errors["frontWheel.radius"][0]).toMatch(/Front wheel radius must be a number \(m\)/);
    expect(errors.casterDeg[0]).toMatch(/Enter the caster in deg/);
    expect((r.data as { values: Record<string, string> }).values.massKg).toBe("1600");
    expect(await stored(driver.id)).toEqual([]);
    // An edit refused the same way leaves the saved profile as it was.
    const id = await newProfile(driver.cookie);
    const bad = await update(id, presetForm({ topSpeed: "-3" }), driver.cookie);
    expect(bad.status).toBe(400);
    expect(errorsOf(bad).topSpeed[0]).toMatch(/Top speed must be at least 2 m\/s/);
    const [row] = await stored(driver.id);
    expect(JSON.parse(row.profile).topSpeed).toBe(17);
  });

  it("is the owner's alone: 404 for anyone else reading, changing, deleting or downloading it", async () => {
    const owner = await makeUser();
    const other = await makeUser();
    const id = await newProfile(owner.cookie);
    expect((await openProfile(id, other.cookie)).status).toBe(404);
    expect((await update(id, presetForm({ label: "Mine now" }), other.cookie)).status).toBe(404);
    expect((await update(id, { intent: "delete" }, other.cookie)).status).toBe(404);
    const file = await run(() =>
      exportLoader(args(getRequest(`/profiles/${id}/export`, other.cookie), { profileId: id })),
    );
    expect(file.status).toBe(404);
    const list = await run(() => listLoader(args(getRequest("/profiles", other.cookie))));
    expect((list.data as { profiles: unknown[] }).profiles).toEqual([]);
    expect((await openProfile(id, "")).location).toMatch(/^\/sign-in/);
    const [row] = await stored(owner.id);
    expect(JSON.parse(row.profile).label).toBe("Club racer");
    const own = await run(() =>
      exportLoader(args(getRequest(`/profiles/${id}/export`, owner.cookie), { profileId: id })),
    );
    expect(own.data as { format: string; label: string }).toMatchObject({
      format: "loftline-car",
      label: "Club racer",
    });
    expect((await update(id, { intent: "delete" }, owner.cookie)).status).toBe(302);
    expect(await stored(owner.id)).toEqual([]);
  });

  it("analyses the layout, a jump, the plan and the API for the reader's own car, and remembers the choice", async () => {
    const { club, director, driver } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const id = await newProfile(director.cookie, { label: "Heavy test car", massKg: "3", topSpeed: "12" });
    const car = `profile:${id}`;
    const page = await run(() =>
      pageLoader(
        args(getRequest(`/layouts/${layout.id}?car=${car}&skill=expert`, director.cookie), {
          layoutId: layout.id,
        }),
      ),
    );
    expect(page.status).toBe(200);
    type A = {
      car: string;
      classId: string;
      skill: string;
      cars: { value: string }[];
      result: { chosen: { label: string; lapTime: number } };
    };
    const a = (page.data as { analysis: A }).analysis;
    expect(a.car).toBe(car);
    expect(a.classId).toMatch(/^own-[0-9a-f]{16}$/);
    expect(a.result.chosen.label).toBe("Heavy test car");
    expect(a.cars.map((c) => c.value)).toContain(car);
    // The next page without parameters opens with the same car and skill.
    const jump = await run(() =>
      jumpLoader(
        args(getRequest(`/layouts/${layout.id}/jumps/first-double`, director.cookie), {
          layoutId: layout.id,
          sectionId: "first-double",
        }),
      ),
    );
    expect(jump.data as { car: string; skill: string; classLabel: string }).toMatchObject({
      car,
      skill: "expert",
      classLabel: "Heavy test car",
    });
    const plan = await run(() =>
      planLoader(args(getRequest(`/layouts/${layout.id}/plan`, director.cookie), { layoutId: layout.id })),
    );
    expect((plan.data as { analysis: { car: string; skill: string } }).analysis).toMatchObject({
      car,
      skill: "expert",
    });
    const api = await run(() =>
      apiLayoutAnalysis(
        args(getRequest(`/api/layouts/${layout.id}/analysis?car=${car}`, director.cookie), {
          layoutId: layout.id,
        }),
      ),
    );
    expect(api.status).toBe(200);
    const classes = (api.data as { analysis: { classes: { label: string; lapTime: number }[] } }).analysis
      .classes;
    expect(classes.map((c) => c.label)).toEqual(["Heavy test car"]);
    expect(classes[0].lapTime).toBeCloseTo(a.result.chosen.lapTime, 3); // the API writes six digits
    const post = await run(() =>
      apiAnalysis(args(jsonRequest("/api/analysis", { document: SUMMER_LAYOUT, car }, director.cookie))),
    );
    expect((post.data as { overlay: { classId: string } }).overlay.classId).toBe(a.classId);
    // Someone else's profile: named on the page (400, the layout's first class shown), 404 from the API.
    await publishDraft(layout.id, 1, { raceDate: "2030-06-01", note: "" }, director.id);
    const page2 = await run(() =>
      pageLoader(
        args(getRequest(`/layouts/${layout.id}?car=${car}`, driver.cookie), { layoutId: layout.id }),
      ),
    );
    expect(page2.status).toBe(400);
    const b = (page2.data as { analysis: A & { problems: string[] } }).analysis;
    expect(b.problems[0]).toMatch(
      /^car: "profile:.*" is not one of this layout's car classes or your car profiles/,
    );
    expect(b.car).toBe(SUMMER_LAYOUT.carClasses[0]);
    const other = await run(() =>
      apiAnalysis(args(jsonRequest("/api/analysis", { document: SUMMER_LAYOUT, car }, driver.cookie))),
    );
    expect(other.status).toBe(404);
    const stranger = await makeUser();
    const bad = await run(() =>
      apiAnalysis(
        args(jsonRequest("/api/analysis", { document: SUMMER_LAYOUT, car: "profile:nope" }, stranger.cookie)),
      ),
    );
    expect(bad.status).toBe(404);
  });
});
