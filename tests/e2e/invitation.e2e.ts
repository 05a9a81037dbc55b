import { describe, expect, it } from "vitest";
import { DEMO_EXTRA_MEMBERS } from "~/db/demo-data.server";
import { DEMO_CLUB, demoAccount, followMailLink, screenshot, login, url, useBrowser } from "./fixtures";

const browser = useBrowser();

describe("invitation by e-mail", () => {
  it("a director invites a new address as marshal; the link in the outbox signs the person up into the club", async () => {
    const invitee = `newcomer-${Date.now()}@kestrel.example`;

    const director = await browser.newPage();
    await login(director, demoAccount("director"));
    await director.getByRole("link", { name: DEMO_CLUB }).click();
    await director.getByRole("navigation", { name: "Club" }).getByRole("link", { name: "Members" }).click();
    const invite = director.getByRole("region", { name: "Invite someone" });
    await invite.getByLabel("E-mail address").fill(invitee);
    await invite.getByLabel("Role").selectOption("marshal");
    await invite.getByRole("button", { name: "Send the invitation" }).click();
    await director
      .getByRole("status")
      .filter({ hasText: `Invitation sent to ${invitee}` })
      .waitFor();
    const waiting = director.getByRole("region", { name: "Invitations waiting" });
    expect(await waiting.textContent()).toContain(invitee);

    // The invited person, signed out, reads the message in the outbox and follows its link.
    const newcomer = await browser.newPage();
    const link = await followMailLink(newcomer, invitee, new RegExp(`Join ${DEMO_CLUB}`), /\/invitations\//);
    await newcomer.getByRole("heading", { level: 1, name: `Join ${DEMO_CLUB}` }).waitFor();
    expect(await newcomer.getByRole("main").textContent()).toMatch(/as a marshal/i);
    await screenshot(newcomer, "08-invitation");
    await newcomer.getByLabel("Your name").fill("Nell Marsh");
    await newcomer.getByLabel("Password", { exact: true }).fill("a long enough secret");
    await newcomer.getByLabel("Password again").fill("a long enough secret");
    await newcomer.getByRole("button", { name: "Create my account and join" }).click();

    await newcomer.getByRole("heading", { level: 1, name: DEMO_CLUB, exact: true }).waitFor();
    expect(new URL(newcomer.url()).pathname).toMatch(/^\/clubs\/[^/]+$/);
    expect(await newcomer.getByText("you are a marshal").count()).toBe(1);
    // A marshal sees the published layout only.
    expect(await newcomer.getByRole("link", { name: "Summer layout" }).count()).toBe(1);
    expect(await newcomer.getByRole("link", { name: "Wet-weather layout" }).count()).toBe(0);

    // The director's member list now has the newcomer as a marshal, and the invitation is used.
    await director.reload();
    const row = director.getByRole("row").filter({ hasText: "Nell Marsh" });
    expect(await row.getByRole("cell", { name: "Marshal", exact: true }).count()).toBe(1);
    expect(await director.getByRole("region", { name: "Invitations waiting" }).textContent()).not.toContain(
      invitee,
    );

    // The link works once only.
    await newcomer.context().clearCookies();
    const again = await newcomer.goto(url(link));
    expect(again?.status()).toBeGreaterThanOrEqual(400);
    expect(await newcomer.getByRole("button", { name: "Create my account and join" }).count()).toBe(0);
  });

  it("the outbox shows each message with its subject, recipient and clickable link", async () => {
    const page = await browser.newPage();
    const member = DEMO_EXTRA_MEMBERS.find((m) => m.role === "marshal")!;
    await page.goto(url("/forgot-password"));
    await page.getByLabel("E-mail address").fill(member.email);
    await page.getByRole("button", { name: "Send the link" }).click();
    await page.getByRole("heading", { name: "Check your e-mail" }).waitFor();

    // Other tests may have mailed this member already (a race-day publication goes to every
    // member): wait for the reset message itself, which is sent after the answer.
    const resets = () =>
      page
        .getByRole("article")
        .filter({ hasText: member.email })
        .filter({ has: page.getByRole("heading", { name: "Reset your Loftline password" }) });
    await expect
      .poll(async () => {
        await page.goto(url("/outbox"));
        return resets().count();
      })
      .toBeGreaterThan(0);
    expect(await page.getByRole("heading", { level: 1, name: "Outbox" }).count()).toBe(1);
    const message = resets().first();
    expect(await message.getByRole("heading", { name: "Reset your Loftline password" }).count()).toBe(1);
    expect(await message.getByRole("link", { name: /\/reset-password\// }).count()).toBe(1);
    await screenshot(page, "07-outbox");
  });
});
