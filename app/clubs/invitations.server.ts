/**
 * Invitations by e-mail: a director invites an address with a role; the e-mail carries a link
 * whose token is 32 random bytes, of which only the SHA-256 is stored. See
 * docs/decisions/0352-invitation-links.md for lifetimes and the answers to stale links.
 */
import { and, desc, eq, isNull } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { type Role } from "~/lib/roles";
import { invitations, memberships, users } from "~/db/schema";
import { config } from "~/lib/config.server";
import { sendMail } from "~/mail/mail.server";
import { invitationMail } from "~/mail/templates.server";
import { RuleError } from "./rule-error.server";
import { newLinkToken } from "./tokens.server";

/** How long an invitation link works: 7 days, ms. */
export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;
const LIFETIME_DAYS = INVITATION_LIFETIME_MS / (24 * 60 * 60 * 1000);

export type PendingInvitation = {
  id: string;
  email: string;
  role: Role;
  invitedByName: string | null;
  createdAt: Date;
  expiresAt: Date;
  expired: boolean;
};

type Club = { id: string; name: string };
type Inviter = { id: string; name: string };

export function invitationLink(token: string): string {
  return `${config.appUrl}/invitations/${token}`;
}

async function mailInvitation(to: string, club: Club, inviter: Inviter, role: Role, token: string) {
  const content = invitationMail({
    clubName: club.name,
    inviterName: inviter.name,
    role,
    link: invitationLink(token),
    expiresInDays: LIFETIME_DAYS,
  });
  await sendMail({ to, ...content });
}

const MAIL_FAILED = "The invitation e-mail could not be sent, so nothing was changed. Try again in a moment.";

/**
 * Invites an address to the club with a role and sends the e-mail. Refuses (409) an address that
 * already belongs to a member or already has a live invitation; an expired one is replaced. When
 * the e-mail cannot be sent the invitation is taken back (503).
 */
export async function inviteMember(input: {
  club: Club;
  inviter: Inviter;
  email: string;
  role: Role;
  now?: number;
}) {
  const { club, inviter, email, role } = input;
  const now = input.now ?? Date.now();
  const { token, hash } = newLinkToken();
  const db = await getDb();
  const invitation = await db.transaction(async (tx) => {
    const [member] = await tx
      .select({ id: memberships.id })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.clubId, club.id), eq(users.email, email)));
    if (member) throw new RuleError(409, `${email} is already a member of this club.`, "email");
    const open = await tx
      .select({ id: invitations.id, expiresAt: invitations.expiresAt })
      .from(invitations)
      .where(
        and(eq(invitations.clubId, club.id), eq(invitations.email, email), isNull(invitations.acceptedAt)),
      );
    if (open.some((i) => i.expiresAt.getTime() > now)) {
      throw new RuleError(
        409,
        `${email} already has an invitation waiting. Use "Send again" in the list of invitations instead.`,
        "email",
      );
    }
    for (const stale of open) await tx.delete(invitations).where(eq(invitations.id, stale.id));
    const [row] = await tx
      .insert(invitations)
      .values({
        clubId: club.id,
        email,
        role,
        tokenHash: hash,
        invitedBy: inviter.id,
        expiresAt: new Date(now + INVITATION_LIFETIME_MS),
      })
      .returning({ id: invitations.id, email: invitations.email, role: invitations.role });
    return row;
  });
  try {
    await mailInvitation(email, club, inviter, role, token);
  } catch (err) {
    console.error("[loftline] invitation e-mail failed:", (err as Error).message);
    await db.delete(invitations).where(eq(invitations.id, invitation.id));
    throw new RuleError(503, MAIL_FAILED, "email");
  }
  return { ...invitation, token };
}

/** Invitations not yet accepted, newest first, with whether each has expired. */
export async function listPendingInvitations(clubId: string, now = Date.now()): Promise<PendingInvitation[]> {
  const db = await getDb();
  const rows = await db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      invitedByName: users.name,
      createdAt: invitations.createdAt,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.clubId, clubId), isNull(invitations.acceptedAt)))
    .orderBy(desc(invitations.createdAt), desc(invitations.id));
  return rows.map((r) => ({ ...r, expired: r.expiresAt.getTime() <= now }));
}

async function findPending(clubId: string, invitationId: string) {
  const db = await getDb();
  const [row] = await db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      tokenHash: invitations.tokenHash,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .where(
      and(eq(invitations.id, invitationId), eq(invitations.clubId, clubId), isNull(invitations.acceptedAt)),
    );
  if (!row)
    throw new RuleError(
      404,
      "No such invitation waiting in this club: it may have been accepted or withdrawn.",
      "invitationId",
    );
  return row;
}

/**
 * Sends an invitation again with a new link and a fresh 7 days; the old link stops working.
 * When the e-mail cannot be sent, the old link and expiry are put back (503).
 */
export async function resendInvitation(input: {
  club: Club;
  inviter: Inviter;
  invitationId: string;
  now?: number;
}) {
  const now = input.now ?? Date.now();
  const before = await findPending(input.club.id, input.invitationId);
  const { token, hash } = newLinkToken();
  const db = await getDb();
  const where = and(
    eq(invitations.id, before.id),
    eq(invitations.tokenHash, before.tokenHash),
    isNull(invitations.acceptedAt),
  );
  const updated = await db
    .update(invitations)
    .set({ tokenHash: hash, expiresAt: new Date(now + INVITATION_LIFETIME_MS), invitedBy: input.inviter.id })
    .where(where)
    .returning({ id: invitations.id });
  if (updated.length === 0)
    throw new RuleError(
      409,
      "This invitation changed meanwhile. Reload the page and try again.",
      "invitationId",
    );
  try {
    await mailInvitation(before.email, input.club, input.inviter, before.role, token);
  } catch (err) {
    console.error("[loftline] invitation e-mail failed:", (err as Error).message);
    await db
      .update(invitations)
      .set({ tokenHash: before.tokenHash, expiresAt: before.expiresAt })
      .where(and(eq(invitations.id, before.id), eq(invitations.tokenHash, hash)));
    throw new RuleError(503, MAIL_FAILED, "invitationId");
  }
  return { id: before.id, email: before.email, token };
}

/** Withdraws an invitation that has not been accepted; its link then answers 404. */
export async function revokeInvitation(clubId: string, invitationId: string): Promise<{ email: string }> {
  const db = await getDb();
  const [row] = await db
    .delete(invitations)
    .where(
      and(eq(invitations.id, invitationId), eq(invitations.clubId, clubId), isNull(invitations.acceptedAt)),
    )
    .returning({ email: invitations.email });
  if (!row)
    throw new RuleError(
      404,
      "No such invitation waiting in this club: it may have been accepted or withdrawn.",
      "invitationId",
    );
  return row;
}
