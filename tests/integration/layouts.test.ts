import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles, makeLayout } from "./helpers/factories";
import { args, formRequest, getRequest, run } from "./helpers/requests";
import { layouts, layoutVersions } from "~/db/schema";
import * as clubHome from "~/routes/club-home";
import * as layoutNew from "~/routes/layout-new";
import * as layoutPage from "~/routes/layout-page";
import * as layoutSettings from "~/routes/layout-settings";

const { db } = useTestDatabase();

type Errors = Record<string, string[]>;
const errorsOf = (r: { data: unknown }) => (r.data as { errors: Errors }).errors;

const create = (clubId: string, fields: Record<string, string | string[]>, cookie?: string) =>
  run(() => layoutNew.action(args(formRequest(`/clubs/${clubId}/layouts/new`, fields, cookie), { clubId })));
const change = (layoutId: string, fields: Record<string, string | string[]>, cookie?: string) =>
  run(() => layoutPage.action(args(formRequest(`/layouts/${layoutId}`, fields, cookie), { layoutId })));
const open = (layoutId: string, cookie?: string) =>
  run(() => layoutPage.loader(args(getRequest(`/layouts/${layoutId}`, cookie), { layoutId })));
const row = async (id: string) => (await (await db()).select().from(layouts).where(eq(layouts.id, id)))[0];
const clubLayouts = async (clubId: string) =>
  (await db()).select().from(layouts).where(eq(layouts.clubId, clubId)).orderBy(layouts.id);

describe("creating a layout", () => {
  it("saves a draft with the director's name, surface and width, then opens its page", async () => {
    const { club, director } = await makeClubWithRoles();
    const r = await create(
      club.id,
      { name: " Summer loop ", surface: "clay", trackWidth: "3,5", carClasses: ["buggy-2wd-10", "sct-10"] },
      director.cookie,
    );
    expect(r.status).toBe(302);
    const [saved] = await clubLayouts(club.id);
    expect(r.location).toBe(`/layouts/${saved.id}`);
    expect(saved).toMatchObject({
      name: "Summer loop",
      surface: "clay",
      trackWidth: 3.5,
      carClasses: JSON.stringify(["buggy-2wd-10", "sct-10"]),
      status: "draft",
      version: 1,
      createdBy: director.id,
    });
  });

  it("answers 400 naming each bad field, and writes nothing", async () => {
    const { club, director } = await makeClubWithRoles();
    const r = await create(club.id, { name: "", surface: "ice", trackWidth: "12" }, director.cookie);
    expect(r.status).toBe(400);
    const errors = errorsOf(r);
    expect(errors.name).toEqual(["Enter a name for the layout."]);
    expect(errors.surface).toEqual(["Choose a surface: dirt, clay, turf or carpet."]);
    expect(errors.trackWidth).toEqual(["Track width must be at most 10 m."]);
    expect((r.data as { values: Record<string, string> }).values.name).toBe("");
    expect(errors.carClasses).toEqual(["Choose at least one car class."]);
    // the width limits are the layout file's and the editor's (FIELD_LIMITS): 1 to 10 m
    const narrow = await create(club.id, { name: "A", surface: "dirt", trackWidth: "0.9" }, director.cookie);
    expect(errorsOf(narrow).trackWidth).toEqual(["Track width must be at least 1 m."]);
    expect(await clubLayouts(club.id)).toEqual([]);
  });
});

describe("what each role sees", () => {
  it("lists every layout with its status for directors, only published ones for marshals and drivers", async () => {
    const { club, director, marshal, driver } = await makeClubWithRoles();
    await makeLayout(club.id, { name: "Draft loop", status: "draft" });
    await makeLayout(club.id, { name: "Race day", status: "published" });
    await makeLayout(club.id, { name: "Old winter", status: "archived" });
    const list = async (cookie: string) => {
      const r = await run(() =>
        clubHome.loader(args(getRequest(`/clubs/${club.id}`, cookie), { clubId: club.id })),
      );
      expect(r.status).toBe(200);
      return (r.data as { layouts: { name: string; status: string }[] }).layouts.map(
        (l) => `${l.name}:${l.status}`,
      );
    };
    expect(await list(director.cookie)).toEqual([
      "Race day:published",
      "Draft loop:draft",
      "Old winter:archived",
    ]);
    expect(await list(marshal.cookie)).toEqual(["Race day:published"]);
    expect(await list(driver.cookie)).toEqual(["Race day:published"]);
  });

  it("opens a draft for directors only (404 for marshals and drivers), a published one for every member, nothing for outsiders", async () => {
    const { club, director, marshal, driver, outsider } = await makeClubWithRoles();
    const draft = await makeLayout(club.id, { status: "draft" });
    const archived = await makeLayout(club.id, { status: "archived" });
    const published = await makeLayout(club.id, { status: "published" });
    expect((await open(draft.id, director.cookie)).status).toBe(200);
    for (const reader of [marshal, driver]) {
      expect((await open(draft.id, reader.cookie)).status).toBe(404);
      expect((await open(archived.id, reader.cookie)).status).toBe(404);
      const r = await open(published.id, reader.cookie);
      expect(r.status).toBe(200);
      expect((r.data as { isDirector: boolean }).isDirector).toBe(false);
    }
    expect((await open(published.id, outsider.cookie)).status).toBe(403);
    expect((await open("no-such-layout", director.cookie)).status).toBe(404);
    expect((await open(published.id)).location).toMatch(/^\/sign-in\?redirectTo=/);
  });

  it("sends directors from the settings address to the details form, refuses the others", async () => {
    const { club, director, marshal } = await makeClubWithRoles();
    const published = await makeLayout(club.id, { status: "published" });
    const settings = (cookie: string) =>
      run(() =>
        layoutSettings.loader(
          args(getRequest(`/layouts/${published.id}/settings`, cookie), { layoutId: published.id }),
        ),
      );
    const r = await settings(director.cookie);
    expect(r.status).toBe(302);
    expect(r.location).toBe(`/layouts/${published.id}#details`);
    expect((await settings(marshal.cookie)).status).toBe(403);
  });
});

describe("changing a layout", () => {
  it("renames it and sets surface and width, bumping the version each time", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await makeLayout(club.id, { name: "First" });
    const r = await change(
      layout.id,
      {
        intent: "update",
        version: "1",
        name: "Second",
        surface: "turf",
        trackWidth: "4",
        carClasses: "buggy-2wd-10",
      },
      director.cookie,
    );
    expect(r.status).toBe(302);
    expect(r.location).toBe(`/layouts/${layout.id}`);
    expect(await row(layout.id)).toMatchObject({
      name: "Second",
      surface: "turf",
      trackWidth: 4,
      version: 2,
    });
  });

  it("refuses with 409 a change that started from an older version, and keeps the newer one", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await makeLayout(club.id, { name: "Kept" });
    await change(
      layout.id,
      {
        intent: "update",
        version: "1",
        name: "Newer",
        surface: "dirt",
        trackWidth: "3",
        carClasses: "buggy-2wd-10",
      },
      director.cookie,
    );
    const stale = await change(
      layout.id,
      {
        intent: "update",
        version: "1",
        name: "Older",
        surface: "clay",
        trackWidth: "5",
        carClasses: "buggy-2wd-10",
      },
      director.cookie,
    );
    expect(stale.status).toBe(409);
    expect(errorsOf(stale).version[0]).toMatch(/changed this layout after you opened it/);
    const staleStatus = await change(layout.id, { intent: "archive", version: "1" }, director.cookie);
    expect(staleStatus.status).toBe(409);
    expect(await row(layout.id)).toMatchObject({
      name: "Newer",
      surface: "dirt",
      version: 2,
      status: "draft",
    });
  });

  it("archives and takes out of the archive, refusing changes that do not apply; publishing has its own page", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await makeLayout(club.id);
    const step = async (intent: string, version: number) =>
      (await change(layout.id, { intent, version: String(version) }, director.cookie)).status;
    expect(await step("publish", 1)).toBe(400); // not an intent of this page any more
    expect(await step("unarchive", 1)).toBe(409);
    expect(await step("archive", 1)).toBe(302);
    expect((await row(layout.id)).status).toBe("archived");
    expect(await step("archive", 2)).toBe(409);
    expect(await step("unarchive", 2)).toBe(302);
    expect(await row(layout.id)).toMatchObject({ status: "draft", version: 3 });
  });

  it("takes a layout with a live published version out of the archive as published", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await makeLayout(club.id, { status: "published" });
    const step = async (intent: string, version: number) =>
      (await change(layout.id, { intent, version: String(version) }, director.cookie)).status;
    expect(await step("archive", 1)).toBe(302);
    expect((await row(layout.id)).status).toBe("archived");
    expect(await step("unarchive", 2)).toBe(302);
    expect((await row(layout.id)).status).toBe("published");
  });

  it("deletes only with the confirmation ticked, and its saved versions go with it", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await makeLayout(club.id);
    await (await db()).insert(layoutVersions).values({ layoutId: layout.id, number: 1, document: "{}" });
    const unconfirmed = await change(layout.id, { intent: "delete" }, director.cookie);
    expect(unconfirmed.status).toBe(400);
    expect(errorsOf(unconfirmed).confirm[0]).toMatch(/Tick the box/);
    expect(await row(layout.id)).toBeDefined();
    const r = await change(layout.id, { intent: "delete", confirm: "yes" }, director.cookie);
    expect(r.status).toBe(302);
    expect(r.location).toBe(`/clubs/${club.id}`);
    expect(await row(layout.id)).toBeUndefined();
    expect(
      await (await db()).select().from(layoutVersions).where(eq(layoutVersions.layoutId, layout.id)),
    ).toEqual([]);
  });

  it("answers 400 naming the field for a bad width or a missing version", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await makeLayout(club.id);
    const r = await change(
      layout.id,
      {
        intent: "update",
        version: "1",
        name: "X",
        surface: "dirt",
        trackWidth: "wide",
        carClasses: "buggy-2wd-10",
      },
      director.cookie,
    );
    expect(r.status).toBe(400);
    expect(errorsOf(r).trackWidth).toEqual(["Enter the track width as a number of metres, like 3.5."]);
    const noVersion = await change(layout.id, { intent: "archive" }, director.cookie);
    expect(noVersion.status).toBe(400);
    expect(Object.keys(errorsOf(noVersion))).toEqual(["version"]);
    expect(await row(layout.id)).toMatchObject({ status: "draft", version: 1 });
  });
});

describe("director-only layout actions", () => {
  it("answers 403 to a marshal, a driver and a non-member, sends a signed-out visitor to sign in, and changes nothing", async () => {
    const { club, marshal, driver, outsider } = await makeClubWithRoles();
    const draft = await makeLayout(club.id, { name: "Draft", status: "draft" });
    const published = await makeLayout(club.id, { name: "Published", status: "published" });
    const before = await clubLayouts(club.id);
    const forms: [string, Record<string, string>][] = [];
    for (const target of [draft, published]) {
      forms.push(
        [
          target.id,
          {
            intent: "update",
            version: "1",
            name: "Renamed",
            surface: "clay",
            trackWidth: "4",
            carClasses: "buggy-2wd-10",
          },
        ],
        [target.id, { intent: "archive", version: "1" }],
        [target.id, { intent: "delete", confirm: "yes" }],
      );
    }
    for (const [layoutId, fields] of forms) {
      for (const who of [marshal, driver, outsider]) {
        expect((await change(layoutId, fields, who.cookie)).status, `${fields.intent} by ${who.name}`).toBe(
          403,
        );
      }
      const anonymous = await change(layoutId, fields);
      expect(anonymous.status).toBe(302);
      expect(anonymous.location).toMatch(/^\/sign-in\?redirectTo=/);
    }
    for (const who of [marshal, driver, outsider]) {
      expect(
        (
          await create(
            club.id,
            { name: "Sneaky", surface: "dirt", trackWidth: "3", carClasses: "buggy-2wd-10" },
            who.cookie,
          )
        ).status,
      ).toBe(403);
    }
    expect(
      (
        await create(club.id, {
          name: "Sneaky",
          surface: "dirt",
          trackWidth: "3",
          carClasses: "buggy-2wd-10",
        })
      ).location,
    ).toMatch(/^\/sign-in/);
    expect(await clubLayouts(club.id)).toEqual(before);
  });

  it("answers 404 for a club or a layout that does not exist", async () => {
    const { director } = await makeClubWithRoles();
    expect(
      (
        await create(
          "no-such-club",
          { name: "X", surface: "dirt", trackWidth: "3", carClasses: "buggy-2wd-10" },
          director.cookie,
        )
      ).status,
    ).toBe(404);
    expect(
      (await change("no-such-layout", { intent: "delete", confirm: "yes" }, director.cookie)).status,
    ).toBe(404);
  });
});
