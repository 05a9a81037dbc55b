import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "~/db/client.server";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { layouts } from "~/db/schema";
import { createLayoutFromDocument, saveLayoutDocument } from "~/layouts/documents.server";
import { loader as pageLoader } from "~/routes/build-pack";
import { loader as csvLoader } from "~/routes/build-pack-marking-csv";
import { loader as earthLoader } from "~/routes/build-pack-earthworks-pdf";
import { loader as pdfLoader } from "~/routes/build-pack-marking-pdf";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, getRequest, run } from "./helpers/requests";

useTestDatabase();

const ROUTES = [
  ["page", "", pageLoader],
  ["marking PDF", "/marking.pdf", pdfLoader],
  ["marking CSV", "/marking.csv", csvLoader],
  ["earthworks PDF", "/earthworks.pdf", earthLoader],
] as const;

type Setup = Awaited<ReturnType<typeof makeClubWithRoles>> & {
  layout: Awaited<ReturnType<typeof createLayoutFromDocument>>;
};
let setup: Setup;

/** One club and one published summer layout for the file (making users costs a bcrypt hash each). */
beforeAll(async () => {
  const people = await makeClubWithRoles();
  const layout = await createLayoutFromDocument(people.club.id, SUMMER_LAYOUT, people.director.id);
  const db = await getDb();
  await db.update(layouts).set({ status: "published" }).where(eq(layouts.id, layout.id));
  setup = { ...people, layout };
});

describe("build pack: who may see it", () => {
  it("answers directors only: 403 for a marshal, a driver and an outsider, sign-in for a visitor, 404 for no layout", async () => {
    const { director, marshal, driver, outsider, layout } = setup;
    for (const [name, suffix, loader] of ROUTES) {
      const path = `/layouts/${layout.id}/build${suffix}`;
      const call = (cookie?: string, id = layout.id) =>
        run(() => loader(args(getRequest(path, cookie), { layoutId: id })));
      expect((await call(director.cookie)).status, name).toBe(200);
      for (const who of [marshal, driver, outsider]) expect((await call(who.cookie)).status, name).toBe(403);
      const visitor = await call();
      expect(visitor.status, name).toBe(302);
      expect(visitor.location, name).toMatch(/^\/sign-in\?redirectTo=/);
      expect((await call(director.cookie, "no-such-layout")).status, name).toBe(404);
    }
  });
});

describe("build pack: settings from the address", () => {
  const cases: [string, string, number][] = [
    ["spacing=0.1", "spacing", 400],
    ["spacing=lots", "spacing", 400],
    ["a=marshal-99", "a", 400],
    ["a=somewhere", "a", 400],
    ["a=xy&ax=3", "ay", 400],
    ["a=stand&b=stand", "b", 400],
    ["lat=52.1", "lon", 400],
    ["lat=52.1&lon=-1.2&trueBearing=400", "trueBearing", 400],
    ["truck=0", "truck", 400],
    ["orient=sideways", "orient", 400],
    ["colour=red", "colour", 400],
    ["version=abc", "version", 400],
    ["version=99", "version", 404],
  ];
  it("names the field that is wrong, in the PDF and CSV answers and beside the page's form", async () => {
    const { director, layout } = setup;
    for (const [query, field, status] of cases) {
      const csv = await run(() =>
        csvLoader(
          args(getRequest(`/layouts/${layout.id}/build/marking.csv?${query}`, director.cookie), {
            layoutId: layout.id,
          }),
        ),
      );
      expect(csv.status, query).toBe(status);
      expect(String(csv.data), query).toMatch(new RegExp(`^${field}: `, "m"));
      const page = await run(() =>
        pageLoader(
          args(getRequest(`/layouts/${layout.id}/build?${query}`, director.cookie), { layoutId: layout.id }),
        ),
      );
      expect(page.status, query).toBe(status);
      const data = page.data as { errors: Record<string, string[]>; sheet: unknown };
      expect(Object.keys(data.errors), query).toContain(field);
      expect(data.sheet, query).toBeNull();
    }
  });

  it("fills in the defaults (A at the driver stand, B the farthest site point) and accepts typed coordinates", async () => {
    const { director, layout } = setup;
    const page = await run(() =>
      pageLoader(args(getRequest(`/layouts/${layout.id}/build`, director.cookie), { layoutId: layout.id })),
    );
    expect(page.status).toBe(200);
    const data = page.data as { query: string; sheet: { datums: { what: string; x: number; y: number }[] } };
    // The stand is at (30, -3); the farthest corner of the 60 x 44 m site from it is (0, 38) or (60, 38).
    expect(data.sheet.datums[0]).toMatchObject({ what: "Datum A: Driver stand", x: 30, y: -3 });
    expect(data.sheet.datums[1].what).toMatch(/^Datum B: Site boundary corner/);
    expect(data.sheet.datums[1].y).toBe(38);
    expect(data.query).toContain("spacing=5");
    expect(data.query).toContain("truck=6");
    const typed = await run(() =>
      pageLoader(
        args(getRequest(`/layouts/${layout.id}/build?a=xy&ax=1,5&ay=2&b=start`, director.cookie), {
          layoutId: layout.id,
        }),
      ),
    );
    const t = typed.data as typeof data;
    expect(t.sheet.datums[0]).toMatchObject({ x: 1.5, y: 2 });
    expect(t.sheet.datums[1]).toMatchObject({ x: SUMMER_LAYOUT.start.x, y: SUMMER_LAYOUT.start.y });
  });

  it("makes the sheets for a saved version named in the address", async () => {
    const { director, club } = setup;
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const wider = { ...SUMMER_LAYOUT, trackWidth: 5 };
    await saveLayoutDocument(layout.id, layout.version, wider, director.id);
    const sheetOf = async (query: string) => {
      const r = await run(() =>
        pageLoader(
          args(getRequest(`/layouts/${layout.id}/build?${query}`, director.cookie), { layoutId: layout.id }),
        ),
      );
      return r.data as { versionLabel: string; sheet: { earth: { width: number } } };
    };
    expect((await sheetOf("version=1")).sheet.earth.width).toBe(3.5);
    expect((await sheetOf("version=1")).versionLabel).toBe("version 1");
    expect((await sheetOf("")).versionLabel).toBe("version 2");
  });
});

describe("build pack: a lap too long for the spacing", () => {
  it("names the spacing and the least that fits instead of listing thousands of stations", async () => {
    const { director, club } = setup;
    const sections = Array.from({ length: 10 }, (_, k) =>
      SUMMER_LAYOUT.sections.map((section) => ({ ...section, id: `${section.id}-${k}` })),
    ).flat();
    const long = await createLayoutFromDocument(
      club.id,
      { ...SUMMER_LAYOUT, name: "Long", sections },
      director.id,
    );
    const res = await run(() =>
      csvLoader(
        args(getRequest(`/layouts/${long.id}/build/marking.csv?spacing=0.5`, director.cookie), {
          layoutId: long.id,
        }),
      ),
    );
    expect(res.status).toBe(400);
    expect(String(res.data)).toMatch(
      /^spacing: At 0\.5 m this lap needs more than 3000 stations; use a spacing of at least \d/m,
    );
    const ok = await run(() =>
      csvLoader(
        args(getRequest(`/layouts/${long.id}/build/marking.csv?spacing=5`, director.cookie), {
          layoutId: long.id,
        }),
      ),
    );
    expect(ok.status).toBe(200);
  });
});
