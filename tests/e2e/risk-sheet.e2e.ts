import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { POINT_COLUMNS } from "~/lib/risk-sheet-rows";
import {
  demoAccount,
  login,
  queryDb,
  SCREENSHOT_DIR,
  screenshot,
  scrollsSideways,
  url,
  useBrowser,
} from "./fixtures";

const browser = useBrowser();

/** The demo's race-day layout: its id and how many jumps its published version has (J1..Jn). */
async function summer(): Promise<{ id: string; clubId: string; jumps: number }> {
  const [row] = await queryDb<{ id: string; club_id: string; document: string }>(
    `select l.id, l.club_id, v.document from layouts l
       join published_versions p on p.layout_id = l.id
       join layout_versions v on v.layout_id = l.id and v.number = p.version_number
     where l.name = ? order by p.version_number desc limit 1`,
    ["Summer layout"],
  );
  const doc = JSON.parse(row.document) as { sections: { kind: string }[] };
  return { id: row.id, clubId: row.club_id, jumps: doc.sections.filter((s) => s.kind === "jump").length };
}

describe("corner-risk sheet in the browser", () => {
  it("is found by the demo marshal from the club home, prints on A4 with every column and jump and no controls", async () => {
    const { id, clubId, jumps } = await summer();
    expect(jumps).toBeGreaterThan(0);
    const page = await browser.newPage();
    await login(page, demoAccount("marshal"));
    await page.goto(url(`/clubs/${clubId}`));
    // Other browser tests may publish layouts of their own: take the summer layout's card.
    await page
      .getByRole("listitem")
      .filter({ hasText: "Summer layout" })
      .getByRole("link", { name: "Corner-risk sheet" })
      .click();
    await page.getByRole("heading", { level: 1, name: "Corner-risk sheet: Summer layout" }).waitFor();
    expect(new URL(page.url()).pathname).toBe(`/layouts/${id}/risk`);
    const main = page.getByRole("main");
    for (const c of POINT_COLUMNS)
      expect(await main.getByRole("columnheader", { name: c.title }).count()).toBe(1);
    expect(await main.getByRole("heading", { name: "Safety around the track" }).count()).toBe(1);
    await screenshot(page, "risk-sheet-01-1280");

    await page.emulateMedia({ media: "print" });
    const pdf = path.join(SCREENSHOT_DIR, "risk-sheet-02-print.pdf");
    fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
    fs.writeFileSync(pdf, await page.pdf({ format: "A4", printBackground: true }));
    execFileSync("pdftoppm", ["-png", "-r", "60", pdf, pdf.slice(0, -4)]);
    const pngs = fs
      .readdirSync(SCREENSHOT_DIR)
      .filter((f) => f.startsWith("risk-sheet-02-print-") && f.endsWith(".png"));
    expect(pngs.length).toBeGreaterThan(0);
    const text = execFileSync("pdftotext", ["-layout", pdf, "-"]).toString();
    const flat = text.replace(/\s+/g, " ");
    for (const c of POINT_COLUMNS) expect(flat, c.title).toContain(c.title);
    for (let j = 1; j <= jumps; j++) expect(text, `J${j}`).toMatch(new RegExp(`\\bJ${j}\\b`));
    for (const control of ["Download the PDF", "Sign out", "Show this class"])
      expect(text, control).not.toContain(control);
    expect(flat).toContain("sanctioning body");

    const phone = await browser.newPage({ width: 390, height: 844 });
    await login(phone, demoAccount("marshal"));
    await phone.goto(url(`/layouts/${id}/risk`));
    await phone.getByRole("heading", { level: 1, name: "Corner-risk sheet: Summer layout" }).waitFor();
    expect(await scrollsSideways(phone)).toBe(false);
    await screenshot(phone, "risk-sheet-03-390");
  });

  it("shows the director a warned marshal point in the editor and suggests a heat's worth of points, undoable", async () => {
    const [wet] = await queryDb<{ id: string }>("select id from layouts where name = ?", [
      "Wet-weather layout",
    ]);
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    await page.goto(url(`/layouts/${wet.id}/edit`));
    await page.getByText("Marshal points: warnings and suggestions").click();
    const warnings = page.getByRole("list", { name: "Marshal point warnings" });
    await warnings.getByText(/M2 · Inside a zone/).waitFor();
    expect(await warnings.getByRole("button", { name: "Move M2 to the nearby safe spot" }).count()).toBe(1);
    // the zones are drawn hatched under the track, the hotspots over it, with their key
    const count = (name: string) =>
      page.evaluate(
        (n) =>
          (window as unknown as { Konva: { stages: { find(s: string): unknown[] }[] } }).Konva.stages[0].find(
            n,
          ).length,
        name,
      );
    const zonesTick = page.getByRole("checkbox", { name: /Show marshal zones/ });
    expect(await zonesTick.isChecked()).toBe(true);
    await page.waitForFunction(
      () =>
        (window as unknown as { Konva: { stages: { find(s: string): unknown[] }[] } }).Konva.stages[0].find(
          ".marshal-zone",
        ).length > 0,
    );
    const zones = await count(".marshal-zone");
    expect(zones).toBeGreaterThan(0);
    expect(await count(".marshal-hotspot")).toBeGreaterThan(0);
    await page.getByTestId("zone-key").getByText("Overshoot and run-off zones").waitFor();
    const zonesLayerDrawn = await page.evaluate(() => {
      type L = { name(): string; getParent(): unknown; isVisible(): boolean; getChildren(): unknown[] };
      const stage = (window as unknown as { Konva: { stages: { getLayers(): L[] }[] } }).Konva.stages[0];
      const layers = stage.getLayers();
      const zonesAt = layers.findIndex((l) => l.name() === "marshal-zones-layer");
      return { zonesAt, children: layers[zonesAt]?.getChildren().length ?? 0 };
    });
    // under the track: the layer right after the grid and photo
    expect(zonesLayerDrawn).toEqual({ zonesAt: 1, children: zones });
    await page.getByTestId("plan-canvas").screenshot({
      path: `${SCREENSHOT_DIR}/risk-sheet-05-editor-zones.png`,
    });
    await zonesTick.uncheck();
    await page.waitForFunction(
      () =>
        (window as unknown as { Konva: { stages: { find(s: string): unknown[] }[] } }).Konva.stages[0].find(
          ".marshal-zone",
        ).length === 0,
    );
    expect(await count(".marshal-hotspot")).toBe(0);
    expect(await page.getByTestId("zone-key").count()).toBe(0);
    await zonesTick.check();
    await page.waitForFunction(
      (n) =>
        (window as unknown as { Konva: { stages: { find(s: string): unknown[] }[] } }).Konva.stages[0].find(
          ".marshal-zone",
        ).length === n,
      zones,
    );
    await page.getByRole("button", { name: "Suggest marshal points" }).click();
    await page.getByText(/^10 suggested points placed/).waitFor();
    await page
      .getByRole("heading", { name: "Marshal points (10)", includeHidden: true })
      .waitFor({ state: "attached" });
    await screenshot(page, "risk-sheet-04-editor-suggested");
    await page.getByRole("button", { name: "Undo", exact: true }).click();
    await page
      .getByRole("heading", { name: "Marshal points (5)", includeHidden: true })
      .waitFor({ state: "attached" });
  });
});
