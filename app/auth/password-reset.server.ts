/**
 * Password reset by e-mail. The link carries a random token; only its SHA-256 is stored, so a
 * copy of the database cannot be used to reset anyone's password. A token works once, within an
 * hour, and using it signs the person in. See docs/decisions/0302-password-reset.md.
 */
import { createHash, randomBytes } from "node:crypto";
import { and, eq, gt, inArray, isNull, lt, sql } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { passwordResets, users } from "~/db/schema";
import { config } from "~/lib/config.server";
import { sendMail } from "~/mail/mail.server";
import { passwordResetMail } from "~/mail/templates.server";
import { findUserByEmail, hashPassword } from "./users.server";

/** How long a reset link works, ms (1 hour). */
export const RESET_TOKEN_LIFETIME_MS = 60 * 60 * 1000;
/** At most this many reset e-mails per account within one token lifetime (stops mail flooding). */
export const MAX_RESETS_PER_LIFETIME = 3;

/** SHA-256 of a token, hex. Tokens carry 256 random bits, so a fast hash is enough. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** A new random token for a link: 32 bytes, base64url (43 characters). */
export function newToken(): string {
  return randomBytes(32).toString("base64url");
}

/**
 * Sends a reset link when the address has an account, and does nothing otherwise. Callers must
 * answer the same either way. Returns whether a message was sent (for tests and logs only).
 */
export async function requestPasswordReset(email: string, now = Date.now()): Promise<boolean> {
  const user = await findUserByEmail(email);
  if (!user) return false;
  const db = await getDb();
  // Old rows are of no use after their lifetime; a day's grace keeps recent ones for the count.
  await db.delete(passwordResets).where(lt(passwordResets.expiresAt, new Date(now - 24 * 60 * 60 * 1000)));
  // One statement counts and inserts, so parallel requests cannot all slip under the cap; no
  // interactive transaction (see docs/decisions/0304-single-statement-writes.md).
  const token = newToken();
  const inserted = await db.run(sql`
    INSERT INTO password_resets (id, user_id, token_hash, expires_at, created_at)
    SELECT ${crypto.randomUUID()}, ${user.id}, ${hashToken(token)}, ${now + RESET_TOKEN_LIFETIME_MS}, ${now}
    WHERE (SELECT count(*) FROM password_resets
           WHERE user_id = ${user.id} AND created_at >= ${now - RESET_TOKEN_LIFETIME_MS}) < ${MAX_RESETS_PER_LIFETIME}`);
  if (inserted.rowsAffected !== 1) return false;
  const link = `${config.appUrl}/reset-password/${token}`;
  const mail = passwordResetMail({
    name: user.name,
    link,
    expiresInMinutes: RESET_TOKEN_LIFETIME_MS / 60000,
  });
  await sendMail({ to: user.email, ...mail });
  return true;
}

export type TokenState = "valid" | "unknown" | "used" | "expired";

/** What a token from a link is worth, without using it. */
export async function inspectResetToken(token: string, now = Date.now()): Promise<TokenState> {
  const db = await getDb();
  const [row] = await db
    .select({ usedAt: passwordResets.usedAt, expiresAt: passwordResets.expiresAt })
    .from(passwordResets)
    .where(eq(passwordResets.tokenHash, hashToken(token)));
  if (!row) return "unknown";
  if (row.usedAt) return "used";
  if (row.expiresAt.getTime() <= now) return "expired";
  return "valid";
}

/**
 * Sets a new password with a token, all or nothing, in one batch (a single transaction that runs
 * without yielding): the password changes only if the token is unused and unexpired, and the same
 * batch marks that token and every other open reset link of the account used. Two requests racing
 * with one token cannot both win. Returns the user id, or why it failed.
 */
export async function resetPassword(
  token: string,
  newPassword: string,
  now = Date.now(),
): Promise<{ ok: true; userId: string } | { ok: false; reason: Exclude<TokenState, "valid"> }> {
  const db = await getDb();
  const passwordHash = await hashPassword(newPassword);
  const tokenHash = hashToken(token);
  // Evaluated by each statement before it changes anything: the owner of a still-valid token.
  const owner = () =>
    db
      .select({ userId: passwordResets.userId })
      .from(passwordResets)
      .where(
        and(
          eq(passwordResets.tokenHash, tokenHash),
          isNull(passwordResets.usedAt),
          gt(passwordResets.expiresAt, new Date(now)),
        ),
      );
  const [, claimed] = await db.batch([
    db
      .update(users)
      .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
      .where(inArray(users.id, owner())),
    db
      .update(passwordResets)
      .set({ usedAt: new Date(now) })
      .where(and(isNull(passwordResets.usedAt), inArray(passwordResets.userId, owner())))
      .returning({ userId: passwordResets.userId, tokenHash: passwordResets.tokenHash }),
  ]);
  const mine = claimed.find((row) => row.tokenHash === tokenHash);
  if (mine) return { ok: true, userId: mine.userId };
  const state = await inspectResetToken(token, now);
  return { ok: false, reason: state === "valid" ? "used" : state };
}

/** The message for a link that cannot be used, and its HTTP status. */
export function tokenProblem(reason: Exclude<TokenState, "valid">): { status: number; message: string } {
  switch (reason) {
    case "used":
      return {
        status: 410,
        message: "This reset link has already been used. Ask for a new one if you still need it.",
      };
    case "expired":
      return {
        status: 410,
        message: "This reset link has expired (links work for one hour). Ask for a new one.",
      };
    default:
      return {
        status: 404,
        message: "This reset link is not valid. Check that the whole link was copied, or ask for a new one.",
      };
  }
}
