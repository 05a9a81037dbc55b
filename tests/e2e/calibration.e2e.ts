/**
 * Calibration in the browser: a driver uploads the demo's invented lap file for the summer layout
 * and sees the laps beside the model's, as a chart (drawn in the browser) and a table.
 */
import path from "node:path";
import { describe, expect, it } from "vitest";
import { demoAccount, login, queryDb, screenshot, url, useBrowser } from "./fixtures";

const browser = useBrowser();

describe("calibration from measured laps", () => {
  it("shows a driver's uploaded laps beside the model's, with the crashed lap left out", async () => {
    const [row] = await queryDb<{ id: string }>("select id from layouts where name = ?", ["Summer layout"]);
    const page = await browser.newPage();
    await login(page, demoAccount("driver"));
    await page.goto(url(`/layouts/${row.id}`));
    await page.getByRole("link", { name: "Calibrate a car from your laps" }).click();
    await page.getByRole("heading", { name: "Calibrate from your laps" }).waitFor();
    await page.getByLabel("Car").selectOption("buggy-2wd-10");
    await page
      .getByLabel("Lap file (.csv)", { exact: true })
      .setInputFiles(path.resolve("docs/examples/summer-layout-laps.csv"));
    await page.getByRole("button", { name: "Compare with the model" }).click();
    await page.getByRole("heading", { name: "Measured and modelled laps" }).waitFor();
    const main = page.getByRole("main");
    expect(
      await main.getByText(/Top speed and grip are fitted separately, from the sector times/).count(),
    ).toBe(1);
    expect(await main.getByText(/lap 9 \(53\.83 s, line 10\)/).count()).toBe(1);
    const laps = main.getByRole("table").filter({ hasText: "13 laps" });
    expect(await laps.locator("tbody tr").count()).toBe(13);
    await page.locator(".recharts-surface").first().waitFor();
    expect(await page.locator(".recharts-line").count()).toBe(3);
    expect(await main.getByRole("button", { name: "Save as a new profile" }).count()).toBe(1);
    await screenshot(page, "calibration");
  });
});
