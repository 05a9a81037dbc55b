/**
 * Slows repeated failed sign-ins: after 5 failures within 15 minutes for one e-mail address, or
 * from one client address, further attempts are answered 429 until the oldest failures age out.
 * Failures are counted for every address typed, whether or not it has an account, so the throttle
 * itself never tells the two apart. See docs/decisions/0301-sign-in-throttle.md.
 */
import { and, asc, eq, gte, lt, or } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { signInFailures } from "~/db/schema";

/** Failures allowed within the window before attempts are refused. */
export const MAX_FAILURES = 5;
/** Length of the window, ms (15 minutes). */
export const FAILURE_WINDOW_MS = 15 * 60 * 1000;

export type ThrottleKey = { email: string; clientAddress: string | null };

/**
 * The client's address as far as it can be trusted: the header named by CLIENT_ADDRESS_HEADER
 * (e.g. "cf-connecting-ip" or "fly-client-ip", set by the platform's proxy), else the last entry
 * of X-Forwarded-For (the one our own reverse proxy appended). CLIENT_ADDRESS_HEADER=none turns
 * per-address counting off. Returns null when no address is known.
 */
export function clientAddress(request: Request): string | null {
  const configured = process.env.CLIENT_ADDRESS_HEADER?.trim().toLowerCase();
  if (configured === "none") return null;
  const name = configured || "x-forwarded-for";
  const raw = request.headers.get(name);
  if (!raw) return null;
  const parts = raw
    .split(",")
    .map((p) => p.trim())
    .filter(Boolean);
  const last = parts[parts.length - 1];
  // Keep it short and printable: a header is client-controlled text.
  return last && /^[0-9A-Za-z.:[\]_-]{1,64}$/.test(last) ? last.toLowerCase() : null;
}

/** Which keys of an attempt count: the e-mail address always, the client address when known. */
function keyCondition(key: ThrottleKey) {
  return key.clientAddress
    ? or(eq(signInFailures.email, key.email), eq(signInFailures.clientAddress, key.clientAddress))
    : eq(signInFailures.email, key.email);
}

/**
 * Whether an attempt may go ahead. When refused, `retryAfterSeconds` is when the attempt would
 * be allowed again (s), rounded up.
 */
export async function checkThrottle(
  key: ThrottleKey,
  now = Date.now(),
): Promise<{ allowed: true } | { allowed: false; retryAfterSeconds: number }> {
  const db = await getDb();
  const since = new Date(now - FAILURE_WINDOW_MS);
  const rows = await db
    .select({
      email: signInFailures.email,
      clientAddress: signInFailures.clientAddress,
      at: signInFailures.createdAt,
    })
    .from(signInFailures)
    .where(and(keyCondition(key), gte(signInFailures.createdAt, since)))
    .orderBy(asc(signInFailures.createdAt));
  // Count each key on its own: 3 failures for the e-mail plus 3 others from the address is not 5.
  const byEmail = rows.filter((r) => r.email === key.email).map((r) => r.at.getTime());
  const byAddress = key.clientAddress
    ? rows.filter((r) => r.clientAddress === key.clientAddress).map((r) => r.at.getTime())
    : [];
  let retryAt = 0;
  for (const times of [byEmail, byAddress]) {
    if (times.length >= MAX_FAILURES) {
      // Allowed again once all but MAX_FAILURES - 1 of these have left the window.
      retryAt = Math.max(retryAt, times[times.length - MAX_FAILURES] + FAILURE_WINDOW_MS);
    }
  }
  if (retryAt <= now) return { allowed: true };
  return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil((retryAt - now) / 1000)) };
}

/** Records one failed attempt and purges failures older than the window. */
export async function recordFailure(key: ThrottleKey, now = Date.now()): Promise<void> {
  const db = await getDb();
  await db
    .insert(signInFailures)
    .values({ email: key.email, clientAddress: key.clientAddress, createdAt: new Date(now) });
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
