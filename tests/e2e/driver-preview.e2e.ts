/**
 * The driver's preview on a phone (390 x 844) and on paper: the published demo layout opens with
 * its jumps as cards in lap order; switching to an own car and to expert fetches the new verdicts
 * without a reload (a marker on `window` survives) and works as a plain GET form without
 * JavaScript; no reader page scrolls sideways; the layout, jump, plan and driver's sheet print to
 * A4 with every jumps-table column and every jump number on the paper and no controls.
 */
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { JUMP_COLUMNS } from "~/components/analysis/jumps-table";
import {
  demoAccount,
  login,
  queryDb,
  screenshot,
  SCREENSHOT_DIR,
  scrollsSideways,
  url,
  useBrowser,
} from "./fixtures";

const browser = useBrowser();
const PHONE = { width: 390, height: 844 };

async function summer(): Promise<{ id: string; clubId: string }> {
  const [row] = await queryDb<{ id: string; club_id: string }>(
    "select id, club_id from layouts where name = ?",
    ["Summer layout"],
  );
  return { id: row.id, clubId: row.club_id };
}

/** Each card's verdict word and reason, "Take it straight: no turn at the landing". */
async function cardVerdicts(page: Page): Promise<string[]> {
  const cards = page.getByTestId("jump-card");
  const words = await cards.locator("p:nth-child(1)").allTextContents();
  const reasons = await cards.locator("p:nth-child(2)").allTextContents();
  return words.map((w, i) => `${w.replace(/^J\d+/, "").trim()}: ${reasons[i]}`);
}

type ApiVerdict = { verdict: string; reason: string; reasonText: string };

/** The same from the analysis API for a car and skill (the engine's answer, in lap order). */
async function apiVerdicts(page: Page, id: string, car: string, skill: string): Promise<string[]> {
  const res = await page.request.get(
    url(`/api/layouts/${id}/analysis?${new URLSearchParams({ car, skill })}`),
  );
  expect(res.status()).toBe(200);
  const body = (await res.json()) as {
    analysis: { classes: { jumps: { verdicts: Record<string, ApiVerdict> }[] }[] };
  };
  return body.analysis.classes[0].jumps.map(({ verdicts }) => {
    const v = verdicts[skill];
    const word =
      v.reason === "cannot-clear"
        ? "Cannot clear"
        : v.verdict === "set-up"
          ? "Set up in the air"
          : "Take it straight";
    return `${word}: ${v.reasonText}`;
  });
}

/** Prints the page to A4, keeps the PDF and its PNG pages, and returns the text and page count. */
async function printed(page: Page, name: string): Promise<{ text: string; pages: number }> {
  await page.emulateMedia({ media: "print" });
  const pdf = path.join(SCREENSHOT_DIR, `${name}.pdf`);
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  fs.writeFileSync(pdf, await page.pdf({ format: "A4", printBackground: true }));
  await page.emulateMedia({ media: "screen" });
  execFileSync("pdftoppm", ["-png", "-r", "60", pdf, pdf.slice(0, -4)]);
  const text = execFileSync("pdftotext", ["-layout", pdf, "-"]).toString();
  const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync("pdfinfo", [pdf]).toString())?.[1]);
  return { text, pages };
}

/** Every column of the jumps table and every jump number J1..Jn is on the paper; no controls. */
function expectSheetText(text: string, jumps: number, what: string) {
  const flat = text.replace(/\s+/g, " ");
  // A header may wrap inside its cell on paper: each of its words is in the table's head.
  const at = flat.indexOf("No.");
  expect(at, `${what}: the jumps table`).toBeGreaterThan(-1);
  const head = flat.slice(Math.max(0, at - 80), at + 120);
  for (const c of JUMP_COLUMNS)
    for (const word of c.label.split(" ")) expect(head, `${what}: column ${c.label}`).toContain(word);
  for (let n = 1; n <= jumps; n++) expect(text, `${what}: J${n}`).toMatch(new RegExp(`\\bJ${n}\\b`));
  expectNoControls(text, what);
}

function expectNoControls(text: string, what: string) {
  for (const control of ["Sign out", "Read all", "Driver skill", "Car classes (estimates)"])
    expect(text, `${what}: ${control}`).not.toContain(control);
  expect(text, `${what}: the Show button`).not.toMatch(/^\s*Show\s*$/m);
}

describe("the driver's preview", () => {
  it("shows a driver on a phone the jumps as cards and fetches a new car and skill without a reload", async () => {
    const { id, clubId } = await summer();
    const page = await browser.newPage(PHONE);
    await login(page, demoAccount("driver"));
    // An own car to switch to.
    await page.goto(url("/profiles"));
    await page.getByRole("button", { name: "Start a profile" }).click();
    await page.getByLabel("Name").fill("Phone preview buggy");
    await page.getByRole("button", { name: "Save the profile" }).click();
    await page.getByText("Phone preview buggy is saved.").waitFor();

    await page.goto(url(`/layouts/${id}?car=buggy-2wd-10&skill=club`));
    const cards = page.getByTestId("jump-card");
    await expect.poll(() => cards.count()).toBe(9);
    expect(await cards.first().textContent()).toMatch(
      /^J1\s*(Set up in the air|Take it straight|Cannot clear)/,
    );
    // The cards come before the summary: the first is on the first two screens.
    expect((await cards.first().boundingBox())!.y).toBeLessThan(2 * PHONE.height);
    expect(await scrollsSideways(page)).toBe(false);
    await screenshot(page, "driver-01-layout-phone");
    const club = await cardVerdicts(page);
    const clubCards = await cards.allTextContents();

    await page.evaluate(() => ((window as unknown as { stayed: boolean }).stayed = true));
    await page.getByLabel("Car", { exact: true }).selectOption({ label: "Phone preview buggy" });
    await page.waitForURL(/car=profile%3A/);
    await page.getByText(/For your car\s*Phone preview buggy/).waitFor();
    await page.getByLabel("Driver skill").selectOption("expert");
    await page.waitForURL(/skill=expert/);
    await page
      .getByText(/verdicts for an expert/i)
      .first()
      .waitFor();
    const expert = await cardVerdicts(page);
    const car = new URL(page.url()).searchParams.get("car")!;
    // The cards say what the engine says for that car and skill, and they changed.
    expect(expert).toEqual(await apiVerdicts(page, id, car, "expert"));
    expect(club).toEqual(await apiVerdicts(page, id, "buggy-2wd-10", "club"));
    expect(await cards.allTextContents()).not.toEqual(clubCards);
    expect(await page.evaluate(() => (window as unknown as { stayed?: boolean }).stayed)).toBe(true);
    await screenshot(page, "driver-02-layout-phone-own-car-expert");

    // The first card opens its jump page with the same verdict, at the same choice.
    await cards.first().click();
    await page.getByRole("heading", { level: 1, name: /^J1 / }).waitFor();
    await page.getByText(/Phone preview buggy · verdicts for an expert/).waitFor();
    expect(await page.getByRole("heading", { name: expert[0].split(":")[0], level: 2 }).count()).toBe(1);
    expect(await page.evaluate(() => (window as unknown as { stayed?: boolean }).stayed)).toBe(true);
    expect(await scrollsSideways(page)).toBe(false);
    await screenshot(page, "driver-03-jump-phone");

    // The plan: J and M numbers, cards, the same choice; no editor status line.
    await page.goto(url(`/layouts/${id}/plan`));
    await page.getByText(/For your car\s*Phone preview buggy, verdicts for an expert/i).waitFor();
    const plan = page.getByRole("group", { name: /plan drawn to scale, 9 jumps marked/ });
    for (const label of ["J1", "J9", "M1"])
      expect(
        await plan
          .locator("text")
          .filter({ hasText: new RegExp(`^${label}$`) })
          .count(),
        label,
      ).toBe(1);
    expect(await page.getByTestId("analysis-status").count()).toBe(0);
    expect(await scrollsSideways(page)).toBe(false);
    await screenshot(page, "driver-04-plan-phone");

    // Every other reader page fits the phone too.
    for (const pathname of [
      `/layouts/${id}/driver-sheet`,
      `/layouts/${id}/jumps/first-double`,
      `/layouts/${id}/compare`,
      `/profiles`,
      `/clubs/${clubId}`,
    ]) {
      const res = await page.goto(url(pathname));
      expect(res?.status(), pathname).toBeLessThan(500);
      expect(await scrollsSideways(page), pathname).toBe(false);
    }
    await screenshot(page, "driver-05-club-phone");
    await page.goto(url(`/layouts/${id}/driver-sheet`));
    await screenshot(page, "driver-06-sheet-phone");
    // Back to the class, so other tests see the demo driver as before.
    await page.goto(url(`/layouts/${id}?car=buggy-2wd-10&skill=club`));

    // The share link's pages, signed out.
    const director = await browser.newPage();
    await login(director, demoAccount("director"));
    await director.goto(url(`/layouts/${id}/publishing`));
    await director.getByRole("button", { name: "Create a share link" }).first().click();
    const link = await director.getByLabel("Address to share").inputValue();
    const visitor = await browser.newPage(PHONE);
    await visitor.goto(link);
    await expect.poll(() => visitor.getByTestId("jump-card").count()).toBe(9);
    expect(await scrollsSideways(visitor)).toBe(false);
    await visitor.getByTestId("jump-card").first().click();
    await visitor.getByRole("heading", { level: 1, name: /^J1 / }).waitFor();
    expect(await scrollsSideways(visitor)).toBe(false);
    await screenshot(visitor, "driver-07-shared-jump-phone");
  });

  it("switches car and skill as a plain GET form without JavaScript on the layout, jump and plan pages", async () => {
    const { id } = await summer();
    const page = await browser.newPage(PHONE, { javaScriptEnabled: false });
    await login(page, demoAccount("driver"));
    for (const pathname of [`/layouts/${id}`, `/layouts/${id}/jumps/first-double`, `/layouts/${id}/plan`]) {
      await page.goto(url(`${pathname}?car=buggy-2wd-10&skill=club`));
      await page.getByLabel("Driver skill").selectOption("expert");
      await page.getByRole("button", { name: "Show", exact: true }).click();
      await page.waitForURL(/skill=expert/);
      expect(await page.getByText(/verdicts for an expert/i).count(), pathname).toBeGreaterThan(0);
    }
    await page.goto(url(`/layouts/${id}?car=buggy-2wd-10&skill=club`));
  });

  it("prints the layout, a jump, the plan and the driver's sheet on A4 with every column and no controls", async () => {
    const { id } = await summer();
    const page = await browser.newPage();
    await login(page, demoAccount("driver"));
    const q = "?car=buggy-2wd-10&skill=club";
    await page.goto(url(`/layouts/${id}${q}`));
    await screenshot(page, "driver-08-layout-desktop");
    expectSheetText((await printed(page, "print-layout")).text, 9, "layout page");

    await page.goto(url(`/layouts/${id}/plan${q}`));
    await screenshot(page, "driver-09-plan-desktop");
    expectSheetText((await printed(page, "print-plan")).text, 9, "plan");

    await page.goto(url(`/layouts/${id}/driver-sheet${q}`));
    await screenshot(page, "driver-10-sheet-desktop");
    const sheet = await printed(page, "print-driver-sheet");
    expectSheetText(sheet.text, 9, "driver's sheet");
    expect(sheet.pages).toBe(1);
    expect(sheet.text).toMatch(/Driver's sheet: Summer layout/);
    expect(sheet.text).toMatch(/Safety around the track/);

    await page.goto(url(`/layouts/${id}/jumps/first-double${q}`));
    await screenshot(page, "driver-11-jump-desktop");
    const jump = (await printed(page, "print-jump")).text;
    for (const words of ["Side elevation and flight", "Verdict per skill level", "Mid-air set-up plan"])
      expect(jump).toContain(words);
    expect(jump).toMatch(/\bJ\d+ First double/);
    expectNoControls(jump, "jump page");
  });
});
