/**
 * Following an invitation link: look it up by the SHA-256 of its token, then join as the
 * signed-in user or sign up with the invited address. Every join is one transaction: the
 * membership, the new account (when signing up) and the "used" mark all happen, or none.
 */
import { and, eq, isNull } from "drizzle-orm";
import { getDb, type Database } from "~/db/client.server";
import { type Role } from "~/lib/roles";
import { clubs, invitations, memberships, users } from "~/db/schema";
import { hashPassword } from "~/auth/users.server";
import { RuleError } from "./rule-error.server";
import { hashLinkToken, looksLikeLinkToken } from "./tokens.server";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

export type InvitationView = {
  id: string;
  email: string;
  role: Role;
  club: { id: string; name: string };
  inviterName: string | null;
  expiresAt: Date;
};

const NOT_VALID =
  "This invitation link is not valid. It may have been withdrawn, or replaced by a newer e-mail. Ask the club's race director to send it again.";
const USED = "This invitation has already been used. If it was you, sign in to reach the club.";

function expiredMessage(expiresAt: Date): string {
  const day = expiresAt.toLocaleDateString("en-GB", {
    day: "numeric",
    month: "long",
    year: "numeric",
    timeZone: "UTC",
  });
  return `This invitation expired on ${day}. Ask the club's race director to send it again.`;
}

async function lookUp(db: Database | Tx, token: string | undefined, now: number) {
  if (!looksLikeLinkToken(token)) throw new RuleError(404, NOT_VALID);
  const [row] = await db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      acceptedAt: invitations.acceptedAt,
      clubId: clubs.id,
      clubName: clubs.name,
      inviterName: users.name,
    })
    .from(invitations)
    .innerJoin(clubs, eq(clubs.id, invitations.clubId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, hashLinkToken(token)));
  if (!row) throw new RuleError(404, NOT_VALID);
  if (row.acceptedAt) throw new RuleError(410, USED);
  if (row.expiresAt.getTime() <= now) throw new RuleError(410, expiredMessage(row.expiresAt));
  const view: InvitationView = {
    id: row.id,
    email: row.email,
    role: row.role,
    club: { id: row.clubId, name: row.clubName },
    inviterName: row.inviterName,
    expiresAt: row.expiresAt,
  };
  return view;
}

/** The invitation a link names; throws RuleError 404 (unknown, withdrawn, replaced) or 410 (used, expired). */
export async function findInvitation(token: string | undefined, now = Date.now()): Promise<InvitationView> {
  return lookUp(await getDb(), token, now);
}

export function emailMismatchMessage(invited: string, signedIn: string): string {
  return `This invitation was sent to ${invited}, but you are signed in as ${signedIn}. Sign out and open the link again, or ask for an invitation to your own address.`;
}

/** Joins, marks the invitation used; fails with 410 if another request used it first. */
async function join(tx: Tx, invitation: InvitationView, userId: string, now: number) {
  await tx.insert(memberships).values({ clubId: invitation.club.id, userId, role: invitation.role });
  const used = await tx
    .update(invitations)
    .set({ acceptedAt: new Date(now) })
    .where(and(eq(invitations.id, invitation.id), isNull(invitations.acceptedAt)))
    .returning({ id: invitations.id });
  if (used.length === 0) throw new RuleError(410, USED);
}

/** The signed-in user accepts: the invited address must be theirs (403), and not a member yet (409). */
export async function acceptInvitation(
  token: string | undefined,
  user: { id: string; email: string },
  now = Date.now(),
): Promise<InvitationView> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const invitation = await lookUp(tx, token, now);
    if (invitation.email !== user.email.toLowerCase()) {
      throw new RuleError(403, emailMismatchMessage(invitation.email, user.email));
    }
    const [already] = await tx
      .select({ id: memberships.id })
      .from(memberships)
      .where(and(eq(memberships.clubId, invitation.club.id), eq(memberships.userId, user.id)));
    if (already) throw new RuleError(409, `You are already a member of ${invitation.club.name}.`);
    await join(tx, invitation, user.id, now);
    return invitation;
  });
}

/**
 * A signed-out visitor creates an account with the invited address and joins in one step.
 * The link itself proves the address, so saying that an account exists tells nothing new.
 */
export async function acceptWithSignUp(
  token: string | undefined,
  input: { name: string; password: string },
  now = Date.now(),
): Promise<{ invitation: InvitationView; userId: string }> {
  // Check the link before spending ~100 ms on bcrypt, then again inside the transaction.
  await findInvitation(token, now);
  const passwordHash = await hashPassword(input.password);
  const db = await getDb();
  return db.transaction(async (tx) => {
    const invitation = await lookUp(tx, token, now);
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, invitation.email));
    if (existing) {
      throw new RuleError(
        409,
        `There is already an account for ${invitation.email}. Sign in to accept the invitation.`,
      );
    }
    const [user] = await tx
      .insert(users)
      .values({ email: invitation.email, name: input.name, passwordHash })
      .returning({ id: users.id });
    await join(tx, invitation, user.id, now);
    return { invitation, userId: user.id };
  });
}
