/**
 * The car class picker: a new layout's classes (starting from the club's default classes), a
 * layout's classes in its settings, and the club's default classes; each on a real SQLite file.
 */
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { layouts } from "~/db/schema";
import { createLayoutFromDocument, loadLayoutDocument } from "~/layouts/documents.server";
import * as clubSettings from "~/routes/club-settings";
import * as layoutNew from "~/routes/layout-new";
import * as layoutPage from "~/routes/layout-page";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, formRequest, getRequest, run } from "./helpers/requests";

const { db } = useTestDatabase();

type Fields = Record<string, string | string[]>;
type Errors = Record<string, string[]>;
const errorsOf = (r: { data: unknown }) => (r.data as { errors: Errors }).errors;
const row = async (id: string) => (await (await db()).select().from(layouts).where(eq(layouts.id, id)))[0];

const newLayoutPage = (clubId: string, cookie: string) =>
  run(() => layoutNew.loader(args(getRequest(`/clubs/${clubId}/layouts/new`, cookie), { clubId })));
const create = (clubId: string, fields: Fields, cookie: string) =>
  run(() => layoutNew.action(args(formRequest(`/clubs/${clubId}/layouts/new`, fields, cookie), { clubId })));
const update = (layoutId: string, fields: Fields, cookie: string) =>
  run(() => layoutPage.action(args(formRequest(`/layouts/${layoutId}`, fields, cookie), { layoutId })));
const saveDefaults = (clubId: string, carClasses: string[], cookie: string) =>
  run(() =>
    clubSettings.action(
      args(formRequest(`/clubs/${clubId}/settings`, { intent: "default-classes", carClasses }, cookie), {
        clubId,
      }),
    ),
  );
const base = { name: "Picker loop", surface: "dirt", trackWidth: "3" };

describe("car classes of a new layout", () => {
  it("starts from the club's default classes and stores the ones ticked, which the analysis then uses", async () => {
    const { club, director } = await makeClubWithRoles();
    const page = await newLayoutPage(club.id, director.cookie);
    expect((page.data as { carClasses: string[] }).carClasses).toEqual(["buggy-2wd-10"]);

    const r = await create(club.id, { ...base, carClasses: ["buggy-4wd-10", "sct-10"] }, director.cookie);
    expect(r.status).toBe(302);
    const id = r.location!.split("/").pop()!;
    expect(JSON.parse((await row(id)).carClasses!)).toEqual(["buggy-4wd-10", "sct-10"]);
    const { document } = await loadLayoutDocument(await row(id));
    expect(document.carClasses).toEqual(["buggy-4wd-10", "sct-10"]);
    const page2 = await run(() =>
      layoutPage.loader(args(getRequest(`/layouts/${id}`, director.cookie), { layoutId: id })),
    );
    const classes = (page2.data as { analysis: { classes: { classId: string }[] } }).analysis.classes;
    expect(classes.map((c) => c.classId)).toEqual(["buggy-4wd-10", "sct-10"]);
  });

  it("answers 400 naming the classes when none, an unknown one or more than ten are sent, keeping what was ticked", async () => {
    const { club, director } = await makeClubWithRoles();
    const none = await create(club.id, { ...base }, director.cookie);
    expect(none.status).toBe(400);
    expect(errorsOf(none).carClasses).toEqual(["Choose at least one car class."]);
    const unknown = await create(
      club.id,
      { ...base, carClasses: ["sct-10", "monster-truck"] },
      director.cookie,
    );
    expect(unknown.status).toBe(400);
    expect(errorsOf(unknown).carClasses[0]).toMatch(/from the list \("monster-truck" is not one\)/);
    expect((unknown.data as { values: { carClasses: string[] } }).values.carClasses).toEqual([
      "sct-10",
      "monster-truck",
    ]);
    const many = Array.from({ length: 11 }, (_, k) => `class-${k}`);
    expect(
      errorsOf(await create(club.id, { ...base, carClasses: many }, director.cookie)).carClasses[0],
    ).toBe("Choose at most 10 car classes.");
    expect(await (await db()).select().from(layouts).where(eq(layouts.clubId, club.id))).toEqual([]);
  });
});

describe("car classes in a layout's settings", () => {
  it("changes the classes of a drawn layout, bumping its version; the drawing is kept", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    expect(JSON.parse((await row(layout.id)).carClasses!)).toEqual(SUMMER_LAYOUT.carClasses);
    const r = await update(
      layout.id,
      { intent: "update", version: "1", ...base, carClasses: ["buggy-8"] },
      director.cookie,
    );
    expect(r.status).toBe(302);
    const after = await row(layout.id);
    expect(after.version).toBe(2);
    const { document } = await loadLayoutDocument(after);
    expect(document.carClasses).toEqual(["buggy-8"]);
    expect(document.sections).toEqual(SUMMER_LAYOUT.sections);
    const page = await run(() =>
      layoutPage.loader(args(getRequest(`/layouts/${layout.id}`, director.cookie), { layoutId: layout.id })),
    );
    const data = page.data as {
      layout: { carClasses: string[] };
      analysis: { classes: { classId: string }[] };
    };
    expect(data.layout.carClasses).toEqual(["buggy-8"]);
    expect(data.analysis.classes.map((c) => c.classId)).toEqual(["buggy-8"]);
  });

  it("refuses an empty choice with 400 and changes nothing", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const r = await update(layout.id, { intent: "update", version: "1", ...base }, director.cookie);
    expect(r.status).toBe(400);
    expect(errorsOf(r).carClasses).toEqual(["Choose at least one car class."]);
    expect((await row(layout.id)).version).toBe(1);
  });
});

describe("the club's default car classes", () => {
  it("are saved by a director and offered to the next new layout", async () => {
    const { club, director } = await makeClubWithRoles();
    const r = await saveDefaults(club.id, ["buggy-2wd-10", "buggy-4wd-10", "buggy-8"], director.cookie);
    expect(r.status).toBe(302);
    const settings = await run(() =>
      clubSettings.loader(
        args(getRequest(`/clubs/${club.id}/settings`, director.cookie), { clubId: club.id }),
      ),
    );
    expect((settings.data as { carClasses: string[] }).carClasses).toEqual([
      "buggy-2wd-10",
      "buggy-4wd-10",
      "buggy-8",
    ]);
    const page = await newLayoutPage(club.id, director.cookie);
    expect((page.data as { carClasses: string[] }).carClasses).toEqual([
      "buggy-2wd-10",
      "buggy-4wd-10",
      "buggy-8",
    ]);
  });

  it("refuses a bad choice with 400 naming the field, and other roles with 403", async () => {
    const { club, director, marshal, driver } = await makeClubWithRoles();
    const bad = await saveDefaults(club.id, [], director.cookie);
    expect(bad.status).toBe(400);
    expect(errorsOf(bad).carClasses).toEqual(["Choose at least one car class."]);
    for (const who of [marshal, driver])
      expect((await saveDefaults(club.id, ["sct-10"], who.cookie)).status).toBe(403);
    const page = await newLayoutPage(club.id, director.cookie);
    expect((page.data as { carClasses: string[] }).carClasses).toEqual(["buggy-2wd-10"]);
  });
});
