import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles, makeUser } from "./helpers/factories";
import { extractLink, extractPath, mailsTo, useFakeSmtp, waitForMail } from "./helpers/mail";
import { args, formRequest, getRequest, run } from "./helpers/requests";
import { getUser } from "~/auth/permissions.server";
import { INVITATION_LIFETIME_MS } from "~/clubs/invitations.server";
import { hashLinkToken } from "~/clubs/tokens.server";
import { invitations, memberships, users } from "~/db/schema";
import * as members from "~/routes/club-members";
import * as invitation from "~/routes/invitation";

const { db } = useTestDatabase();
useFakeSmtp();

type Errors = Record<string, string[]>;
const errorsOf = (r: { data: unknown }) => (r.data as { errors: Errors }).errors;
let n = 0;
const uniqueEmail = (tag: string) => `${tag}-${++n}@invite.example`;

const invite = (clubId: string, email: string, role: string, cookie: string) =>
  run(() =>
    members.action(
      args(formRequest(`/clubs/${clubId}/members`, { intent: "invite", email, role }, cookie), { clubId }),
    ),
  );
const tokenOf = (path: string) => path.split("/").pop()!;
const openLink = (path: string, cookie?: string) =>
  run(() => invitation.loader(args(getRequest(path, cookie), { token: tokenOf(path) })));
const answer = (path: string, fields: Record<string, string>, cookie?: string) =>
  run(() => invitation.action(args(formRequest(path, fields, cookie), { token: tokenOf(path) })));
const cookieFrom = (headers: Headers) => headers.get("Set-Cookie")!.split(";")[0];

/** Invites and returns the path of the link in the e-mail that arrived. */
async function inviteAndRead(clubId: string, clubName: string, email: string, role: string, cookie: string) {
  const since = new Date();
  const r = await invite(clubId, email, role, cookie);
  expect(r.status).toBe(302);
  const mail = await waitForMail(email, `Join ${clubName}`, { since });
  return { mail, path: extractPath(mail.text) };
}

async function membershipOf(clubId: string, userId: string) {
  const [row] = await (
    await db()
  )
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.clubId, clubId), eq(memberships.userId, userId)));
  return row;
}

const pendingOf = async (clubId: string) =>
  (await db()).select().from(invitations).where(eq(invitations.clubId, clubId));

describe("invite and accept, end to end through the outbox", () => {
  it("a signed-out visitor follows the e-mailed link, signs up with the invited address and joins with the role", async () => {
    const { club, director } = await makeClubWithRoles();
    const email = uniqueEmail("newcomer");
    const { mail, path } = await inviteAndRead(
      club.id,
      club.name,
      email.toUpperCase(),
      "marshal",
      director.cookie,
    );
    expect(mail.text).toContain(
      `${director.name} has invited you to join ${club.name} on Loftline as a marshal.`,
    );
    expect(mail.html).toContain(extractLink(mail.text));
    expect(path).toMatch(/^\/invitations\/[A-Za-z0-9_-]{43}$/);

    const [stored] = await pendingOf(club.id);
    expect(stored.email).toBe(email);
    expect(stored.tokenHash).toBe(hashLinkToken(tokenOf(path)));
    expect(JSON.stringify(stored)).not.toContain(tokenOf(path));
    expect(stored.expiresAt.getTime() - stored.createdAt.getTime()).toBeGreaterThan(
      INVITATION_LIFETIME_MS - 5000,
    );
    expect(stored.expiresAt.getTime() - stored.createdAt.getTime()).toBeLessThanOrEqual(
      INVITATION_LIFETIME_MS + 1000,
    );

    const page = await openLink(path);
    expect(page.status).toBe(200);
    expect(page.data).toMatchObject({
      state: "signed-out",
      invitation: { email, role: "marshal", club: { name: club.name }, inviterName: director.name },
    });

    const mismatch = await answer(path, {
      intent: "sign-up",
      name: "Nia New",
      password: "long enough pw",
      confirm: "other words",
    });
    expect(mismatch.status).toBe(400);
    expect(errorsOf(mismatch).confirm).toEqual(["The two passwords do not match."]);
    expect(await (await db()).select().from(users).where(eq(users.email, email))).toEqual([]);

    const joined = await answer(path, {
      intent: "sign-up",
      name: "Nia New",
      password: "long enough pw",
      confirm: "long enough pw",
    });
    expect(joined.status).toBe(302);
    expect(joined.location).toBe(`/clubs/${club.id}`);
    const me = await getUser(getRequest("/", cookieFrom(joined.headers)));
    expect(me).toMatchObject({ email, name: "Nia New" });
    expect(await membershipOf(club.id, me!.id)).toEqual({ role: "marshal" });
    expect((await pendingOf(club.id))[0].acceptedAt).toBeInstanceOf(Date);

    // Single use: the same link again is gone (410) for everyone.
    const again = await openLink(path);
    expect(again.status).toBe(410);
    expect((again.data as { message: string }).message).toMatch(/already been used/);
    expect((await answer(path, { intent: "join" }, cookieFrom(joined.headers))).status).toBe(410);
  });

  it("a signed-in user with the invited address joins with one click", async () => {
    const { club, director } = await makeClubWithRoles();
    const existing = await makeUser({ email: uniqueEmail("member"), name: "Ed Existing" });
    const { path } = await inviteAndRead(club.id, club.name, existing.email, "driver", director.cookie);
    expect((await openLink(path, existing.cookie)).data).toMatchObject({ state: "join" });
    const r = await answer(path, { intent: "join" }, existing.cookie);
    expect(r.status).toBe(302);
    expect(r.location).toBe(`/clubs/${club.id}`);
    expect(await membershipOf(club.id, existing.id)).toEqual({ role: "driver" });
  });

  it("sends a signed-out visitor who chooses to join to sign in first, then back to the link", async () => {
    const { club, director } = await makeClubWithRoles();
    const { path } = await inviteAndRead(club.id, club.name, uniqueEmail("later"), "driver", director.cookie);
    const r = await answer(path, { intent: "join" });
    expect(r.status).toBe(302);
    expect(r.location).toBe(`/sign-in?redirectTo=${encodeURIComponent(path)}`);
    expect((await pendingOf(club.id))[0].acceptedAt).toBeNull();
  });
});

describe("links that cannot be used", () => {
  it("answers 403 to someone signed in with another address, and writes nothing", async () => {
    const { club, director, outsider } = await makeClubWithRoles();
    const { path } = await inviteAndRead(
      club.id,
      club.name,
      uniqueEmail("intended"),
      "driver",
      director.cookie,
    );
    const page = await openLink(path, outsider.cookie);
    expect(page.status).toBe(403);
    expect((page.data as { message: string }).message).toMatch(/signed in as/);
    const r = await answer(path, { intent: "join" }, outsider.cookie);
    expect(r.status).toBe(403);
    expect(errorsOf(r).form[0]).toMatch(/was sent to .*intended/);
    expect(await membershipOf(club.id, outsider.id)).toBeUndefined();
    expect((await pendingOf(club.id))[0].acceptedAt).toBeNull();
  });

  it("answers 410 to an expired link, with the day it expired", async () => {
    const { club, director } = await makeClubWithRoles();
    const email = uniqueEmail("late");
    const { path } = await inviteAndRead(club.id, club.name, email, "driver", director.cookie);
    await (
      await db()
    )
      .update(invitations)
      .set({ expiresAt: new Date("2026-03-04T10:00:00Z") })
      .where(eq(invitations.clubId, club.id));
    const page = await openLink(path);
    expect(page.status).toBe(410);
    expect((page.data as { message: string }).message).toBe(
      "This invitation expired on 4 March 2026. Ask the club's race director to send it again.",
    );
    const r = await answer(path, {
      intent: "sign-up",
      name: "Lee Late",
      password: "long enough pw",
      confirm: "long enough pw",
    });
    expect(r.status).toBe(410);
    expect(await (await db()).select().from(users).where(eq(users.email, email))).toEqual([]);
  });

  it("answers 404 to a withdrawn link and to a made-up one", async () => {
    const { club, director } = await makeClubWithRoles();
    const { path } = await inviteAndRead(
      club.id,
      club.name,
      uniqueEmail("withdrawn"),
      "driver",
      director.cookie,
    );
    const [pending] = await pendingOf(club.id);
    const revoked = await run(() =>
      members.action(
        args(
          formRequest(
            `/clubs/${club.id}/members`,
            { intent: "revoke", invitationId: pending.id },
            director.cookie,
          ),
          { clubId: club.id },
        ),
      ),
    );
    expect(revoked.status).toBe(302);
    expect(await pendingOf(club.id)).toEqual([]);
    expect((await openLink(path)).status).toBe(404);
    expect((await openLink("/invitations/not-a-token")).status).toBe(404);
    expect((await openLink(`/invitations/${"A".repeat(43)}`)).status).toBe(404);
  });

  it("sending again mails a new link and retires the old one", async () => {
    const { club, director } = await makeClubWithRoles();
    const email = uniqueEmail("resend");
    const first = await inviteAndRead(club.id, club.name, email, "driver", director.cookie);
    const [pending] = await pendingOf(club.id);
    const since = new Date();
    const r = await run(() =>
      members.action(
        args(
          formRequest(
            `/clubs/${club.id}/members`,
            { intent: "resend", invitationId: pending.id },
            director.cookie,
          ),
          { clubId: club.id },
        ),
      ),
    );
    expect(r.status).toBe(302);
    const second = extractPath((await waitForMail(email, `Join ${club.name}`, { since })).text);
    expect(second).not.toBe(first.path);
    expect(await mailsTo(email)).toHaveLength(2);
    expect((await openLink(first.path)).status).toBe(404);
    expect((await openLink(second)).status).toBe(200);
  });

  it("refuses with 409 to sign up when the invited address already has an account, and writes nothing", async () => {
    const { club, director } = await makeClubWithRoles();
    const existing = await makeUser({ email: uniqueEmail("has-account") });
    const { path } = await inviteAndRead(club.id, club.name, existing.email, "driver", director.cookie);
    const r = await answer(path, {
      intent: "sign-up",
      name: "Someone",
      password: "long enough pw",
      confirm: "long enough pw",
    });
    expect(r.status).toBe(409);
    expect(errorsOf(r).form[0]).toMatch(/Sign in to accept/);
    expect(await membershipOf(club.id, existing.id)).toBeUndefined();
    expect((await pendingOf(club.id))[0].acceptedAt).toBeNull();
  });
});

describe("inviting: refusals", () => {
  it("refuses a second live invitation and an address that is already a member, naming the e-mail field", async () => {
    const { club, director, marshal } = await makeClubWithRoles();
    const email = uniqueEmail("twice");
    await inviteAndRead(club.id, club.name, email, "driver", director.cookie);
    const twice = await invite(club.id, email, "marshal", director.cookie);
    expect(twice.status).toBe(409);
    expect(errorsOf(twice).email[0]).toMatch(/already has an invitation waiting/);
    const member = await invite(club.id, marshal.email.toUpperCase(), "driver", director.cookie);
    expect(member.status).toBe(409);
    expect(errorsOf(member).email).toEqual([`${marshal.email} is already a member of this club.`]);
    expect(await pendingOf(club.id)).toHaveLength(1);
    expect(await mailsTo(marshal.email)).toEqual([]);
  });

  it("replaces an expired invitation to the same address with a new one", async () => {
    const { club, director } = await makeClubWithRoles();
    const email = uniqueEmail("expired-then-new");
    await inviteAndRead(club.id, club.name, email, "driver", director.cookie);
    await (
      await db()
    )
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitations.clubId, club.id));
    const { path } = await inviteAndRead(club.id, club.name, email, "marshal", director.cookie);
    const rows = await pendingOf(club.id);
    expect(rows).toHaveLength(1);
    expect(rows[0].role).toBe("marshal");
    expect((await openLink(path)).status).toBe(200);
  });

  it("answers 400 naming the field for a bad address or role", async () => {
    const { club, director } = await makeClubWithRoles();
    const r = await invite(club.id, "not an address", "boss", director.cookie);
    expect(r.status).toBe(400);
    expect(errorsOf(r).email).toEqual(["Enter a valid e-mail address, like name@example.org."]);
    expect(errorsOf(r).role).toEqual(["Choose a role: director, marshal or driver."]);
    expect(await pendingOf(club.id)).toEqual([]);
  });

  it("takes the invitation back (503) when the e-mail cannot be sent", async () => {
    const { club, director } = await makeClubWithRoles();
    const working = process.env.SMTP_URL;
    process.env.SMTP_URL = "smtp://127.0.0.1:9"; // nothing listens on the discard port
    try {
      const r = await invite(club.id, uniqueEmail("unsent"), "driver", director.cookie);
      expect(r.status).toBe(503);
      expect(errorsOf(r).email[0]).toMatch(/could not be sent/);
    } finally {
      process.env.SMTP_URL = working;
    }
    expect(await pendingOf(club.id)).toEqual([]);
  });
});
