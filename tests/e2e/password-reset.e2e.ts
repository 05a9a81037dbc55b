import { describe, expect, it } from "vitest";
import { DEMO_EXTRA_MEMBERS } from "~/db/demo-data.server";
import { followMailLink, login, screenshot, url, useBrowser } from "./fixtures";

const browser = useBrowser();

describe("password reset by e-mail", () => {
  it("a member asks for a link, follows it from the outbox, sets a new password and signs in with it", async () => {
    // An extra demo member, so that the demo accounts other tests sign in with keep their passwords.
    const member = DEMO_EXTRA_MEMBERS.find((m) => m.role === "driver")!;
    const newPassword = "new and long enough";

    const page = await browser.newPage();
    await page.goto(url("/sign-in"));
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    // Wait for the new page: until it arrives, the sign-in page's own e-mail field is still there.
    await page.getByRole("heading", { name: "Reset your password" }).waitFor();
    await page.getByLabel("E-mail address").fill(member.email);
    await page.getByRole("button", { name: "Send the link" }).click();
    await page.getByRole("heading", { name: "Check your e-mail" }).waitFor();

    await followMailLink(page, member.email, /Reset your Loftline password/, /\/reset-password\//);
    await page.getByLabel("New password", { exact: true }).fill(newPassword);
    await page.getByLabel("New password again").fill(newPassword);
    await screenshot(page, "09-reset-password");
    const resetUrl = page.url();
    expect(resetUrl).toContain("/reset-password/");
    await page.getByRole("button", { name: "Save the new password" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/reset-password"));

    await page.context().clearCookies();
    await login(page, { email: member.email, password: newPassword });
    expect(new URL(page.url()).pathname).toBe("/clubs");

    // The same link does not work twice.
    await page.context().clearCookies();
    const again = await page.goto(resetUrl);
    expect(again?.status()).toBeGreaterThanOrEqual(400);
    expect(await page.getByRole("heading", { name: "This link cannot be used" }).count()).toBe(1);
    expect(await page.getByRole("button", { name: "Save the new password" }).count()).toBe(0);
  });
});
