import { desc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { layouts, layoutVersions, memberships } from "~/db/schema";
import { starterDocument } from "~/analysis";
import { action as editorAction, loader as editorLoader } from "~/routes/layout-editor";
import { loader as viewLoader } from "~/routes/layout-drawing";
import { action as photoAction } from "~/routes/layout-photo";
import { loader as fileLoader } from "~/routes/file";
import { publishDraft } from "~/layouts/publishing.server";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles, makeLayout } from "./helpers/factories";
import { args, getRequest, jsonRequest, run } from "./helpers/requests";

const { db } = useTestDatabase();

const PNG_HEADER = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

async function setUp() {
  const roles = await makeClubWithRoles();
  const layout = await makeLayout(roles.club.id, { name: "Spring layout" });
  return { ...roles, layout };
}

const save = (layoutId: string, body: unknown, cookie?: string) =>
  run(() => editorAction(args(jsonRequest(`/layouts/${layoutId}/edit`, body, cookie), { layoutId })));

async function latestVersion(layoutId: string) {
  const d = await db();
  const [row] = await d
    .select()
    .from(layoutVersions)
    .where(eq(layoutVersions.layoutId, layoutId))
    .orderBy(desc(layoutVersions.number))
    .limit(1);
  return row;
}

async function layoutRow(layoutId: string) {
  const d = await db();
  const [row] = await d.select().from(layouts).where(eq(layouts.id, layoutId));
  return row;
}

describe("editor loader", () => {
  it("gives a director the document and the version to save from; other roles get 403, visitors go to sign-in", async () => {
    const { layout, director, marshal, driver, outsider } = await setUp();
    const ok = await run(() =>
      editorLoader(args(getRequest(`/layouts/${layout.id}/edit`, director.cookie), { layoutId: layout.id })),
    );
    expect(ok.status).toBe(200);
    expect(ok.data).toMatchObject({
      version: 1,
      document: { name: "Spring layout", sections: [{ id: "s1" }, { id: "t1" }, { id: "s2" }, { id: "t2" }] },
    });
    for (const who of [marshal, driver, outsider]) {
      const r = await run(() =>
        editorLoader(args(getRequest(`/layouts/${layout.id}/edit`, who.cookie), { layoutId: layout.id })),
      );
      expect(r.status, who.name).toBe(403);
    }
    const visitor = await run(() =>
      editorLoader(args(getRequest(`/layouts/${layout.id}/edit`), { layoutId: layout.id })),
    );
    expect(visitor.status).toBe(302);
    expect(visitor.location).toMatch(/^\/sign-in\?redirectTo=/);
  });

  it("says which race-day version readers keep while the director's saves go to the draft", async () => {
    const { layout, director } = await setUp();
    const open = () =>
      run(() =>
        editorLoader(
          args(getRequest(`/layouts/${layout.id}/edit`, director.cookie), { layoutId: layout.id }),
        ),
      );
    expect((await open()).data).toMatchObject({ raceDay: null });
    const published = await publishDraft(layout.id, 1, { raceDate: "2030-06-01", note: "" }, director.id);
    expect((await open()).data).toMatchObject({
      raceDay: { number: published.versionNumber, raceDate: "2030-06-01" },
    });
  });
});

describe("saving a drawing", () => {
  it("stores a valid document as the next version", async () => {
    const { layout, director } = await setUp();
    const doc = { ...starterDocument("Spring layout", 3.5), marshalPoints: [{ x: 12, y: -4 }] };
    const r = await save(layout.id, { intent: "save", document: doc, baseVersion: 1 }, director.cookie);
    expect(r.status).toBe(200);
    expect(r.data).toEqual({ ok: true, intent: "save", version: 2 });
    const stored = await latestVersion(layout.id);
    expect(stored.number).toBe(2);
    expect(JSON.parse(stored.document)).toMatchObject({ trackWidth: 3.5, marshalPoints: [{ x: 12, y: -4 }] });
    expect((await layoutRow(layout.id)).trackWidth).toBe(3.5);
  });

  it("answers 400 naming the field of a bad value, and stores nothing", async () => {
    const { layout, director } = await setUp();
    const doc = starterDocument("Spring layout", 3);
    (doc.sections[1] as { radius: number }).radius = 0.2;
    const r = await save(layout.id, { intent: "save", document: doc, baseVersion: 1 }, director.cookie);
    expect(r.status).toBe(400);
    expect(r.data).toMatchObject({ ok: false, field: "document.sections[1].radius" });
    expect((r.data as { issues: unknown[] }).issues).toContainEqual({
      path: "document.sections[1].radius",
      message: "must be at least 1 m",
    });
    expect((r.data as { error: string }).error).toMatch(/sections\[1\]\.radius must be at least 1 m/);
    const missing = await save(
      layout.id,
      { intent: "save", document: starterDocument("x", 3) },
      director.cookie,
    );
    expect(missing.status).toBe(400);
    expect(missing.data).toMatchObject({ field: "baseVersion" });
    expect(await latestVersion(layout.id)).toBeUndefined();
    expect((await layoutRow(layout.id)).version).toBe(1);
  });

  it("answers 409 to the second of two directors saving from the same version; both drawings survive", async () => {
    const { layout, director, club } = await setUp();
    const second = await makeClubWithRoles();
    const d = await db();
    await d.insert(memberships).values({ clubId: club.id, userId: second.director.id, role: "director" });
    const mine = { ...starterDocument("Spring layout", 3), marshalPoints: [{ x: 1, y: 1 }] };
    const theirs = {
      ...starterDocument("Spring layout", 3),
      marshalPoints: [
        { x: 2, y: 2 },
        { x: 3, y: 3 },
      ],
    };
    expect(
      (await save(layout.id, { intent: "save", document: mine, baseVersion: 1 }, director.cookie)).status,
    ).toBe(200);
    const stale = await save(
      layout.id,
      { intent: "save", document: theirs, baseVersion: 1 },
      second.director.cookie,
    );
    expect(stale.status).toBe(409);
    expect(stale.data).toMatchObject({ ok: false, field: "baseVersion", conflict: { yours: 1, current: 2 } });
    expect((stale.data as { error: string }).error).toMatch(/someone else saved this layout/i);
    // the first save is intact
    expect(JSON.parse((await latestVersion(layout.id)).document).marshalPoints).toEqual([{ x: 1, y: 1 }]);
    // the second director keeps theirs as a copy
    const copy = await save(layout.id, { intent: "save-copy", document: theirs }, second.director.cookie);
    expect(copy.status).toBe(201);
    const { layoutId, url } = copy.data as { layoutId: string; url: string };
    expect(url).toBe(`/layouts/${layoutId}/edit`);
    const copied = await latestVersion(layoutId);
    expect(JSON.parse(copied.document)).toMatchObject({
      name: "Spring layout (copy)",
      marshalPoints: [
        { x: 2, y: 2 },
        { x: 3, y: 3 },
      ],
    });
    expect((await layoutRow(layoutId)).clubId).toBe(club.id);
  });

  it("refuses marshals, drivers and outsiders with 403 and signed-out callers with 401, writing nothing", async () => {
    const { layout, marshal, driver, outsider } = await setUp();
    const body = { intent: "save", document: starterDocument("Spring layout", 3), baseVersion: 1 };
    for (const who of [marshal, driver, outsider]) {
      const r = await save(layout.id, body, who.cookie);
      expect(r.status, who.name).toBe(403);
      expect((r.data as { error: string }).error.length).toBeGreaterThan(0);
    }
    expect((await save(layout.id, body)).status).toBe(401);
    expect((await save(layout.id, { ...body, intent: "save-copy" }, marshal.cookie)).status).toBe(403);
    expect((await layoutRow(layout.id)).version).toBe(1);
    expect(await latestVersion(layout.id)).toBeUndefined();
  });

  it("answers 415 to a body that is neither JSON nor a form, and 413 to an oversized one", async () => {
    const { layout, director } = await setUp();
    const text = new Request(`http://localhost/layouts/${layout.id}/edit`, {
      method: "POST",
      headers: { "Content-Type": "text/plain", Cookie: director.cookie },
      body: "hello",
    });
    const r = await run(() => editorAction(args(text, { layoutId: layout.id })));
    expect(r.status).toBe(415);
    expect(r.data).toMatchObject({ field: "(body)" });
    const huge = JSON.stringify({
      intent: "save",
      baseVersion: 1,
      document: { padding: "x".repeat(5 * 1024 * 1024 + 10) },
    });
    const big = await run(() =>
      editorAction(
        args(jsonRequest(`/layouts/${layout.id}/edit`, huge, director.cookie), { layoutId: layout.id }),
      ),
    );
    expect(big.status).toBe(413);
    expect(big.data).toMatchObject({ field: "document" });
  });

  it("accepts the same save as form fields (the document as JSON text)", async () => {
    const { layout, director } = await setUp();
    const body = new URLSearchParams({
      intent: "save",
      baseVersion: "1",
      document: JSON.stringify(starterDocument("Spring layout", 4)),
    });
    const request = new Request(`http://localhost/layouts/${layout.id}/edit`, {
      method: "POST",
      headers: { "Content-Type": "application/x-www-form-urlencoded", Cookie: director.cookie },
      body,
    });
    const r = await run(() => editorAction(args(request, { layoutId: layout.id })));
    expect(r.status).toBe(200);
    expect((await layoutRow(layout.id)).trackWidth).toBe(4);
  });
});

function photoRequest(layoutId: string, bytes: Uint8Array, type: string, cookie?: string, name = "site.png") {
  const body = new FormData();
  body.set("photo", new File([bytes as BlobPart], name, { type }));
  return new Request(`http://localhost/layouts/${layoutId}/photo`, {
    method: "POST",
    body,
    headers: cookie ? { Cookie: cookie } : {},
  });
}

describe("site photo upload and serving", () => {
  it("stores a director's PNG and serves it to club members only, privately cached", async () => {
    const { layout, director, driver, outsider } = await setUp();
    const bytes = new Uint8Array([...PNG_HEADER, 9, 8, 7]);
    const up = await run(() =>
      photoAction(
        args(photoRequest(layout.id, bytes, "image/png", director.cookie), { layoutId: layout.id }),
      ),
    );
    expect(up.status).toBe(201);
    const { fileId, url } = up.data as { fileId: string; url: string };
    expect(url).toBe(`/files/${fileId}`);
    const get = (cookie?: string) => fileLoader(args(getRequest(url, cookie), { fileId }));
    const served = (await get(driver.cookie)) as Response;
    expect(served.status).toBe(200);
    expect(served.headers.get("Content-Type")).toBe("image/png");
    expect(served.headers.get("Cache-Control")).toMatch(/^private/);
    expect(Array.from(new Uint8Array(await served.arrayBuffer()))).toEqual(Array.from(bytes));
    expect((await run(() => get(outsider.cookie))).status).toBe(404);
    expect((await run(() => get())).status).toBe(401);
    expect(
      (await run(() => fileLoader(args(getRequest("/files/nope", director.cookie), { fileId: "nope" }))))
        .status,
    ).toBe(404);
  });

  it("refuses files over 10 MB (413), other types (415), and anyone but a director (403)", async () => {
    const { layout, director, marshal } = await setUp();
    const big = new Uint8Array(10 * 1024 * 1024 + 10);
    big.set(PNG_HEADER);
    const tooBig = await run(() =>
      photoAction(args(photoRequest(layout.id, big, "image/png", director.cookie), { layoutId: layout.id })),
    );
    expect(tooBig.status).toBe(413);
    expect(tooBig.data).toMatchObject({ field: "photo", error: "The file is too large: at most 10 MB." });
    const text = await run(() =>
      photoAction(
        args(
          photoRequest(
            layout.id,
            new TextEncoder().encode("plain text"),
            "text/plain",
            director.cookie,
            "notes.txt",
          ),
          { layoutId: layout.id },
        ),
      ),
    );
    expect(text.status).toBe(415);
    expect(text.data).toMatchObject({ field: "photo", error: "Only PNG or JPEG files are accepted." });
    const asMarshal = await run(() =>
      photoAction(
        args(photoRequest(layout.id, new Uint8Array(PNG_HEADER), "image/png", marshal.cookie), {
          layoutId: layout.id,
        }),
      ),
    );
    expect(asMarshal.status).toBe(403);
  });
});

describe("read-only plan", () => {
  it("shows published layouts to marshals and drivers, hides drafts (404), and offers editing to directors only", async () => {
    const { club, layout, director, marshal } = await setUp();
    const published = await makeLayout(club.id, { name: "Race day", status: "published" });
    const view = (id: string, cookie: string) =>
      run(() => viewLoader(args(getRequest(`/layouts/${id}/plan`, cookie), { layoutId: id })));
    expect((await view(published.id, marshal.cookie)).data).toMatchObject({
      isDirector: false,
      layout: { name: "Race day" },
      analysis: { result: { ok: true } },
    });
    expect((await view(layout.id, marshal.cookie)).status).toBe(404);
    expect((await view(layout.id, director.cookie)).data).toMatchObject({ isDirector: true });
  });
});
