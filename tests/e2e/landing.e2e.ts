import { describe, expect, it } from "vitest";
import { demoAccount, login, screenshot, scrollsSideways, url, useBrowser } from "./fixtures";

const browser = useBrowser();

describe("landing page", () => {
  it("explains the product to a club, offers sign-up and sign-in, and shows the cautions", async () => {
    const page = await browser.newPage();
    const response = await page.goto(url("/"));
    expect(response?.status()).toBe(200);

    await expect.poll(() => page.title()).toMatch(/Loftline/);
    const heading = page.getByRole("heading", { level: 1 });
    expect(await heading.textContent()).toMatch(/fly every jump/i);
    for (const role of ["For the race director", "For the drivers", "For the marshals"]) {
      expect(await page.getByRole("heading", { name: role }).count()).toBe(1);
    }
    expect(await page.getByRole("img", { name: "Side view of a tabletop jump" }).count()).toBe(1);

    const main = page.getByRole("main");
    expect(await main.getByRole("link", { name: "Create an account" }).getAttribute("href")).toBe("/sign-up");
    expect(await main.getByRole("link", { name: "Sign in" }).getAttribute("href")).toBe("/sign-in");

    const cautions = page.getByRole("complementary", { name: "Safety around the track" });
    const text = (await cautions.textContent()) ?? "";
    expect(text).toContain("15 to 20 m/s");
    expect(text).toContain("overshoot zone");
    expect(text).toMatch(/eye protection/);
    expect(text).toMatch(/estimate, not a safety certification/);
    expect(text).toMatch(/sanctioning body/);

    await screenshot(page, "01-landing");
  });

  it("fits a phone screen without sideways scrolling", async () => {
    const page = await browser.newPage({ width: 375, height: 740 });
    await page.goto(url("/"));
    expect(await scrollsSideways(page)).toBe(false);
    await screenshot(page, "01-landing-phone");
  });

  it("sends a signed-in member on to their clubs instead of offering sign-up", async () => {
    const page = await browser.newPage();
    await login(page, demoAccount("driver"));
    await page.goto(url("/"));
    const main = page.getByRole("main");
    expect(await main.getByRole("link", { name: "Go to your clubs" }).getAttribute("href")).toBe("/clubs");
    expect(await main.getByRole("link", { name: "Create an account" }).count()).toBe(0);
  });

  it("answers an unknown address with the not-found page", async () => {
    const page = await browser.newPage();
    const response = await page.goto(url("/no-such-page"));
    expect(response?.status()).toBe(404);
    expect(await page.getByRole("heading", { name: "Not found" }).count()).toBe(1);
  });
});
