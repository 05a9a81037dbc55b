/**
 * Race day in the browser: a director publishes a layout version with a race date; while the
 * director saves new draft versions in the editor, the driver's page (on a phone) keeps showing
 * the published version; publishing again moves the driver on, and the earlier version stays
 * readable at its address. A share link opens the plan signed out.
 */
import { randomUUID } from "node:crypto";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { DEMO_CLUB, demoAccount, login, queryDb, screenshot, url, useBrowser } from "./fixtures";

const browser = useBrowser();

async function createLayout(name: string): Promise<string> {
  const [club] = await queryDb<{ id: string }>("select id from clubs where name = ?", [DEMO_CLUB]);
  const [user] = await queryDb<{ id: string }>("select id from users where email = ?", [
    demoAccount("director").email,
  ]);
  const id = randomUUID();
  await queryDb(
    "insert into layouts (id, club_id, name, surface, track_width, status, version, created_by) values (?, ?, ?, ?, ?, 'draft', 1, ?)",
    [id, club.id, name, SUMMER_LAYOUT.surface, SUMMER_LAYOUT.trackWidth, user.id],
  );
  await queryDb(
    "insert into layout_versions (id, layout_id, number, document, created_by) values (?, ?, 1, ?, ?)",
    [randomUUID(), id, JSON.stringify({ ...SUMMER_LAYOUT, name }), user.id],
  );
  return id;
}

/** Saves the editor after setting the first straight's length; waits for "Saved as version n". */
async function saveLongerStart(page: Page, id: string, length: number, version: number) {
  await page.goto(url(`/layouts/${id}/edit`));
  await page.waitForFunction(
    () => (window as unknown as { Konva?: { stages: unknown[] } }).Konva?.stages.length === 1,
  );
  await page.getByRole("list", { name: "Sections in lap order" }).getByRole("button").first().click();
  const field = page.getByLabel("Length (m)", { exact: false }).first();
  await field.fill(String(length));
  await field.blur();
  await page.getByRole("button", { name: "Save", exact: true }).click();
  await expect
    .poll(() => page.getByTestId("save-status").textContent())
    .toMatch(new RegExp(`version ${version}`, "i"));
}

async function publish(page: Page, id: string, raceDate: string, note: string) {
  await page.goto(url(`/layouts/${id}/publishing`));
  await page.getByLabel("Race date").fill(raceDate);
  await page.getByLabel("Note for the members (optional)").fill(note);
  await page.getByRole("button", { name: /^Publish version \d+ for race day$/ }).click();
  await page.getByText(/is published for race day .* E-mailed \d+ member\(s\)\./).waitFor();
}

const banner = (page: Page) => page.getByTestId("version-banner");

describe("publishing for race day", () => {
  it("keeps the published version fixed for a driver while the director saves new drafts", async () => {
    const name = `Race day ${Date.now()}`;
    const id = await createLayout(name);
    const raceDate = new Date(Date.now() + 14 * 86400_000).toISOString().slice(0, 10);
    const director = await browser.newPage();
    await login(director, demoAccount("director"));
    await publish(director, id, raceDate, "Practice from 09:00.");
    await screenshot(director, "30-publishing-director");

    const driver = await browser.newPage({ width: 390, height: 844 });
    await login(driver, demoAccount("driver"));
    await driver.goto(url(`/layouts/${id}`));
    await expect.poll(() => banner(driver).textContent()).toMatch(/Race-day version 1/);
    expect(await banner(driver).textContent()).toContain("Practice from 09:00.");
    const lap = async () =>
      (await (await driver.request.get(url(`/api/layouts/${id}/analysis?class=buggy-2wd-10`))).json()) as {
        readVersion: number;
        analysis: { lapLength: number };
      };
    const published = await lap();
    expect(published.readVersion).toBe(1);

    // The director saves twice in the editor: the driver still reads version 1.
    await saveLongerStart(director, id, 34, 2);
    await saveLongerStart(director, id, 44, 3);
    expect(await director.getByTestId("draft-note").textContent()).toMatch(
      /Saves go to the working draft\. Drivers and marshals keep reading race-day version 1/,
    );
    await screenshot(director, "30-editor-draft-note");
    await driver.reload();
    await expect.poll(() => banner(driver).textContent()).toMatch(/Race-day version 1/);
    const after = await lap();
    expect([after.readVersion, after.analysis]).toEqual([1, published.analysis]);
    expect((await driver.goto(url(`/layouts/${id}?version=3`)))?.status()).toBe(404);
    await driver.goto(url(`/layouts/${id}`));
    await screenshot(driver, "31-driver-published-version-phone");
    await director.goto(url(`/layouts/${id}`));
    await expect.poll(() => banner(director).textContent()).toMatch(/Working draft \(saved version 3\)/);

    // Publishing again moves the driver on; version 1 stays readable at its address.
    await publish(director, id, raceDate, "Longer start straight.");
    await driver.goto(url(`/layouts/${id}`));
    await expect.poll(() => banner(driver).textContent()).toMatch(/Race-day version 3/);
    expect((await lap()).analysis.lapLength).toBeCloseTo(published.analysis.lapLength + 20, 1);
    await driver.goto(url(`/layouts/${id}?version=1`));
    await expect
      .poll(() => banner(driver).textContent())
      .toMatch(/Published version 1.*race-day version is now\s*version 3/);

    // Comparing the two published versions: one section changed, drawn and listed.
    await driver.goto(url(`/layouts/${id}/compare?from=1&to=3`));
    await driver
      .getByRole("heading", { name: /From version 1 to version 3: 0 added, 0 removed, 1 changed/ })
      .waitFor();
    expect(await driver.getByRole("list", { name: "Changed sections" }).textContent()).toMatch(
      /length 24 m → 44 m/,
    );
    await screenshot(driver, "34-compare-versions-phone");

    // A share link opens the race-day version signed out.
    await director.goto(url(`/layouts/${id}/publishing`));
    await director.getByTestId("publication-3").getByRole("button", { name: "Create a share link" }).click();
    const link = await director.getByLabel("Address to share").inputValue();
    const visitor = await browser.newPage({ width: 390, height: 844 });
    await visitor.goto(link);
    await visitor.getByRole("heading", { level: 1, name }).waitFor();
    expect(await visitor.locator('meta[name="robots"]').getAttribute("content")).toBe("noindex, nofollow");
    expect(await visitor.getByRole("button", { name: "Sign out" }).count()).toBe(0);
    const jumps = visitor.getByRole("list", { name: "Jumps in lap order" });
    expect(await jumps.getByText(/^(Set up in the air|Take it straight|Cannot clear)$/).count()).toBe(9);
    await screenshot(visitor, "32-share-link-signed-out");
  });

  it("lets a driver keep an own car profile and read the layout, a jump and the plan for it, switching without a reload", async () => {
    const [summer] = await queryDb<{ id: string }>("select id from layouts where name = ?", [
      "Summer layout",
    ]);
    const page = await browser.newPage({ width: 390, height: 844 });
    await login(page, demoAccount("driver"));
    await page.goto(url("/profiles"));
    await page.getByRole("button", { name: "Start a profile" }).click();
    await page.getByLabel("Name").fill("Dee's buggy");
    await page.getByLabel(/^Mass/).fill("1.75");
    await page.getByRole("button", { name: "Save the profile" }).click();
    await page.getByText("Dee's buggy is saved.").waitFor();
    expect(await page.getByText("estimate", { exact: true }).count()).toBe(21);
    // A bad value is named beside its field and nothing typed is lost.
    await page.getByLabel(/^Mass/).fill("heavy");
    await page.getByRole("button", { name: "Save changes" }).click();
    await page.getByText("Mass must be a number (kg).").waitFor();
    expect(await page.getByLabel(/^Mass/).inputValue()).toBe("heavy");
    await screenshot(page, "33-car-profile-phone");

    await page.goto(url(`/layouts/${summer.id}`));
    await page.evaluate(() => ((window as unknown as { stayed: boolean }).stayed = true));
    await page.getByLabel("Car", { exact: true }).selectOption({ label: "Dee's buggy" });
    await page.waitForURL(/car=profile%3A/);
    await page.getByText(/For your car\s*Dee's buggy/).waitFor();
    expect(await page.evaluate(() => (window as unknown as { stayed?: boolean }).stayed)).toBe(true);
    // The choice is remembered: the jump page and the plan open with it.
    await page.goto(url(`/layouts/${summer.id}/jumps/first-double`));
    await page.getByText(/Dee's buggy · verdicts for/).waitFor();
    await page.goto(url(`/layouts/${summer.id}/plan`));
    await expect.poll(() => page.getByLabel("Car", { exact: true }).inputValue()).toMatch(/^profile:/);
    await page.getByText(/For your car\s*Dee's buggy/).waitFor();
    // Back to the class, so other tests see the demo driver as before.
    await page.goto(url(`/layouts/${summer.id}?car=buggy-2wd-10&skill=club`));
  });
});
