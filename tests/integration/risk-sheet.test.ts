import { beforeAll, describe, expect, it } from "vitest";
import { PDFDocument } from "pdf-lib";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { raceDateText } from "~/lib/race-date";
import { loadClubMarshal } from "~/clubs/marshal-settings.server";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import { publishDraft } from "~/layouts/publishing.server";
import type { RiskSheet } from "~/layouts/risk-sheet.server";
import { loader as pageLoader } from "~/routes/risk-sheet";
import { loader as pdfLoader } from "~/routes/risk-sheet-pdf";
import { action as settingsAction } from "~/routes/club-settings";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { pdfText } from "./helpers/pdf-text";
import { args, formRequest, getRequest, run } from "./helpers/requests";

useTestDatabase();

let people: Awaited<ReturnType<typeof makeClubWithRoles>>;
let published = "";
let draft = "";

beforeAll(async () => {
  people = await makeClubWithRoles();
  const { club, director } = people;
  published = (await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id)).id;
  await publishDraft(published, 1, { raceDate: "2026-07-12", note: "Summer round" }, director.id);
  draft = (await createLayoutFromDocument(club.id, { ...SUMMER_LAYOUT, name: "Draft only" }, director.id)).id;
}, 60_000);

const page = (layoutId: string, cookie: string, query = "") =>
  run(() => pageLoader(args(getRequest(`/layouts/${layoutId}/risk${query}`, cookie), { layoutId })));
const pdf = async (layoutId: string, cookie: string, query = "") =>
  (await pdfLoader(
    args(getRequest(`/layouts/${layoutId}/risk.pdf${query}`, cookie), { layoutId }),
  )) as Response;
const saveSettings = (clubId: string, fields: Record<string, string>, cookie: string) =>
  run(() =>
    settingsAction(
      args(formRequest(`/clubs/${clubId}/settings`, { intent: "marshal-settings", ...fields }, cookie), {
        clubId,
      }),
    ),
  );

describe("the corner-risk sheet", () => {
  it("is read by every member of the club for a published version (200), never by another club (403)", async () => {
    for (const who of [people.marshal, people.driver, people.director]) {
      const res = await page(published, who.cookie);
      expect(res.status).toBe(200);
      const sheet = (res.data as { sheet: RiskSheet }).sheet;
      expect(sheet.layout.id).toBe(published);
      expect(sheet.plan.points.map((p) => p.id)).toEqual(
        SUMMER_LAYOUT.marshalPoints.map((_, i) => `M${i + 1}`),
      );
    }
    const marshalView = (await page(published, people.marshal.cookie)).data as { sheet: RiskSheet };
    expect(marshalView.sheet.versionLabel).toBe("version 1");
    expect(marshalView.sheet.raceDate).toBe(raceDateText("2026-07-12"));
    expect((await page(published, people.outsider.cookie)).status).toBe(403);
    expect((await pdf(published, people.outsider.cookie).catch((r: Response) => r)).status).toBe(403);
  });

  it("is 404 for a marshal or a driver asking for a draft; the director previews the draft", async () => {
    for (const who of [people.marshal, people.driver]) {
      expect((await page(draft, who.cookie)).status).toBe(404);
      expect((await page(published, who.cookie, "?version=draft")).status).toBe(404);
      expect((await pdf(draft, who.cookie).catch((r: Response) => r)).status).toBe(404);
    }
    const preview = await page(draft, people.director.cookie);
    expect(preview.status).toBe(200);
    expect((preview.data as { sheet: RiskSheet }).sheet.kind).toBe("draft");
  });

  it("answers 400 naming the class when the class is not the layout's", async () => {
    const res = await page(published, people.marshal.cookie, "?class=no-such-class");
    expect(res.status).toBe(400);
    expect(String(res.data)).toMatch(/^class: /);
  });

  it("risk.pdf is a valid PDF whose text names every marshal point, jump and the cautions", async () => {
    const res = await pdf(published, people.marshal.cookie);
    expect(res.status).toBe(200);
    expect(res.headers.get("Content-Type")).toBe("application/pdf");
    expect(res.headers.get("Content-Disposition")).toMatch(/summer-layout-v1-.*-corner-risk\.pdf/);
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe("%PDF-");
    expect((await PDFDocument.load(bytes)).getPageCount()).toBeGreaterThanOrEqual(1);
    const text = pdfText(bytes).replace(/\s+/g, " ");
    const sheet = ((await page(published, people.marshal.cookie)).data as { sheet: RiskSheet }).sheet;
    expect(sheet.plan.jumps.length).toBeGreaterThan(0);
    for (const p of sheet.plan.points) expect(text).toContain(p.id);
    for (const j of sheet.plan.jumps) expect(text).toMatch(new RegExp(`\\b${j.id}\\b`));
    for (const h of sheet.plan.hotspots) expect(text).toContain(h.id);
    for (const words of [
      "Corner-risk sheet: Summer layout",
      "version 1",
      raceDateText("2026-07-12"),
      "Stretch of the lap",
    ])
      expect(text).toContain(words);
    expect(text).toContain("race director and your sanctioning body");
    expect(text).toContain("eye protection and hi-vis");
  });
});

describe("club marshal settings", () => {
  it("are the engine's defaults until a director changes them, and feed the sheet", async () => {
    const { club, director } = await makeClubWithRoles();
    expect(await loadClubMarshal(club.id)).toEqual({ reach: 3, heatSize: 10 });
    const saved = await saveSettings(club.id, { reach: "4,5 m", heatSize: "8" }, director.cookie);
    expect(saved.status).toBe(302);
    expect(await loadClubMarshal(club.id)).toEqual({ reach: 4.5, heatSize: 8 });
    const layoutId = (await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id)).id;
    const sheet = ((await page(layoutId, director.cookie)).data as { sheet: RiskSheet }).sheet;
    expect(sheet.plan.settings.reach).toBe(4.5);
    expect(sheet.plan.settings.heatSize).toBe(8);
  });

  it("answer 400 naming the field for a value out of bounds or not a number, and keep what was saved", async () => {
    const { club, director } = await makeClubWithRoles();
    await saveSettings(club.id, { reach: "5", heatSize: "12" }, director.cookie);
    const cases: [Record<string, string>, string, RegExp][] = [
      [{ reach: "0.1", heatSize: "10" }, "reach", /between 0.5 and 20 m/],
      [{ reach: "three", heatSize: "10" }, "reach", /must be a number/],
      [{ reach: "3", heatSize: "0" }, "heatSize", /between 1 and 50/],
      [{ reach: "3", heatSize: "7.5" }, "heatSize", /whole number/],
      [{ reach: "3" }, "heatSize", /enter a whole number/],
    ];
    for (const [fields, field, message] of cases) {
      const res = await saveSettings(club.id, fields, director.cookie);
      expect(res.status).toBe(400);
      const errors = (res.data as { errors: Record<string, string[]> }).errors;
      expect(Object.keys(errors)).toEqual([field]);
      expect(errors[field].join(" ")).toMatch(message);
    }
    expect(await loadClubMarshal(club.id)).toEqual({ reach: 5, heatSize: 12 });
  });

  it("are for directors only (403 for a marshal, a driver and an outsider)", async () => {
    const { club, marshal, driver, outsider } = await makeClubWithRoles();
    for (const who of [marshal, driver, outsider])
      expect((await saveSettings(club.id, { reach: "9", heatSize: "3" }, who.cookie)).status).toBe(403);
    expect(await loadClubMarshal(club.id)).toEqual({ reach: 3, heatSize: 10 });
  });
});
