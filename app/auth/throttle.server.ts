/**
 * Slows repeated failed sign-ins: after 5 failures within 15 minutes for one e-mail address, or
 * from one client address, further attempts are answered 429 until the oldest failures age out.
 * Failures are counted for every address typed, whether or not it has an account, so the throttle
 * itself never tells the two apart. See docs/decisions/0301-sign-in-throttle.md.
 *
 * An attempt takes its place in the count before the password is checked, in one statement that
 * counts and inserts together (reserveAttempt), so parallel guesses cannot all slip under the
 * limit; a right password then gives its place back (releaseAttempt).
 */
import { and, asc, eq, gte, lt, or, sql } from "drizzle-orm";
import { isIPv6 } from "node:net";
import { getDb } from "~/db/client.server";
import { signInFailures } from "~/db/schema";

/** Failures allowed within the window before attempts are refused. */
export const MAX_FAILURES = 5;
/** Length of the window, ms (15 minutes). */
export const FAILURE_WINDOW_MS = 15 * 60 * 1000;

export type ThrottleKey = { email: string; clientAddress: string | null };

/**
 * The part of a client address that is counted: an IPv4 address whole, an IPv6 address by its
 * /64 network (one household or server gets a whole /64, so single addresses cost nothing to
 * change). Null stays null (no address known: only the e-mail address is counted).
 */
export function addressKey(address: string | null | undefined): string | null {
  if (!address) return null;
  if (!isIPv6(address)) return address;
  const [head, tail = ""] = address.toLowerCase().split("::");
  const left = head ? head.split(":") : [];
  const right = tail ? tail.split(":") : [];
  const groups = address.includes("::")
    ? [...left, ...Array(8 - left.length - right.length).fill("0"), ...right]
    : left;
  return `${groups
    .slice(0, 4)
    .map((g) => g.replace(/^0+(?=.)/, ""))
    .join(":")}::/64`;
}

export type Reservation =
  { allowed: true; attemptId: string } | { allowed: false; retryAfterSeconds: number };

/**
 * Counts an attempt as a failure before its password is checked, unless the e-mail address or
 * the client address already has MAX_FAILURES in the window: then it is refused, with when to
 * retry (s, rounded up). The count and the insert are one statement, so they cannot be raced.
 */
export async function reserveAttempt(key: ThrottleKey, now = Date.now()): Promise<Reservation> {
  const db = await getDb();
  const since = now - FAILURE_WINDOW_MS;
  const address = addressKey(key.clientAddress);
  const attemptId = crypto.randomUUID();
  const inserted = await db.run(sql`
    INSERT INTO sign_in_failures (id, email, client_address, created_at)
    SELECT ${attemptId}, ${key.email}, ${address}, ${now}
    WHERE (SELECT count(*) FROM sign_in_failures
           WHERE email = ${key.email} AND created_at >= ${since}) < ${MAX_FAILURES}
      AND (${address} IS NULL OR (SELECT count(*) FROM sign_in_failures
           WHERE client_address = ${address} AND created_at >= ${since}) < ${MAX_FAILURES})`);
  if (inserted.rowsAffected === 1) return { allowed: true, attemptId };
  return { allowed: false, retryAfterSeconds: await retryAfterSeconds(key, now) };
}

/**
 * The attempt leaves the count: its password was right (earlier failures stay), or the check
 * itself failed on the server's side. A wrong password keeps its reservation as its failure.
 */
export async function releaseAttempt(attemptId: string): Promise<void> {
  const db = await getDb();
  await db.delete(signInFailures).where(eq(signInFailures.id, attemptId));
}

/**
 * Whether an attempt would be allowed now, without counting it. When refused,
 * `retryAfterSeconds` is when it would be allowed again (s), rounded up.
 */
export async function checkThrottle(
  key: ThrottleKey,
  now = Date.now(),
): Promise<{ allowed: true } | { allowed: false; retryAfterSeconds: number }> {
  const wait = await retryAfterSeconds(key, now);
  return wait > 0 ? { allowed: false, retryAfterSeconds: wait } : { allowed: true };
}

/** Seconds until the key is below the limit again; 0 when it is already. */
async function retryAfterSeconds(key: ThrottleKey, now: number): Promise<number> {
  const db = await getDb();
  const address = addressKey(key.clientAddress);
  const rows = await db
    .select({
      email: signInFailures.email,
      address: signInFailures.clientAddress,
      at: signInFailures.createdAt,
    })
    .from(signInFailures)
    .where(
      and(
        address
          ? or(eq(signInFailures.email, key.email), eq(signInFailures.clientAddress, address))
          : eq(signInFailures.email, key.email),
        gte(signInFailures.createdAt, new Date(now - FAILURE_WINDOW_MS)),
      ),
    )
    .orderBy(asc(signInFailures.createdAt));
  // Each key on its own: 3 failures for the e-mail plus 3 others from the address is not 5.
  const byEmail = rows.filter((r) => r.email === key.email).map((r) => r.at.getTime());
  const byAddress = address ? rows.filter((r) => r.address === address).map((r) => r.at.getTime()) : [];
  let retryAt = 0;
  for (const times of [byEmail, byAddress]) {
    if (times.length >= MAX_FAILURES) {
      // Allowed again once all but MAX_FAILURES - 1 of these have left the window.
      retryAt = Math.max(retryAt, times[times.length - MAX_FAILURES] + FAILURE_WINDOW_MS);
    }
  }
  return retryAt <= now ? 0 : Math.max(1, Math.ceil((retryAt - now) / 1000));
}

/** Records one failed attempt (for tests and tools; sign-in uses reserveAttempt). */
export async function recordFailure(key: ThrottleKey, now = Date.now()): Promise<void> {
  const db = await getDb();
  await db.insert(signInFailures).values({
    email: key.email,
    clientAddress: addressKey(key.clientAddress),
    createdAt: new Date(now),
  });
  await purgeFailures(now);
}

/** Deletes failures that no longer count; returns how many were removed. */
export async function purgeFailures(now = Date.now()): Promise<number> {
  const db = await getDb();
  const gone = await db
    .delete(signInFailures)
    .where(lt(signInFailures.createdAt, new Date(now - FAILURE_WINDOW_MS)))
    .returning({ id: signInFailures.id });
  return gone.length;
}

/** The message shown with a 429: the same whether or not the address has an account. */
export function throttleMessage(retryAfterSeconds: number): string {
  const minutes = Math.max(1, Math.ceil(retryAfterSeconds / 60));
  return (
    `Too many failed sign-ins for this e-mail address or from your network. ` +
    `Wait ${minutes === 1 ? "a minute" : `${minutes} minutes`} and try again, or reset your password.`
  );
}
