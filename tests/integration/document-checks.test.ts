/**
 * The editor's save, the import and the analysis API run the same checks on a document beyond its
 * schema: car classes the engine knows, custom jumps it can fly, a photo of the club's own files,
 * and an analysis within the work budget. Every refusal names its field and keeps what was saved.
 */
import { desc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { layouts, layoutVersions } from "~/db/schema";
import { type LayoutDocumentInput } from "~/analysis";
import { action as analysisAction } from "~/routes/api-analysis";
import { action as editorAction } from "~/routes/layout-editor";
import { action as importAction } from "~/routes/layout-import";
import { receiveUpload, SITE_PHOTO } from "~/storage/uploads.server";
import { heaviestAccepted, overBudget } from "../../scripts/lib/worst-case-layout";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles, makeLayout } from "./helpers/factories";
import { args, jsonRequest, run } from "./helpers/requests";

const { db } = useTestDatabase();

type Refusal = {
  ok?: false;
  error: string;
  field?: string | null;
  issues: { path: string; message: string }[];
};

/** A custom jump whose ground after the lip climbs more steeply than its face: no takeoff. */
const NO_TAKEOFF = {
  id: "bad-kicker",
  kind: "jump",
  preset: "custom",
  profile: [
    [0, 0],
    [2, 0.5],
    [3, 1.5],
    [6, 0],
  ],
  lipIndex: 1,
  landingStartIndex: 2,
  landingEndIndex: 3,
} as const;

function withSection(doc: LayoutDocumentInput, section: unknown, at = 2): LayoutDocumentInput {
  const sections = [...doc.sections];
  sections.splice(at, 0, section as LayoutDocumentInput["sections"][number]);
  return { ...doc, sections };
}

async function photoOf(clubId: string, userId: string): Promise<string> {
  const body = new FormData();
  const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 1, 2, 3]);
  body.set("photo", new File([png], "site.png", { type: "image/png" }));
  const request = new Request("http://localhost/upload", { method: "POST", body });
  return (await receiveUpload(request, SITE_PHOTO, { clubId, userId })).fileId;
}

const background = (fileId: string) => ({
  fileId,
  x: 0,
  y: 30,
  metresPerPixel: 0.05,
  rotationDeg: 0,
  opacity: 0.6,
  hidden: false,
});

async function versionOf(layoutId: string) {
  const d = await db();
  const [row] = await d.select({ version: layouts.version }).from(layouts).where(eq(layouts.id, layoutId));
  const [latest] = await d
    .select({ number: layoutVersions.number })
    .from(layoutVersions)
    .where(eq(layoutVersions.layoutId, layoutId))
    .orderBy(desc(layoutVersions.number))
    .limit(1);
  return { version: row.version, latest: latest?.number ?? null };
}

describe("the editor's save runs the analysis's checks", () => {
  it("refuses an unknown class, a jump that cannot be flown and another club's photo, each by its field", async () => {
    const { club, director } = await makeClubWithRoles();
    const other = await makeClubWithRoles();
    const layout = await makeLayout(club.id, { name: "Spring layout" });
    const foreignPhoto = await photoOf(other.club.id, other.director.id);
    const before = await versionOf(layout.id);
    const save = (document: unknown, intent = "save") =>
      run(() =>
        editorAction(
          args(
            jsonRequest(`/layouts/${layout.id}/edit`, { intent, baseVersion: 1, document }, director.cookie),
            { layoutId: layout.id },
          ),
        ),
      );

    const cases: [unknown, string, RegExp][] = [
      [
        { ...SUMMER_LAYOUT, carClasses: ["buggy-2wd-10", "monster-truck"] },
        "document.carClasses[1]",
        /not a known car class/,
      ],
      [withSection(SUMMER_LAYOUT, NO_TAKEOFF), "document.sections[2].lipIndex", /is not a takeoff/],
      [
        { ...SUMMER_LAYOUT, background: background(foreignPhoto) },
        "document.background.fileId",
        /not one of this club's files/,
      ],
    ];
    for (const [document, field, message] of cases) {
      for (const intent of ["save", "save-copy"]) {
        const r = await save(document, intent);
        expect(r.status, `${field} ${intent}`).toBe(400);
        const body = r.data as Refusal;
        expect(body.field).toBe(field);
        expect(body.issues[0]).toMatchObject({ path: field, message: expect.stringMatching(message) });
        expect(body.error).toMatch(new RegExp(`^Not saved: ${field.replace(/[[\].]/g, "\\$&")} `));
      }
    }
    const over = await save(overBudget(1));
    expect(over.status).toBe(422);
    expect((over.data as Refusal).issues[0]).toMatchObject({
      path: "document.sections",
      message: expect.stringMatching(/500 jumps.*2000 jump analyses, over the limit of 160/),
    });
    expect(await versionOf(layout.id)).toEqual(before);
    const d = await db();
    expect((await d.select().from(layouts).where(eq(layouts.clubId, club.id))).length).toBe(1);

    // The club's own photo and a flyable custom jump are saved.
    const own = await photoOf(club.id, director.id);
    const flyable = {
      ...NO_TAKEOFF,
      id: "good-kicker",
      profile: [
        [0, 0],
        [2, 0.5],
        [3, 1.2],
        [4, 0.8],
        [7, 0],
      ],
      lipIndex: 2,
      landingStartIndex: 3,
      landingEndIndex: 4,
    };
    const ok = await save({ ...withSection(SUMMER_LAYOUT, flyable), background: background(own) });
    expect(ok.status).toBe(200);
    expect(await versionOf(layout.id)).toEqual({ version: 2, latest: 2 });
  });
});

describe("the import and the analysis API refuse the same, by field", () => {
  it("refuses an unknown class and a jump that cannot be flown on import, and creates nothing", async () => {
    const { club, director } = await makeClubWithRoles();
    const upload = (doc: unknown) => {
      const body = new FormData();
      body.set("file", new File([JSON.stringify(doc)], "layout.json", { type: "application/json" }));
      const request = new Request(`http://localhost/clubs/${club.id}/layouts/import`, {
        method: "POST",
        headers: { Cookie: director.cookie },
        body,
      });
      return run(() => importAction(args(request, { clubId: club.id })));
    };
    const unknown = await upload({ ...SUMMER_LAYOUT, carClasses: ["hovercraft"] });
    expect(unknown.status).toBe(400);
    expect((unknown.data as Refusal).issues[0].path).toBe("carClasses[0]");
    const kicker = await upload(withSection(SUMMER_LAYOUT, NO_TAKEOFF, 5));
    expect(kicker.status).toBe(400);
    expect((kicker.data as Refusal).issues[0].path).toBe("sections[5].lipIndex");
    const big = await upload(overBudget(2));
    expect(big.status).toBe(422);
    expect((big.data as Refusal).issues[0].path).toBe("sections");
    const d = await db();
    expect(await d.select().from(layouts).where(eq(layouts.clubId, club.id))).toHaveLength(0);
  });

  it("answers 400 naming the custom jump's lipIndex, and 422 naming the budget, from the analysis API", async () => {
    const { director } = await makeClubWithRoles();
    const ask = (document: unknown) =>
      run(() => analysisAction(args(jsonRequest("/api/analysis", { document }, director.cookie))));
    const kicker = await ask(withSection(SUMMER_LAYOUT, NO_TAKEOFF, 3));
    expect(kicker.status).toBe(400);
    expect((kicker.data as Refusal).issues).toEqual([
      { path: "document.sections[3].lipIndex", message: expect.stringMatching(/is not a takeoff/) },
    ]);
    const long = await ask({
      ...heaviestAccepted(3),
      sections: [...heaviestAccepted(3).sections, { id: "long", kind: "straight", length: 300 }],
    });
    expect(long.status).toBe(422);
    expect((long.data as Refusal).issues[0]).toMatchObject({
      path: "document.sections",
      message: expect.stringMatching(/centre line 2227 m long, over the limit of 2000 m/),
    });
  });
});
