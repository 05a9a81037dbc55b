import { describe, expect, it } from "vitest";
import { escapeHtml, invitationMail, passwordResetMail } from "~/mail/templates.server";

describe("mail templates", () => {
  it("invitation: names the club, the inviter and the role, and carries the link in both parts", () => {
    const link = "http://localhost:3000/invitations/abc123";
    const m = invitationMail({
      clubName: "Kestrel Valley Off-Road Club",
      inviterName: "Dana Whitlock",
      role: "marshal",
      link,
    });
    expect(m.subject).toBe("Join Kestrel Valley Off-Road Club on Loftline");
    expect(m.text).toContain(
      "Dana Whitlock has invited you to join Kestrel Valley Off-Road Club on Loftline as a marshal.",
    );
    expect(m.text).toContain(link);
    expect(m.html).toContain(`href="${link}"`);
  });

  it("invitation: uses 'an' before a vowel and mentions the expiry when given", () => {
    const m = invitationMail({
      clubName: "C",
      inviterName: "I",
      role: "driver",
      link: "http://x/y",
      expiresInDays: 7,
    });
    expect(m.text).toContain("as a driver.");
    expect(m.text).toContain("works for 7 days");
    const d = invitationMail({ clubName: "C", inviterName: "I", role: "director", link: "http://x/y" });
    expect(d.text).toContain("as a race director.");
  });

  it("escapes names in the HTML part (a club name is user input)", () => {
    const m = invitationMail({
      clubName: `<script>alert("x")</script>`,
      inviterName: "A & B",
      role: "driver",
      link: "http://x/?a=1&b=2",
    });
    expect(m.html).not.toContain("<script>");
    expect(m.html).toContain("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;");
    expect(m.html).toContain("A &amp; B");
    expect(m.html).toContain('href="http://x/?a=1&amp;b=2"');
    expect(escapeHtml(`'`)).toBe("&#39;");
  });

  it("password reset: greets by name, gives the lifetime in plain words and the link", () => {
    const m = passwordResetMail({
      name: "Dee Okafor",
      link: "http://localhost:3000/reset-password/t0k",
      expiresInMinutes: 60,
    });
    expect(m.subject).toBe("Reset your Loftline password");
    expect(m.text).toContain("Hello Dee Okafor,");
    expect(m.text).toContain("within one hour");
    expect(m.text).toContain("http://localhost:3000/reset-password/t0k");
    expect(passwordResetMail({ name: "x", link: "l", expiresInMinutes: 30 }).text).toContain(
      "within 30 minutes",
    );
    expect(passwordResetMail({ name: "x", link: "l", expiresInMinutes: 120 }).text).toContain(
      "within 2 hours",
    );
  });
});
