import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { layouts, publishedVersions } from "~/db/schema";
import { createLayoutFromDocument, saveLayoutDocument } from "~/layouts/documents.server";
import { loader as apiLayout } from "~/routes/api-layout";
import { loader as apiAnalysis } from "~/routes/api-layout-analysis";
import { loader as exportLoader } from "~/routes/layout-export";
import { loader as jumpLoader } from "~/routes/jump-page";
import { loader as pageLoader } from "~/routes/layout-page";
import * as publishing from "~/routes/layout-publishing";
import { useTestDatabase } from "./helpers/db";
import { addMember, makeClubWithRoles, makeUser } from "./helpers/factories";
import { mailsTo, useFakeSmtp } from "./helpers/mail";
import { args, formRequest, getRequest, run } from "./helpers/requests";

const { db } = useTestDatabase();
useFakeSmtp();

type Errors = Record<string, string[]>;
const errorsOf = (r: { data: unknown }) => (r.data as { errors: Errors }).errors;
const RACE_DAY = new Date(Date.now() + 20 * 86400_000).toISOString().slice(0, 10);

const act = (layoutId: string, fields: Record<string, string>, cookie?: string) =>
  run(() =>
    publishing.action(args(formRequest(`/layouts/${layoutId}/publishing`, fields, cookie), { layoutId })),
  );
const publish = (layoutId: string, version: number, cookie: string, note = "Practice from 9") =>
  act(layoutId, { intent: "publish", version: String(version), raceDate: RACE_DAY, note }, cookie);
const get = <T>(
  loader: (a: never) => unknown,
  path: string,
  params: Record<string, string>,
  cookie?: string,
) => run(() => loader(args(getRequest(path, cookie), params))).then((r) => ({ ...r, body: r.data as T }));
const layoutRow = async (id: string) =>
  (await (await db()).select().from(layouts).where(eq(layouts.id, id)))[0];

/** A layout drawn from the summer layout, as its version 1, in a club with one member of each role. */
async function drawnLayout() {
  const people = await makeClubWithRoles();
  const layout = await createLayoutFromDocument(people.club.id, SUMMER_LAYOUT, people.director.id);
  return { ...people, layout };
}

type PageData = {
  layout: { version: number };
  reading: { kind: string; number: number; publication: { raceDate: string; note: string } | null };
  analysis: { result: { ok: boolean; chosen?: { jumps: unknown[] } } };
};

describe("publishing for race day", () => {
  it("lets only directors publish, withdraw and share (403 for a marshal, a driver and an outsider)", async () => {
    const { layout, marshal, driver, outsider, director } = await drawnLayout();
    for (const who of [marshal, driver, outsider]) {
      expect((await publish(layout.id, 1, who.cookie)).status).toBe(403);
      expect(
        (await act(layout.id, { intent: "withdraw", publication: "x", reason: "no" }, who.cookie)).status,
      ).toBe(403);
      expect((await act(layout.id, { intent: "share", publication: "x" }, who.cookie)).status).toBe(403);
      expect(
        (
          await get(
            publishing.loader,
            `/layouts/${layout.id}/publishing`,
            { layoutId: layout.id },
            who.cookie,
          )
        ).status,
      ).toBe(403);
    }
    const anonymous = await publish(layout.id, 1, "");
    expect(anonymous.location).toMatch(/^\/sign-in/);
    expect(
      await (await db()).select().from(publishedVersions).where(eq(publishedVersions.layoutId, layout.id)),
    ).toEqual([]);
    expect((await publish(layout.id, 1, director.cookie)).status).toBe(302);
  });

  it("names each bad field (400), refuses a stale page (409) and a version already published (409)", async () => {
    const { layout, director } = await drawnLayout();
    const bad = await act(
      layout.id,
      { intent: "publish", version: "1", raceDate: "2020-01-01", note: "x".repeat(1001) },
      director.cookie,
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(errorsOf(bad)).sort()).toEqual(["note", "raceDate"]);
    const notADay = await act(
      layout.id,
      { intent: "publish", version: "1", raceDate: "2031-02-30" },
      director.cookie,
    );
    expect(errorsOf(notADay).raceDate[0]).toMatch(/not a day/);
    expect((await publish(layout.id, 7, director.cookie)).status).toBe(409);
    expect((await publish(layout.id, 1, director.cookie)).status).toBe(302);
    const again = await publish(layout.id, 1, director.cookie);
    expect(again.status).toBe(409);
    expect(errorsOf(again).form[0]).toMatch(/already published/);
    expect(
      await (await db()).select().from(publishedVersions).where(eq(publishedVersions.layoutId, layout.id)),
    ).toHaveLength(1);
  });

  it("keeps the published version fixed for marshals and drivers while the director saves drafts", async () => {
    const { layout, director, marshal, driver } = await drawnLayout();
    expect(
      (await get(pageLoader, `/layouts/${layout.id}`, { layoutId: layout.id }, driver.cookie)).status,
    ).toBe(404);
    expect((await publish(layout.id, 1, director.cookie)).status).toBe(302);
    // The director keeps working: a new jump, saved twice.
    const extra = {
      ...SUMMER_LAYOUT.sections.find((s) => s.kind === "jump")!,
      id: "new-jump",
      name: "New jump",
    };
    const draft = { ...SUMMER_LAYOUT, sections: [...SUMMER_LAYOUT.sections, extra] };
    await saveLayoutDocument(layout.id, 1, draft, director.id);
    await saveLayoutDocument(layout.id, 2, draft, director.id);
    const jumps = SUMMER_LAYOUT.sections.filter((s) => s.kind === "jump").length;
    for (const reader of [marshal, driver]) {
      const page = await get<PageData>(
        pageLoader,
        `/layouts/${layout.id}`,
        { layoutId: layout.id },
        reader.cookie,
      );
      expect(page.status).toBe(200);
      expect(page.body.reading).toMatchObject({ kind: "published", number: 1 });
      expect(page.body.reading.publication).toMatchObject({ raceDate: RACE_DAY, note: "Practice from 9" });
      expect(page.body.layout.version).toBe(1);
      expect(page.body.analysis.result.chosen!.jumps).toHaveLength(jumps);
      // The draft, by name or number, and a jump only the draft has: 404.
      for (const q of ["?version=draft", "?version=3", "?version=2"])
        expect(
          (await get(pageLoader, `/layouts/${layout.id}${q}`, { layoutId: layout.id }, reader.cookie)).status,
        ).toBe(404);
      const jump = await get(
        jumpLoader,
        `/layouts/${layout.id}/jumps/new-jump`,
        { layoutId: layout.id, sectionId: "new-jump" },
        reader.cookie,
      );
      expect(jump.status).toBe(404);
      const doc = await get<{ documentVersion: number; document: { sections: unknown[] } }>(
        apiLayout,
        `/api/layouts/${layout.id}`,
        { layoutId: layout.id },
        reader.cookie,
      );
      expect(doc.body.documentVersion).toBe(1);
      expect(doc.body.document.sections).toHaveLength(SUMMER_LAYOUT.sections.length);
      const api = await get<{ readVersion: number }>(
        apiAnalysis,
        `/api/layouts/${layout.id}/analysis?class=sct-10`,
        { layoutId: layout.id },
        reader.cookie,
      );
      expect(api.status).toBe(200);
      expect(api.body.readVersion).toBe(1);
      const file = await get<{ sections: unknown[] }>(
        exportLoader,
        `/layouts/${layout.id}/export`,
        { layoutId: layout.id },
        reader.cookie,
      );
      expect(file.body.sections).toHaveLength(SUMMER_LAYOUT.sections.length);
    }
    // The director sees the draft by default, and any saved version by number.
    const own = await get<PageData>(
      pageLoader,
      `/layouts/${layout.id}`,
      { layoutId: layout.id },
      director.cookie,
    );
    expect(own.body.reading).toMatchObject({ kind: "draft", number: 3 });
    expect(own.body.analysis.result.chosen!.jumps).toHaveLength(jumps + 1);
    const saved = await get<PageData>(
      pageLoader,
      `/layouts/${layout.id}?version=2`,
      { layoutId: layout.id },
      director.cookie,
    );
    expect(saved.body.reading).toMatchObject({ kind: "saved", number: 2 });
  });

  it("e-mails every member once through the local SMTP listener, with the date, the note and a link", async () => {
    const { club, layout, director, marshal, driver, outsider } = await drawnLayout();
    const late = await makeUser({ name: "Lee Late" });
    await addMember(club.id, late.id, "driver");
    const r = await publish(layout.id, 1, director.cookie, "Gates open at 8.");
    expect(r.status).toBe(302);
    for (const member of [director, marshal, driver, late]) {
      const mails = await mailsTo(member.email);
      expect(mails, member.email).toHaveLength(1);
      expect(mails[0].subject).toMatch(/Summer layout: race day/);
      expect(mails[0].text).toContain("Gates open at 8.");
      expect(mails[0].text).toContain(`/layouts/${layout.id}?version=1`);
      expect(mails[0].text).toMatch(/not a safety certification/);
    }
    expect(await mailsTo(outsider.email)).toEqual([]);
  });

  it("withdraws a version with a reason: readers fall back to the newest one left, or get 404", async () => {
    const { layout, director, driver } = await drawnLayout();
    await publish(layout.id, 1, director.cookie);
    await saveLayoutDocument(layout.id, 1, { ...SUMMER_LAYOUT, name: "Summer layout" }, director.id);
    await publish(layout.id, 2, director.cookie);
    const list = await (
      await db()
    )
      .select()
      .from(publishedVersions)
      .where(eq(publishedVersions.layoutId, layout.id));
    const v2 = list.find((p) => p.versionNumber === 2)!;
    const noReason = await act(
      layout.id,
      { intent: "withdraw", publication: v2.id, reason: "" },
      director.cookie,
    );
    expect(noReason.status).toBe(400);
    expect(Object.keys(errorsOf(noReason))).toEqual(["reason"]);
    expect(
      (
        await act(
          layout.id,
          { intent: "withdraw", publication: v2.id, reason: "Landing too short" },
          director.cookie,
        )
      ).status,
    ).toBe(302);
    expect(
      (await act(layout.id, { intent: "withdraw", publication: v2.id, reason: "again" }, director.cookie))
        .status,
    ).toBe(409);
    const now = await get<PageData>(
      pageLoader,
      `/layouts/${layout.id}`,
      { layoutId: layout.id },
      driver.cookie,
    );
    expect(now.body.reading.number).toBe(1);
    // The withdrawn version stays readable at its address, with its reason.
    const old = await get<{ reading: { publication: { withdrawnReason: string } } }>(
      pageLoader,
      `/layouts/${layout.id}?version=2`,
      { layoutId: layout.id },
      driver.cookie,
    );
    expect(old.body.reading.publication.withdrawnReason).toBe("Landing too short");
    const v1 = list.find((p) => p.versionNumber === 1)!;
    await act(layout.id, { intent: "withdraw", publication: v1.id, reason: "Rained off" }, director.cookie);
    expect((await layoutRow(layout.id)).status).toBe("draft");
    expect(
      (await get(pageLoader, `/layouts/${layout.id}`, { layoutId: layout.id }, driver.cookie)).status,
    ).toBe(404);
  });
});
