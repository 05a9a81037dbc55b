import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { WET_WEATHER_LAYOUT } from "~/db/demo-layouts";
import { analysisMemo } from "~/layouts/analysis-memo.server";
import { getDb } from "~/db/client.server";
import { seedDemoData } from "~/db/demo-data.server";
import { layouts, memberships } from "~/db/schema";
import { action as postAnalysis } from "~/routes/api-analysis";
import { loader as getAnalysis } from "~/routes/api-layout-analysis";
import { loader as planLoader } from "~/routes/layout-drawing";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, getRequest, jsonRequest, run } from "./helpers/requests";

useTestDatabase();

const post = (body: unknown, cookie?: string) =>
  run(() => postAnalysis(args(jsonRequest("/api/analysis", body, cookie))));
const get = (url: string, layoutId: string, cookie: string, headers: Record<string, string> = {}) =>
  run(() => getAnalysis(args(getRequest(url, cookie, headers), { layoutId })));
const bytes = (data: unknown) => JSON.stringify(data).length;

describe("the editor's live request (POST /api/analysis with only: overlay)", () => {
  it("answers the overlay alone, a fraction of the whole answer, and names a bad `only`", async () => {
    const { director } = await makeClubWithRoles();
    const ask = { document: WET_WEATHER_LAYOUT, classId: "buggy-2wd-10", skill: "club" };
    const slim = await post({ ...ask, only: "overlay" }, director.cookie);
    expect(slim.status).toBe(200);
    expect(Object.keys(slim.data as object)).toEqual(["overlay"]);
    const whole = await post(ask, director.cookie);
    expect(whole.headers.get("X-Analysis-Cache")).toBe("hit");
    expect((whole.data as { overlay: unknown }).overlay).toEqual((slim.data as { overlay: unknown }).overlay);
    expect(bytes(slim.data)).toBeLessThan(bytes(whole.data) / 2);
    const bad = await post({ ...ask, only: "everything" }, director.cookie);
    expect(bad.status).toBe(400);
    expect((bad.data as { issues: { path: string }[] }).issues[0].path).toBe("only");
  });
});

describe("the read-only plan and the cached GET", () => {
  it("draws the plan on the server from the one memo (a second reader is a hit, nothing posted back)", async () => {
    await seedDemoData(await getDb());
    const db = await getDb();
    const [summer] = await db.select().from(layouts).where(eq(layouts.name, "Summer layout"));
    const { driver } = await makeClubWithRoles();
    await db.insert(memberships).values({ clubId: summer.clubId, userId: driver.id, role: "driver" });
    const open = () =>
      run(() =>
        planLoader(
          args(getRequest(`/layouts/${summer.id}/plan?skill=expert`, driver.cookie), { layoutId: summer.id }),
        ),
      );
    const first = await open();
    expect(first.status).toBe(200);
    const before = analysisMemo.stats();
    const second = await open();
    expect(second.status).toBe(200);
    const after = analysisMemo.stats();
    expect(after.misses).toBe(before.misses);
    expect(after.hits).toBeGreaterThan(before.hits);
    const page = second.data as { analysis: { skill: string; result: { ok: boolean } } };
    expect(page.analysis.skill).toBe("expert");
    expect(page.analysis.result.ok).toBe(true);
  });

  it("GET ?only=overlay answers the version read; a repeat with the ETag is a 304", async () => {
    await seedDemoData(await getDb());
    const db = await getDb();
    const [summer] = await db.select().from(layouts).where(eq(layouts.name, "Summer layout"));
    const { driver } = await makeClubWithRoles();
    await db.insert(memberships).values({ clubId: summer.clubId, userId: driver.id, role: "driver" });
    const url = `/api/layouts/${summer.id}/analysis?skill=expert&only=overlay`;
    const first = await get(url, summer.id, driver.cookie);
    expect(first.status).toBe(200);
    const body = first.data as { overlay: { classId: string }; readVersion: number; analysis?: unknown };
    expect(body.analysis).toBeUndefined();
    expect(body.readVersion).toEqual(expect.any(Number));
    const etag = first.headers.get("ETag")!;
    expect(etag).toMatch(/\.overlay"$/);
    const again = await get(url, summer.id, driver.cookie, { "If-None-Match": etag });
    expect(again.status).toBe(304);
    // The whole answer has its own tag: a slim answer never stands in for it.
    const whole = await get(url.replace("&only=overlay", ""), summer.id, driver.cookie, {
      "If-None-Match": etag,
    });
    expect(whole.status).toBe(200);
    expect(bytes(body)).toBeLessThan(bytes(whole.data) / 2);
  });
});
