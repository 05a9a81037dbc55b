/**
 * Fixtures of the browser tests: Debian's chromium driven by playwright-core (never a downloaded
 * browser), a fresh browser context per test, `login()` and screenshots.
 */
import fs from "node:fs";
import path from "node:path";
import { createClient, type InValue } from "@libsql/client";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { afterAll, afterEach, beforeAll, expect, inject } from "vitest";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import type { Role } from "~/lib/roles";

export const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
];
export const SCREENSHOT_DIR = path.resolve("test-results/screenshots");
const FAILURE_DIR = path.resolve("test-results/failures");
export const DEMO_CLUB = "Kestrel Valley Off-Road Club";

export type Account = { email: string; password: string; name: string; role: Role };

/** The demo account of a role (from the demo data the harness loaded). */
export function demoAccount(role: Role): Account {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role);
  if (!account) throw new Error(`no demo account with the role ${role}`);
  return account;
}

/** The app's address for a path. */
export function url(pathname = "/"): string {
  return new URL(pathname, inject("baseUrl")).toString();
}

/**
 * Opens one browser for the test file and a fresh context (no cookies) for each `newPage()`.
 * Contexts are closed after each test.
 */
export function useBrowser() {
  let browser: Browser | undefined;
  const contexts: BrowserContext[] = [];
  beforeAll(async () => {
    browser = await chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS, headless: true });
  });
  afterEach(async (ctx) => {
    // A failed test leaves a picture of every page it had open, to see what the browser saw.
    if (ctx.task.result?.state === "fail") {
      const name = ctx.task.name.replace(/[^a-z0-9]+/gi, "-").slice(0, 60);
      const pages = contexts.flatMap((c) => c.pages());
      fs.mkdirSync(FAILURE_DIR, { recursive: true });
      for (const [i, page] of pages.entries()) {
        await page
          .screenshot({ path: path.join(FAILURE_DIR, `${name}-${i + 1}.png`), fullPage: true })
          .catch(() => {});
      }
    }
    await Promise.all(contexts.splice(0).map((c) => c.close()));
  });
  afterAll(async () => {
    await browser?.close();
  });
  return {
    /**
     * A page in a new signed-out context; the viewport defaults to a laptop screen.
     * `javaScriptEnabled: false` reads the pages as a browser without scripts would.
     */
    async newPage(
      viewport = { width: 1280, height: 900 },
      options: { javaScriptEnabled?: boolean } = {},
    ): Promise<Page> {
      if (!browser) throw new Error("the browser did not start");
      const context = await browser.newContext({ viewport, baseURL: inject("baseUrl"), ...options });
      context.setDefaultTimeout(15_000);
      contexts.push(context);
      return context.newPage();
    },
  };
}

/** Signs in through the sign-in form and waits until the app has left the sign-in page. */
export async function login(page: Page, account: Pick<Account, "email" | "password">): Promise<void> {
  await page.goto(url("/sign-in"));
  await page.getByLabel("E-mail address").fill(account.email);
  await page.getByLabel("Password", { exact: true }).fill(account.password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
  await expect.poll(() => page.getByRole("button", { name: "Sign out" }).count()).toBe(1);
}

/** Saves a full-page screenshot to test-results/screenshots/<name>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const file = path.join(SCREENSHOT_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/**
 * Opens the outbox page and follows the link in the newest message to `to` whose subject matches;
 * returns the link's address. Polls for a few seconds because delivery through SMTP is asynchronous.
 */
export async function followMailLink(page: Page, to: string, subject: RegExp, link: RegExp): Promise<string> {
  await expect
    .poll(
      async () => {
        await page.goto(url("/outbox"));
        return page.getByRole("article").filter({ hasText: to }).filter({ hasText: subject }).count();
      },
      { timeout: 10_000, interval: 300 },
    )
    .toBeGreaterThan(0);
  const message = page.getByRole("article").filter({ hasText: to }).filter({ hasText: subject }).first();
  const anchor = message.getByRole("link", { name: link }).first();
  const href = (await anchor.getAttribute("href")) ?? "";
  await anchor.click();
  return href;
}

/** Rows from the app's database of this run (read-only use: ids the pages do not show). */
export async function queryDb<T>(sql: string, args: InValue[] = []): Promise<T[]> {
  const client = createClient({ url: `file:${path.join(inject("dataDir"), "loftline.db")}` });
  try {
    return (await client.execute({ sql, args })).rows as unknown as T[];
  } finally {
    client.close();
  }
}

/** True when the page is wider than the viewport (the reader would have to scroll sideways). */
export async function scrollsSideways(page: Page): Promise<boolean> {
  return page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth);
}
