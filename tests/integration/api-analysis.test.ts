import { gunzipSync } from "node:zlib";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT, WET_WEATHER_LAYOUT } from "~/db/demo-layouts";
import type { LayoutAnalysis, AnalysisOverlay } from "~/analysis";
import { analysisMemo } from "~/layouts/analysis-memo.server";
import { getDb } from "~/db/client.server";
import { seedDemoData } from "~/db/demo-data.server";
import { layouts, memberships, users } from "~/db/schema";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { apiLayoutAccess } from "~/layouts/api-access.server";
import { createLayoutFromDocument, saveLayoutDocument } from "~/layouts/documents.server";
import { action as postAnalysis } from "~/routes/api-analysis";
import { loader as getLayout } from "~/routes/api-layout";
import { loader as getAnalysis } from "~/routes/api-layout-analysis";
import { useTestDatabase } from "./helpers/db";
import { addMember, makeClubWithRoles, makeUser } from "./helpers/factories";
import { args, getRequest, jsonRequest, run } from "./helpers/requests";

useTestDatabase();

type Issues = { error: string; issues: { path: string; message: string }[] };
type Answer = { analysis: LayoutAnalysis; overlay: AnalysisOverlay; classId?: string; version?: number };

const post = (body: unknown, cookie?: string) =>
  run(() => postAnalysis(args(jsonRequest("/api/analysis", body, cookie))));
const get = (layoutId: string, query: string, cookie?: string) =>
  run(() => getAnalysis(args(getRequest(`/api/layouts/${layoutId}/analysis${query}`, cookie), { layoutId })));

describe("POST /api/analysis (a draft, nothing saved)", () => {
  it("answers 401 as JSON when signed out", async () => {
    const r = await post({ document: WET_WEATHER_LAYOUT });
    expect(r.status).toBe(401);
    expect(r.data).toMatchObject({ error: expect.any(String) });
  });

  it("answers 400 naming each field of a bad document, and of a bad class or skill", async () => {
    const { director } = await makeClubWithRoles();
    const bad = structuredClone(WET_WEATHER_LAYOUT) as unknown as { sections: Record<string, unknown>[] };
    bad.sections[4].radius = 0.2;
    const r = await post({ document: bad }, director.cookie);
    expect(r.status).toBe(400);
    expect((r.data as Issues).issues).toEqual([
      { path: "document.sections[4].radius", message: "must be at least 1 m" },
    ]);

    const noDoc = await post({ skill: "club" }, director.cookie);
    expect((noDoc.data as Issues).issues[0].path).toBe("document");
    const cls = await post({ document: WET_WEATHER_LAYOUT, classId: "monster-truck" }, director.cookie);
    expect(cls.status).toBe(400);
    expect((cls.data as Issues).issues[0]).toMatchObject({
      path: "classId",
      message: expect.stringMatching(/not a known car class/),
    });
    const skill = await post({ document: WET_WEATHER_LAYOUT, skill: "pro" }, director.cookie);
    expect((skill.data as Issues).issues[0]).toMatchObject({
      path: "skill",
      message: "must be one of novice, club, expert",
    });
    const unknownClassInDoc = await post(
      { document: { ...WET_WEATHER_LAYOUT, carClasses: ["buggy-2wd-10", "hovercraft"] } },
      director.cookie,
    );
    expect((unknownClassInDoc.data as Issues).issues[0].path).toBe("document.carClasses[1]");
    const notJson = await post("{ document: ", director.cookie);
    expect(notJson.status).toBe(400);
    expect((notJson.data as Issues).issues[0].path).toBe("(body)");
  });

  it("answers 413 for a body over 1 MB", async () => {
    const { director } = await makeClubWithRoles();
    const r = await post(
      { document: { ...WET_WEATHER_LAYOUT, description: "x".repeat(1024 * 1024) } },
      director.cookie,
    );
    expect(r.status).toBe(413);
  });

  it("analyses every class of the document, with the overlay for the chosen class, and a repeat hits the memo", async () => {
    const { director } = await makeClubWithRoles();
    const first = await post(
      { document: WET_WEATHER_LAYOUT, classId: "buggy-4wd-10", skill: "expert" },
      director.cookie,
    );
    expect(first.status).toBe(200);
    expect(first.headers.get("X-Analysis-Cache")).toBe("miss");
    const body = first.data as Answer;
    expect(body.analysis.classes.map((c) => c.classId)).toEqual(["buggy-4wd-10"]);
    expect(body.overlay.classId).toBe("buggy-4wd-10");
    expect(body.analysis.skill).toBe("expert");
    // A closed demo loop: gap well under a centimetre (the file's lengths are rounded to 0.1 mm).
    expect(body.analysis.closure.gap).toBeLessThan(0.01);
    expect(body.overlay.lapTime).toBeGreaterThan(0);
    expect(body.overlay.jumps.length).toBe(body.analysis.classes[0].jumps.length);

    const before = analysisMemo.stats();
    const again = await post(
      { document: WET_WEATHER_LAYOUT, classId: "buggy-4wd-10", skill: "expert" },
      director.cookie,
    );
    expect(again.headers.get("X-Analysis-Cache")).toBe("hit");
    expect(again.data).toEqual(first.data);
    expect(analysisMemo.stats().hits).toBe(before.hits + 1);
    expect(analysisMemo.stats().misses).toBe(before.misses);

    const all = await post({ document: WET_WEATHER_LAYOUT }, director.cookie);
    expect(all.headers.get("X-Analysis-Cache")).toBe("miss");
    expect((all.data as Answer).analysis.classes.map((c) => c.classId)).toEqual(
      WET_WEATHER_LAYOUT.carClasses,
    );
  });
});

describe("GET /api/layouts/:layoutId/analysis", () => {
  it("follows the page's permissions: 401, 403, 404 for a missing layout and for a draft to a driver", async () => {
    const { club, director, driver, outsider } = await makeClubWithRoles();
    const draft = await createLayoutFromDocument(club.id, WET_WEATHER_LAYOUT, director.id);
    expect((await get(draft.id, "")).status).toBe(401);
    expect((await get(draft.id, "", outsider.cookie)).status).toBe(403);
    expect((await get("no-such-layout", "", director.cookie)).status).toBe(404);
    const hidden = await get(draft.id, "", driver.cookie);
    expect(hidden.status).toBe(404);
    expect(hidden.data).toMatchObject({ error: "No such layout." });
    expect((await get(draft.id, "?class=sct-10", director.cookie)).status).toBe(200);
  });

  it("answers 400 naming the parameter for an unknown class or skill", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, WET_WEATHER_LAYOUT, director.id);
    const cls = await get(layout.id, "?class=big-truck", director.cookie);
    expect(cls.status).toBe(400);
    expect((cls.data as Issues).issues[0].path).toBe("class");
    const skill = await get(layout.id, "?class=sct-10&skill=legend", director.cookie);
    expect(skill.status).toBe(400);
    expect((skill.data as Issues).issues[0].path).toBe("skill");
  });

  it("serves the demo summer layout's published analysis to a driver, from the memo on a repeat, unchanged by a draft save", async () => {
    const summary = await seedDemoData(await getDb());
    const db = await getDb();
    const [summer] = await db.select().from(layouts).where(eq(layouts.name, "Summer layout"));
    expect(summer.clubId).toBe(summary.clubId);
    const { director, driver } = await makeClubWithRoles();
    await db.insert(memberships).values([
      { clubId: summer.clubId, userId: driver.id, role: "driver" },
      { clubId: summer.clubId, userId: director.id, role: "director" },
    ]);

    const doc = await run(() =>
      getLayout(args(getRequest(`/api/layouts/${summer.id}`, driver.cookie), { layoutId: summer.id })),
    );
    expect(doc.status).toBe(200);
    expect((doc.data as { document: unknown }).document).toEqual(SUMMER_LAYOUT);

    const first = await get(summer.id, "?class=buggy-2wd-10&skill=expert", driver.cookie);
    expect(first.status).toBe(200);
    const body = first.data as Answer;
    expect(body.classId).toBe("buggy-2wd-10");
    expect(body.analysis.classes).toHaveLength(1);
    const jumps = body.analysis.classes[0].jumps;
    expect(jumps.map((j) => j.sectionId)).toEqual(
      SUMMER_LAYOUT.sections.filter((s) => s.kind === "jump").map((s) => s.id),
    );
    for (const j of jumps) {
      expect(["set-up", "straight"]).toContain(j.verdict.verdict);
      expect(j.verdict.reasonText.length).toBeGreaterThan(0);
    }
    expect(body.analysis.rules.note).toMatch(/rulebook/);
    const second = await get(summer.id, "?class=buggy-2wd-10&skill=expert", driver.cookie);
    expect(second.headers.get("X-Analysis-Cache")).toBe("hit");
    const etag = second.headers.get("ETag")!;
    const notModified = await run(() =>
      getAnalysis(
        args(
          getRequest(`/api/layouts/${summer.id}/analysis?class=buggy-2wd-10&skill=expert`, driver.cookie, {
            "If-None-Match": etag,
          }),
          { layoutId: summer.id },
        ),
      ),
    );
    expect(notModified.status).toBe(304);
    // A client that accepts gzip gets the same JSON compressed (made once, like the plain bytes).
    const zipped = (await getAnalysis(
      args(
        getRequest(`/api/layouts/${summer.id}/analysis?class=buggy-2wd-10&skill=expert`, driver.cookie, {
          "Accept-Encoding": "gzip, br",
        }),
        {
          layoutId: summer.id,
        },
      ),
    )) as Response;
    expect(zipped.headers.get("Content-Encoding")).toBe("gzip");
    const unzipped = JSON.parse(gunzipSync(new Uint8Array(await zipped.arrayBuffer())).toString("utf8"));
    expect(unzipped).toEqual(body);

    // A saved change goes to the draft: the director's answer is analysed afresh with the new lap
    // length, while the driver keeps the published version's answer.
    const longer = structuredClone(SUMMER_LAYOUT);
    (longer.sections[0] as { length: number }).length += 10;
    await saveLayoutDocument(summer.id, summer.version, longer, director.id);
    const draft = await get(summer.id, "?class=buggy-2wd-10&skill=expert", director.cookie);
    expect(draft.headers.get("X-Analysis-Cache")).toBe("miss");
    expect((draft.data as Answer).analysis.lapLength).toBeCloseTo(body.analysis.lapLength + 10, 1);
    const after = await get(summer.id, "?class=buggy-2wd-10&skill=expert", driver.cookie);
    expect(after.headers.get("X-Analysis-Cache")).toBe("hit");
    expect((after.data as Answer).analysis.lapLength).toBe(body.analysis.lapLength);
  });
});

describe("the API's one-query layout check", () => {
  it("answers exactly as requireLayoutAccess does for every role, status and visitor", async () => {
    const { club, director, marshal, driver, outsider } = await makeClubWithRoles();
    const ghost = await makeUser({ name: "Gone Member" });
    await addMember(club.id, ghost.id, "driver");
    const db = await getDb();
    await db.delete(users).where(eq(users.id, ghost.id)); // a cookie left behind by a deleted account
    const ids: Record<string, string> = { missing: "no-such-layout" };
    for (const status of ["draft", "published", "archived"] as const) {
      const layout = await createLayoutFromDocument(club.id, WET_WEATHER_LAYOUT, director.id);
      await db.update(layouts).set({ status }).where(eq(layouts.id, layout.id));
      ids[status] = layout.id;
    }
    const visitors: Record<string, string | undefined> = {
      "signed out": undefined,
      director: director.cookie,
      marshal: marshal.cookie,
      driver: driver.cookie,
      outsider: outsider.cookie,
      "deleted account": ghost.cookie,
    };
    const seen = new Set<number>();
    for (const [who, cookie] of Object.entries(visitors)) {
      for (const [what, id] of Object.entries(ids)) {
        const general = await run(() =>
          requireLayoutAccess(getRequest("/x", cookie), id, "member", { api: true }),
        );
        const single = await run(() => apiLayoutAccess(getRequest("/x", cookie), id));
        expect([who, what, single.status, single.data]).toEqual([
          who,
          what,
          general.status,
          general.status === 200 ? single.data : general.data,
        ]);
        if (single.status === 200) expect((single.data as { layout: { id: string } }).layout.id).toBe(id);
        seen.add(single.status);
      }
    }
    expect([...seen].sort()).toEqual([200, 401, 403, 404]);
  });
});
