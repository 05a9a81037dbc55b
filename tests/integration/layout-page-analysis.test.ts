import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import { createLayout } from "~/layouts/layouts.server";
import { loader as jumpLoader } from "~/routes/jump-page";
import { loader as pageLoader } from "~/routes/layout-page";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, getRequest, run } from "./helpers/requests";

useTestDatabase();

type PageData = {
  analysis: {
    classId: string;
    skill: string;
    problems: string[];
    sort: { key: string; dir: string };
    result: {
      ok: boolean;
      summary?: { lapLength: number; rules: { note: string } };
      chosen?: { jumps: { sectionId: string }[] };
    };
  };
};

const page = (id: string, query: string, cookie: string) =>
  run(() => pageLoader(args(getRequest(`/layouts/${id}${query}`, cookie), { layoutId: id })));

describe("the layout page's analysis", () => {
  it("analyses a saved drawing for the asked class and skill, sorted as asked", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const r = await page(layout.id, "?class=sct-10&skill=expert&sort=airtime&dir=desc", director.cookie);
    expect(r.status).toBe(200);
    const a = (r.data as PageData).analysis;
    expect([a.classId, a.skill, a.sort.key, a.sort.dir]).toEqual(["sct-10", "expert", "airtime", "desc"]);
    expect(a.result.ok).toBe(true);
    expect(a.result.chosen!.jumps).toHaveLength(
      SUMMER_LAYOUT.sections.filter((s) => s.kind === "jump").length,
    );
    expect(a.result.summary!.rules.note).toMatch(/rulebook decides/);
  });

  it("names a parameter it does not understand (400) and shows the defaults", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const r = await page(layout.id, "?class=hovercraft&skill=legend&sort=colour", director.cookie);
    expect(r.status).toBe(400);
    const a = (r.data as PageData).analysis;
    expect(a.problems.map((p) => p.split(":")[0])).toEqual(["class", "skill", "sort"]);
    expect([a.classId, a.skill, a.sort.key]).toEqual([SUMMER_LAYOUT.carClasses[0], "club", "order"]);
    expect(a.result.ok).toBe(true);
  });

  it("analyses the starter loop of a layout that has never been drawn", async () => {
    const { club, director } = await makeClubWithRoles();
    const { id } = await createLayout(club.id, director.id, {
      name: "Blank",
      surface: "dirt",
      trackWidth: 3,
      carClasses: ["buggy-2wd-10"],
    });
    const r = await page(id, "", director.cookie);
    expect(r.status).toBe(200);
    const a = (r.data as PageData).analysis;
    expect(a.result.ok).toBe(true);
    expect(a.result.summary!.lapLength).toBeGreaterThan(0);
  });
});

describe("the jump page", () => {
  it("gives the elevation, the verdicts and, for a set-up, the steering the servo follows", async () => {
    const { club, director } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const r = await run(() =>
      jumpLoader(
        args(
          getRequest(
            `/layouts/${layout.id}/jumps/first-double?class=buggy-4wd-10&skill=expert`,
            director.cookie,
          ),
          {
            layoutId: layout.id,
            sectionId: "first-double",
          },
        ),
      ),
    );
    expect(r.status).toBe(200);
    const d = r.data as {
      number: number;
      jump: {
        sectionId: string;
        airtime: number;
        plan: { feasible: boolean; steering: [number, number][] } | null;
        verdicts: Record<string, unknown>;
      };
      elevation: { d: number[]; h: number[]; lip: { d: number } };
      steering: { airtime: number; lockDeg: number; wheels: [number, number][] } | null;
      next: { sectionId: string } | null;
    };
    expect(d.number).toBe(1);
    expect(Object.keys(d.jump.verdicts).sort()).toEqual(["club", "expert", "novice"]);
    expect(d.elevation.d[0]).toBe(0);
    expect(d.elevation.d.length).toBe(d.elevation.h.length);
    expect(d.next?.sectionId).toBeTruthy();
    // The demo's first double lands into the east hairpin with a workable plan (docs: demo layouts).
    expect(d.jump.plan?.feasible).toBe(true);
    // The wheels start straight, never pass the lock, and the series ends at touchdown.
    const s = d.steering!;
    expect(s.wheels[0]).toEqual([0, 0]);
    expect(s.wheels[s.wheels.length - 1][0]).toBeCloseTo(d.jump.airtime, 9);
    for (const [, deg] of s.wheels) expect(Math.abs(deg)).toBeLessThanOrEqual(s.lockDeg + 1e-9);
  });

  it("answers 404 for a section that is not a jump, and for a draft's jump to a driver", async () => {
    const { club, director, driver } = await makeClubWithRoles();
    const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
    const notJump = await run(() =>
      jumpLoader(
        args(getRequest(`/layouts/${layout.id}/jumps/start-straight`, director.cookie), {
          layoutId: layout.id,
          sectionId: "start-straight",
        }),
      ),
    );
    expect(notJump.status).toBe(404);
    const hidden = await run(() =>
      jumpLoader(
        args(getRequest(`/layouts/${layout.id}/jumps/first-double`, driver.cookie), {
          layoutId: layout.id,
          sectionId: "first-double",
        }),
      ),
    );
    expect(hidden.status).toBe(404);
  });
});
