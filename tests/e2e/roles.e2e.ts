import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import type { Role } from "~/lib/roles";
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

const ROLE_LABEL: Record<Role, string> = { director: "Race director", marshal: "Marshal", driver: "Driver" };

async function layoutIds() {
  const rows = await queryDb<{ id: string; name: string }>("select id, name from layouts");
  const byName = Object.fromEntries(rows.map((r) => [r.name, r.id]));
  return { summer: byName["Summer layout"], wet: byName["Wet-weather layout"] };
}

async function clubId() {
  const [row] = await queryDb<{ id: string }>("select id from clubs where name = ?", [DEMO_CLUB]);
  return row.id;
}

/** Signs in as the role's demo account and opens the demo club from the clubs page. */
async function openClub(page: Page, role: Role) {
  await login(page, demoAccount(role));
  expect(new URL(page.url()).pathname).toBe("/clubs");
  const row = page.getByRole("listitem").filter({ has: page.getByRole("link", { name: DEMO_CLUB }) });
  expect(await row.textContent()).toContain(ROLE_LABEL[role]);
  if (role === "director") await screenshot(page, "03-clubs");
  await row.getByRole("link", { name: DEMO_CLUB }).click();
  await page.getByRole("heading", { level: 1, name: DEMO_CLUB, exact: true }).waitFor();
}

describe("what each demo role sees", () => {
  it("a race director sees draft and published layouts and every management control", async () => {
    const page = await browser.newPage();
    await openClub(page, "director");
    const main = page.getByRole("main");
    expect(await main.getByRole("link", { name: "Summer layout" }).count()).toBe(1);
    expect(await main.getByRole("link", { name: "Wet-weather layout" }).count()).toBe(1);
    expect(await main.getByRole("link", { name: "New layout" }).count()).toBe(1);
    await screenshot(page, "04-club-layouts-director");

    await page.getByRole("navigation", { name: "Club" }).getByRole("link", { name: "Members" }).click();
    await page.getByRole("table").waitFor();
    expect(await page.getByRole("columnheader", { name: /E-mail/ }).count()).toBe(1);
    expect(await page.getByRole("button", { name: "Set role" }).count()).toBeGreaterThanOrEqual(3);
    expect(await page.getByRole("heading", { name: "Invite someone" }).count()).toBe(1);
    expect(await page.getByRole("cell", { name: "dee@kestrel.example" }).count()).toBe(1);
    await screenshot(page, "05-members-director");

    const { wet } = await layoutIds();
    await page.goto(url(`/layouts/${wet}`));
    expect(await page.getByRole("heading", { level: 1, name: "Wet-weather layout" }).count()).toBe(1);
    expect(await page.getByRole("link", { name: "Publish for race day, withdraw or share" }).count()).toBe(1);
    expect(await page.getByRole("button", { name: "Delete the layout" }).count()).toBe(1);
    await screenshot(page, "06-layout-director");
  });

  for (const role of ["marshal", "driver"] as const) {
    it(`a ${role} sees only the published layout and no management controls`, async () => {
      const page = await browser.newPage();
      await openClub(page, role);
      const main = page.getByRole("main");
      expect(await main.getByRole("link", { name: "Summer layout" }).count()).toBe(1);
      expect(await main.getByRole("link", { name: "Wet-weather layout" }).count()).toBe(0);
      expect(await main.getByRole("link", { name: "New layout" }).count()).toBe(0);
      await screenshot(page, `04-club-layouts-${role}`);

      await page.getByRole("navigation", { name: "Club" }).getByRole("link", { name: "Members" }).click();
      await page.getByRole("table").waitFor();
      expect(await page.getByRole("cell", { name: "Dana Whitlock" }).count()).toBe(1);
      expect(await page.getByRole("columnheader", { name: /E-mail/ }).count()).toBe(0);
      expect(await page.getByRole("button", { name: "Set role" }).count()).toBe(0);
      expect(await page.getByRole("heading", { name: "Invite someone" }).count()).toBe(0);
      await screenshot(page, `05-members-${role}`);

      await main
        .getByRole("navigation", { name: "Club" })
        .getByRole("link", { name: "Layouts", exact: true })
        .click();
      await main.getByRole("link", { name: "Summer layout" }).click();
      await page.getByRole("heading", { level: 1, name: "Summer layout" }).waitFor();
      expect(await page.getByRole("button", { name: "Save details" }).count()).toBe(0);
      expect(await page.getByRole("button", { name: "Delete the layout" }).count()).toBe(0);
      await screenshot(page, `06-layout-${role}`);

      // The draft does not exist for them, and the director's pages answer 403.
      const { wet } = await layoutIds();
      expect((await page.goto(url(`/layouts/${wet}`)))?.status()).toBe(404);
      const forbidden = await page.goto(url(`/clubs/${await clubId()}/layouts/new`));
      expect(forbidden?.status()).toBe(403);
      expect(await page.getByRole("heading", { name: "Not allowed" }).count()).toBe(1);
      if (role === "marshal") await screenshot(page, "10-forbidden");
    });
  }

  it("a signed-out visitor is sent to sign in from a club page", async () => {
    const page = await browser.newPage();
    await page.goto(url(`/clubs/${await clubId()}`));
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    const demo = page.getByRole("region", { name: "Demo accounts" });
    for (const role of ["director", "marshal", "driver"] as const) {
      expect(await demo.textContent()).toContain(demoAccount(role).email);
    }
    await screenshot(page, "02-sign-in");
  });

  it("reading pages fit a phone screen", async () => {
    const page = await browser.newPage({ width: 375, height: 740 });
    await openClub(page, "driver");
    expect(await scrollsSideways(page)).toBe(false);
    await page.getByRole("link", { name: "Summer layout" }).click();
    await page.getByRole("heading", { level: 1, name: "Summer layout" }).waitFor();
    expect(await scrollsSideways(page)).toBe(false);
    await screenshot(page, "06-layout-driver-phone");
    await page.goto(url(`/clubs/${await clubId()}/members`));
    expect(await scrollsSideways(page)).toBe(false);
    await screenshot(page, "05-members-driver-phone");
  });
});
