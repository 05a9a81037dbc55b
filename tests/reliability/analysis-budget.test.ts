/**
 * The analysis API under abuse: work over the budget is refused before it reaches a worker (422
 * naming the limit), a task running past the time limit is stopped (422) and the pool carries on,
 * a full queue answers 503 and an account over its share 429 (both with Retry-After), too many
 * requests a minute 429, identical requests share one computation, and the server's own thread
 * keeps turning while the heaviest accepted analysis runs. Real worker threads, real SQLite file.
 */
import { afterAll, afterEach, describe, expect, it } from "vitest";
import { starterDocument } from "~/analysis";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { analysisPoolStats, closeAnalysisPool } from "~/analysis-pool/pool.server";
import { analysisMemo } from "~/layouts/analysis-memo.server";
import { action as analysisAction } from "~/routes/api-analysis";
import { heaviestAccepted, overBudget } from "../../scripts/lib/worst-case-layout";
import { useTestDatabase } from "../integration/helpers/db";
import { makeClubWithRoles } from "../integration/helpers/factories";
import { args, jsonRequest, run, type Outcome } from "../integration/helpers/requests";

useTestDatabase();

type Body = { error: string; limit?: string; issues?: { path: string; message: string }[] };

/** Only one car class: a quarter of the work, long enough to keep a worker busy meanwhile. */
const ONE_CLASS = { classId: "sct-10" };

const ask = (cookie: string, document: unknown, extra: Record<string, unknown> = {}): Promise<Outcome> =>
  run(() => analysisAction(args(jsonRequest("/api/analysis", { document, ...extra }, cookie))));

afterEach(async () => {
  delete process.env.LOFTLINE_ANALYSIS_RATE;
  await closeAnalysisPool();
  analysisMemo.clear();
});
afterAll(() => closeAnalysisPool());

describe("the analysis budget", () => {
  it("refuses 500 jumps before any worker sees them: 422 naming sections and the limit", async () => {
    const { director } = await makeClubWithRoles();
    const before = analysisPoolStats();
    const r = await ask(director.cookie, overBudget(1));
    expect(r.status).toBe(422);
    const body = r.data as Body;
    expect(body.limit).toBe("work");
    expect(body.issues).toEqual([
      {
        path: "document.sections",
        message: expect.stringMatching(
          /^hold 500 jumps; for 4 car classes that is 2000 jump analyses, over the limit of 160/,
        ),
      },
      {
        path: "document.sections",
        message: expect.stringMatching(/^make a centre line 275\d m long, over the limit of 2000 m/),
      },
    ]);
    expect(body.error).toMatch(/^The analysis is over its limit: document\.sections hold 500 jumps/);
    const after = analysisPoolStats();
    expect(after.started).toBe(before.started);
    expect(after.refusedBudget).toBe(before.refusedBudget + 1);
    // One class of 40 jumps fits, where all four classes of 50 jumps would not.
    const fifty = { ...heaviestAccepted(2) };
    const extra = heaviestAccepted(2)
      .sections.slice(0, 30)
      .map((s) => ({ ...s, id: `x-${s.id}` }));
    fifty.sections = [...fifty.sections, ...extra];
    const classes = await ask(director.cookie, fifty);
    expect(classes.status).toBe(422);
    expect((classes.data as Body).issues?.[0].path).toBe("document.carClasses");
  });

  it("stops an analysis running past the time limit with 422, and the pool goes on working", async () => {
    await closeAnalysisPool({ timeLimitMs: 400 });
    const { director } = await makeClubWithRoles();
    // The limit counts running time only: starting the worker (a second or two) is not part of it.
    const slow = await ask(director.cookie, heaviestAccepted(5));
    expect(slow.status).toBe(422);
    expect(slow.data).toMatchObject({
      limit: "time",
      issues: [{ path: "document", message: expect.stringMatching(/longer than the limit of 0\.4 s/) }],
    });
    expect(analysisPoolStats().timedOut).toBe(1);
    const after = await ask(director.cookie, starterDocument("Small loop", 3));
    expect(after.status).toBe(200);
    expect(after.headers.get("X-Analysis-Cache")).toBe("miss");
  });
});

describe("busy answers", () => {
  it("answers 503 with Retry-After when the queue is full, and 429 past the account's own share", async () => {
    await closeAnalysisPool({ threads: 1, maxQueue: 1, perAccount: 10 });
    const { director, marshal, driver } = await makeClubWithRoles();
    expect((await ask(director.cookie, starterDocument("Small loop", 3))).status).toBe(200);
    const three = await Promise.all(
      [director, marshal, driver].map((who, i) => ask(who.cookie, heaviestAccepted(10 + i), ONE_CLASS)),
    );
    const statuses = three.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 200, 503]);
    const busy = three.find((r) => r.status === 503)!;
    expect(busy.headers.get("Retry-After")).toBe("5");
    expect((busy.data as Body).error).toMatch(/as many analyses waiting as it takes/);

    await closeAnalysisPool({ perAccount: 2 });
    const mine = await Promise.all(
      [20, 21, 22].map((n) => ask(director.cookie, heaviestAccepted(n), ONE_CLASS)),
    );
    expect(mine.map((r) => r.status).sort()).toEqual([200, 200, 429]);
    const refused = mine.find((r) => r.status === 429)!;
    expect((refused.data as Body).error).toMatch(/already have 2 analyses running/);
    expect(refused.headers.get("Retry-After")).toBe("5");
  }, 60_000);

  it("shares one computation among identical requests", async () => {
    const { director, driver } = await makeClubWithRoles();
    const before = analysisPoolStats();
    const same = await Promise.all([
      ask(director.cookie, heaviestAccepted(30), ONE_CLASS),
      ask(driver.cookie, heaviestAccepted(30), ONE_CLASS),
      ask(director.cookie, heaviestAccepted(30), ONE_CLASS),
    ]);
    expect(same.map((r) => r.status)).toEqual([200, 200, 200]);
    expect(same.map((r) => r.headers.get("X-Analysis-Cache")).sort()).toEqual(["hit", "hit", "miss"]);
    expect(analysisPoolStats().started).toBe(before.started + 1);
  }, 60_000);

  it("answers 429 with Retry-After past the account's requests a minute", async () => {
    process.env.LOFTLINE_ANALYSIS_RATE = "3";
    const { director, driver } = await makeClubWithRoles();
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) statuses.push((await ask(director.cookie, SUMMER_LAYOUT, ONE_CLASS)).status);
    expect(statuses).toEqual([200, 200, 200, 429]);
    const last = await ask(director.cookie, SUMMER_LAYOUT, ONE_CLASS);
    expect(last.data).toMatchObject({ error: expect.stringMatching(/at most 3 a minute for each account/) });
    expect(Number(last.headers.get("Retry-After"))).toBeGreaterThan(0);
    // Another account is counted on its own.
    expect((await ask(driver.cookie, SUMMER_LAYOUT, ONE_CLASS)).status).toBe(200);
  });
});

describe("the server's own thread", () => {
  it("keeps turning while the heaviest accepted analysis runs in a worker", async () => {
    const { director } = await makeClubWithRoles();
    expect((await ask(director.cookie, starterDocument("Small loop", 3))).status).toBe(200);
    let ticks = 0;
    const timer = setInterval(() => (ticks += 1), 20);
    const started = performance.now();
    const r = await ask(director.cookie, heaviestAccepted(40));
    const elapsed = performance.now() - started;
    clearInterval(timer);
    expect(r.status).toBe(200);
    // Run on this thread, the analysis would hold it for the whole time and let no tick through.
    // In a worker the timer keeps firing; a generous floor keeps a loaded machine from failing it.
    expect(ticks).toBeGreaterThan(Math.min(10, (elapsed / 20) * 0.25));
    expect(analysisPoolStats().threads).toBeGreaterThan(0);
  }, 60_000);
});
