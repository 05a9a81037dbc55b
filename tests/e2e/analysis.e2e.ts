import { describe, expect, it } from "vitest";
import {
  DEMO_CLUB,
  demoAccount,
  login,
  queryDb,
  screenshot,
  scrollsSideways,
  url,
  useBrowser,
} from "./fixtures";

const browser = useBrowser();

async function summerId(): Promise<string> {
  const [row] = await queryDb<{ id: string }>("select id from layouts where name = ?", ["Summer layout"]);
  return row.id;
}

describe("layout analysis in the browser", () => {
  it("shows the director the summer layout's summary, rule checks, plan and jumps, and a jump page", async () => {
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    await page.getByRole("link", { name: DEMO_CLUB }).click();
    await page.getByRole("main").getByRole("link", { name: "Summer layout" }).click();
    await page.getByRole("heading", { name: "Analysis", exact: true }).waitFor();

    const main = page.getByRole("main");
    expect(
      await main
        .getByRole("term")
        .filter({ hasText: /^Lap length$/ })
        .count(),
    ).toBe(1);
    expect(await main.getByRole("link", { name: "Edit the drawing" }).count()).toBe(1);
    expect(await main.getByRole("heading", { name: "Safety around the track" }).count()).toBe(1);
    const rules = main.getByRole("table").filter({ has: page.getByRole("columnheader", { name: "Source" }) });
    expect(await rules.getByRole("row").count()).toBe(10); // a heading row and nine rules
    const results = await rules.locator("tbody tr td:nth-child(4)").allTextContents();
    expect(results).toHaveLength(9);
    for (const r of results) expect(r).toMatch(/(Pass|Fail|Not checked)$/);
    expect(await main.getByText(/sanctioning body's current rulebook decides/).count()).toBeGreaterThan(0);

    const jumps = main
      .getByRole("table")
      .filter({ has: page.getByRole("columnheader", { name: /Airtime/ }) });
    expect(await jumps.getByRole("row").count()).toBe(10); // nine jumps
    expect(await jumps.getByText(/^(Set up in the air|Take it straight|Cannot clear)$/).count()).toBe(9);
    expect(await main.getByRole("group", { name: /plan drawn to scale, 9 jumps marked/ }).count()).toBe(1);
    await screenshot(page, "analysis-01-layout-page-director");

    // Sort by airtime (a plain link: the table is sorted on the server).
    await jumps.getByRole("link", { name: /Airtime/ }).click();
    await page.waitForURL(/sort=airtime&dir=asc/);
    const airtimeHeader = page.getByRole("columnheader", { name: /Airtime/ });
    await expect.poll(() => airtimeHeader.getAttribute("aria-sort")).toBe("ascending");
    const airtimes = await page
      .getByRole("table")
      .filter({ has: airtimeHeader })
      .locator("tbody tr td:nth-child(5)")
      .allTextContents();
    const values = airtimes.map((t) => Number.parseFloat(t));
    expect(values).toEqual([...values].sort((a, b) => a - b));

    // Pick the expert verdicts and open the first double's page.
    await page.getByLabel("Driver skill").selectOption("expert");
    await page.waitForURL(/skill=expert/);
    await page.getByRole("link", { name: "First double", exact: true }).click();
    await page.getByRole("heading", { level: 1, name: /First double/ }).waitFor();
    expect(
      await page.getByRole("img", { name: /Side elevation of First double, drawn to scale/ }).count(),
    ).toBe(1);
    expect(await page.getByRole("heading", { name: "Verdict per skill level" }).count()).toBe(1);
    expect(await page.getByRole("heading", { name: "Safety around the track" }).count()).toBe(1);
    expect(await page.getByText("Equivalent fall height (EFH)").count()).toBe(1);
    expect(await page.getByRole("heading", { name: "Mid-air set-up plan" }).count()).toBe(1);
    await screenshot(page, "analysis-02-jump-page-expert");
  });

  it("shows a driver the published layout's analysis without the director's tools, on a phone too", async () => {
    const page = await browser.newPage({ width: 390, height: 844 });
    await login(page, demoAccount("driver"));
    const id = await summerId();
    await page.goto(url(`/layouts/${id}`));
    await page.getByRole("heading", { name: "Analysis", exact: true }).waitFor();
    const main = page.getByRole("main");
    expect(await main.getByRole("link", { name: "Edit the drawing" }).count()).toBe(0);
    expect(await main.getByRole("link", { name: "Open the plan" }).count()).toBe(1);
    // One card per jump with its verdict (on a phone the cards stand for the table).
    const cards = main.getByRole("list", { name: "Jumps in lap order" });
    expect(await cards.getByText(/^(Set up in the air|Take it straight|Cannot clear)$/).count()).toBe(9);
    expect(await scrollsSideways(page)).toBe(false);
    await screenshot(page, "analysis-03-layout-page-driver-phone");

    const exported = await page.request.get(url(`/layouts/${id}/export`));
    expect(exported.status()).toBe(200);
    expect(exported.headers()["content-disposition"]).toMatch(/summer-layout-v\d+\.loftline\.json/);
    expect((await exported.json()).name).toBe("Summer layout");
    const api = await page.request.get(url(`/api/layouts/${id}/analysis?class=buggy-2wd-10&skill=novice`));
    expect(api.status()).toBe(200);
    expect((await api.json()).analysis.classes[0].jumps).toHaveLength(9);
  });
});
