import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { getDb } from "~/db/client.server";
import { layouts, layoutVersions } from "~/db/schema";
import { publishDraft } from "~/layouts/publishing.server";
import { createLayoutFromDocument, loadLayoutDocument } from "~/layouts/documents.server";
import { parseLayoutDocument } from "~/analysis";
import { action as importAction } from "~/routes/layout-import";
import { loader as exportLoader } from "~/routes/layout-export";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, formRequest, getRequest, run } from "./helpers/requests";

useTestDatabase();

function uploadRequest(clubId: string, text: string, cookie: string, name = "layout.json") {
  const body = new FormData();
  body.set("file", new File([text], name, { type: "application/json" }));
  return new Request(`http://localhost/clubs/${clubId}/layouts/import`, {
    method: "POST",
    headers: { Cookie: cookie },
    body,
  });
}

async function layoutCount(clubId: string) {
  const db = await getDb();
  return (await db.select({ id: layouts.id }).from(layouts).where(eq(layouts.clubId, clubId))).length;
}

async function versionCount() {
  const db = await getDb();
  return (await db.select({ id: layoutVersions.id }).from(layoutVersions)).length;
}

describe("layout export and import", () => {
  it("exports the document as a .json download that imports back as an identical new draft", async () => {
    const { club, director } = await makeClubWithRoles();
    const original = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const exported = await exportLoader(
      args(getRequest(`/layouts/${original.id}/export`, director.cookie), { layoutId: original.id }),
    );
    expect(exported.status).toBe(200);
    expect(exported.headers.get("Content-Type")).toMatch(/^application\/json/);
    expect(exported.headers.get("Content-Disposition")).toMatch(
      /^attachment; filename="summer-layout-v1\.loftline\.json"/,
    );
    const text = await exported.text();
    const parsed = parseLayoutDocument(text);
    expect(parsed.ok).toBe(true);
    expect(JSON.parse(text)).toEqual(SUMMER_LAYOUT);

    const before = await layoutCount(club.id);
    const imported = await run(() =>
      importAction(args(uploadRequest(club.id, text, director.cookie), { clubId: club.id })),
    );
    expect(imported.status).toBe(302);
    const newId = imported.location!.replace("/layouts/", "");
    expect(newId).not.toBe(original.id);
    expect(await layoutCount(club.id)).toBe(before + 1);
    const db = await getDb();
    const [row] = await db.select().from(layouts).where(eq(layouts.id, newId));
    expect(row.status).toBe("draft");
    expect(row.name).toBe("Summer layout");
    expect((await loadLayoutDocument(row)).document).toEqual(SUMMER_LAYOUT);
  });

  it("lets a marshal export a published layout but not a draft (404)", async () => {
    const { club, director, marshal } = await makeClubWithRoles();
    const draft = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const asMarshal = await run(() =>
      exportLoader(args(getRequest(`/layouts/${draft.id}/export`, marshal.cookie), { layoutId: draft.id })),
    );
    expect(asMarshal.status).toBe(404);
    await publishDraft(draft.id, draft.version, { raceDate: "2030-06-01", note: "" }, director.id);
    const published = await run(() =>
      exportLoader(args(getRequest(`/layouts/${draft.id}/export`, marshal.cookie), { layoutId: draft.id })),
    );
    expect(published.status).toBe(200);
    expect((published.data as { name: string }).name).toBe("Summer layout");
  });

  it("refuses an invalid file with every problem named by its field, and creates nothing", async () => {
    const { club, director } = await makeClubWithRoles();
    const bad = structuredClone(SUMMER_LAYOUT) as unknown as Record<string, unknown>;
    delete bad.name;
    (bad.sections as Record<string, unknown>[])[4].radius = -2;
    (bad.sections as Record<string, unknown>[])[0].kind = "ramp";
    const [layoutsBefore, versionsBefore] = [await layoutCount(club.id), await versionCount()];
    const r = await run(() =>
      importAction(args(uploadRequest(club.id, JSON.stringify(bad), director.cookie), { clubId: club.id })),
    );
    expect(r.status).toBe(400);
    const body = r.data as { field: string; message: string; issues: { path: string; message: string }[] };
    expect(body.field).toBe("file");
    expect(body.message).toMatch(/Nothing was imported/);
    const paths = body.issues.map((i) => i.path);
    expect(paths).toContain("name");
    expect(paths).toContain("sections[4].radius");
    expect(paths).toContain("sections[0].kind");
    expect(body.issues.find((i) => i.path === "sections[4].radius")!.message).toMatch(/at least 1 m/);
    expect(await layoutCount(club.id)).toBe(layoutsBefore);
    expect(await versionCount()).toBe(versionsBefore);
  });

  it("refuses text that is not JSON, and an empty form, naming the field", async () => {
    const { club, director } = await makeClubWithRoles();
    const notJson = await run(() =>
      importAction(args(uploadRequest(club.id, "{ nope", director.cookie), { clubId: club.id })),
    );
    expect(notJson.status).toBe(400);
    expect((notJson.data as { issues: { path: string; message: string }[] }).issues[0]).toMatchObject({
      path: "(document)",
      message: expect.stringMatching(/not valid JSON/),
    });
    const empty = await run(() =>
      importAction(
        args(formRequest(`/clubs/${club.id}/layouts/import`, { json: "  " }, director.cookie), {
          clubId: club.id,
        }),
      ),
    );
    expect(empty.status).toBe(400);
    expect(empty.data).toMatchObject({ field: "json" });
    // Pasted text that is refused comes back, so the director corrects it rather than pastes again.
    const pasted = '{"format":"loftline-layout","formatVersion":1}';
    const refused = await run(() =>
      importAction(
        args(formRequest(`/clubs/${club.id}/layouts/import`, { json: pasted }, director.cookie), {
          clubId: club.id,
        }),
      ),
    );
    expect(refused.status).toBe(400);
    expect(refused.data).toMatchObject({ field: "json", pasted });
    expect(await layoutCount(club.id)).toBe(0);
  });

  it("imports pasted JSON from the form too", async () => {
    const { club, director } = await makeClubWithRoles();
    const r = await run(() =>
      importAction(
        args(
          formRequest(
            `/clubs/${club.id}/layouts/import`,
            { json: JSON.stringify(SUMMER_LAYOUT) },
            director.cookie,
          ),
          {
            clubId: club.id,
          },
        ),
      ),
    );
    expect(r.status).toBe(302);
    expect(await layoutCount(club.id)).toBe(1);
  });

  it("answers 413 for a file over 1 MB and creates nothing", async () => {
    const { club, director } = await makeClubWithRoles();
    const padded = JSON.stringify({ ...SUMMER_LAYOUT, description: "x".repeat(1024 * 1024) });
    const r = await run(() =>
      importAction(args(uploadRequest(club.id, padded, director.cookie), { clubId: club.id })),
    );
    expect(r.status).toBe(413);
    expect(r.data).toMatchObject({ field: "file", message: expect.stringMatching(/at most 1 MB/) });
    expect(await layoutCount(club.id)).toBe(0);
  });

  it("lets only directors import (403 for a marshal and a driver, 403 for an outsider)", async () => {
    const { club, marshal, driver, outsider } = await makeClubWithRoles();
    for (const person of [marshal, driver, outsider]) {
      const r = await run(() =>
        importAction(
          args(uploadRequest(club.id, JSON.stringify(SUMMER_LAYOUT), person.cookie), { clubId: club.id }),
        ),
      );
      expect(r.status).toBe(403);
    }
    expect(await layoutCount(club.id)).toBe(0);
  });

  it("leaves out a background photo that is not one of the club's files", async () => {
    const { club, director } = await makeClubWithRoles();
    const withPhoto = {
      ...SUMMER_LAYOUT,
      background: {
        fileId: "someone-elses-photo",
        x: 0,
        y: 30,
        metresPerPixel: 0.05,
        rotationDeg: 0,
        opacity: 0.6,
        hidden: false,
      },
    };
    const r = await run(() =>
      importAction(
        args(uploadRequest(club.id, JSON.stringify(withPhoto), director.cookie), { clubId: club.id }),
      ),
    );
    expect(r.status).toBe(302);
    const db = await getDb();
    const [row] = await db.select().from(layouts).where(eq(layouts.clubId, club.id));
    expect((await loadLayoutDocument(row)).document.background).toBeUndefined();
  });
});
