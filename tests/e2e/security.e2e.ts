import type { ConsoleMessage, Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { DEMO_EXTRA_MEMBERS } from "~/db/demo-data.server";
import { demoAccount, followMailLink, login, queryDb, url, useBrowser } from "./fixtures";

const browser = useBrowser();

/** Collects what the browser says about blocked content and script errors. */
function watchForViolations(page: Page): string[] {
  const problems: string[] = [];
  page.on("console", (m: ConsoleMessage) => {
    if (/Content Security Policy|Refused to (execute|load|apply|connect|frame)/i.test(m.text())) {
      problems.push(m.text());
    }
  });
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  return problems;
}

describe("the Content-Security-Policy", () => {
  it("lets the pages run their scripts: sign-in, clubs, a layout's analysis and the editor", async () => {
    const page = await browser.newPage();
    const problems = watchForViolations(page);
    await login(page, demoAccount("director"));
    const [layout] = await queryDb<{ id: string }>("select id from layouts where name = 'Summer layout'");
    await page.goto(url(`/layouts/${layout.id}`));
    await page.getByRole("heading", { level: 1 }).waitFor();
    await page.goto(url(`/layouts/${layout.id}/edit`));
    // The drawing is a canvas made by the browser's script (client-only): it exists only if the
    // page's scripts ran under the policy.
    await page.locator("canvas").first().waitFor({ timeout: 20_000 });
    // A client-side navigation (the router's own fetch) works too.
    await page.goto(url("/clubs"));
    await page.getByRole("link", { name: "Kestrel Valley Off-Road Club" }).first().click();
    await page.waitForURL(/\/clubs\/[^/]+$/);
    expect(problems).toEqual([]);
  });
});

describe("a token page without JavaScript", () => {
  it("posts its own form (Origin null under no-referrer) and the new password works", async () => {
    const member = DEMO_EXTRA_MEMBERS.find((m) => m.email.startsWith("sofia"))!;
    // A context of its own with scripts off (the fixture's contexts keep them on).
    const chromium = (await browser.newPage()).context().browser()!;
    const context = await chromium.newContext({ javaScriptEnabled: false, baseURL: url("/") });
    const noScript = await context.newPage();
    try {
      await noScript.goto(url("/forgot-password"));
      await noScript.getByLabel("E-mail address").fill(member.email);
      await noScript.getByRole("button", { name: "Send the link" }).click();
      await noScript.getByRole("heading", { name: "Check your e-mail" }).waitFor();
      await followMailLink(noScript, member.email, /Reset your Loftline password/, /\/reset-password\//);
      await noScript
        .getByRole("heading", { name: /new password/i })
        .first()
        .waitFor();
      const sent: Promise<string | undefined>[] = [];
      noScript.on("request", (r) => {
        if (r.method() === "POST") sent.push(r.allHeaders().then((h) => h["origin"]));
      });
      await noScript.getByLabel("New password", { exact: true }).fill("a new long password");
      await noScript.getByLabel("New password again").fill("a new long password");
      await noScript.getByRole("button", { name: "Save the new password" }).click();
      await noScript.waitForURL((u) => !u.pathname.startsWith("/reset-password"));
      expect(await Promise.all(sent)).toEqual(["null"]);
      expect(new URL(noScript.url()).pathname).toBe("/clubs");
    } finally {
      await context.close();
    }
    const again = await browser.newPage();
    await login(again, { email: member.email, password: "a new long password" });
  });
});
