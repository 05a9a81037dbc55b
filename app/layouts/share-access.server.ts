/**
 * The signed-out side of a share link: a rate limit per client address (per link when the address
 * is not known), the version the token opens, the reader's class and skill from the address (never
 * remembered, never an own car), and the headers every answer carries: not indexed, no referrer
 * (the token must not leak to other sites), not cached.
 */
import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";
import { carPreset, SKILL_LEVELS, wordList, type SkillLevel } from "~/analysis";
import { addressKey } from "~/auth/throttle.server";
import { hashLinkToken } from "~/clubs/tokens.server";
import { resolveShareToken, type SharedVersion } from "./share-links.server";

/** Requests one client may make to share links per minute. */
export const SHARE_REQUESTS_PER_MINUTE = 60;

export const SHARE_HEADERS = {
  "X-Robots-Tag": "noindex, nofollow",
  "Referrer-Policy": "no-referrer",
  "Cache-Control": "private, no-store",
} as const;

const newLimiter = () => new RateLimiterMemory({ points: SHARE_REQUESTS_PER_MINUTE, duration: 60 });
let limiter = newLimiter();

/** Forgets every count (tests). */
export function resetShareLimits(): void {
  limiter = newLimiter();
}

const refuse = (status: number, message: string, headers: Record<string, string> = {}) =>
  new Response(message, { status, statusText: message, headers: { ...SHARE_HEADERS, ...headers } });

/**
 * The published version a share link opens. `clientAddress` is the server's (the load context).
 * @throws 429 with Retry-After past the rate limit; 404 for a malformed, unknown, revoked or
 *   withdrawn link (all alike).
 */
export async function sharedVersionFor(
  token: string | undefined,
  clientAddress: string | null | undefined,
): Promise<SharedVersion> {
  const key = addressKey(clientAddress) ?? `link:${hashLinkToken(token ?? "").slice(0, 16)}`;
  try {
    await limiter.consume(key);
  } catch (error) {
    if (!(error instanceof RateLimiterRes)) throw error;
    const seconds = Math.max(1, Math.ceil(error.msBeforeNext / 1000));
    throw refuse(429, `Too many requests: try again in ${seconds} s.`, { "Retry-After": String(seconds) });
  }
  const shared = await resolveShareToken(token);
  if (!shared) throw refuse(404, "This link does not open anything: it may have been revoked.");
  return shared;
}

/** Class (`car` or `class`, one of the layout's) and skill from the address, with notes on what was not understood. */
export function sharedChoice(query: URLSearchParams, classes: readonly string[]) {
  const problems: string[] = [];
  const asked = query.get("car") || query.get("class");
  const car = asked && classes.includes(asked) ? asked : classes[0];
  if (asked && asked !== car)
    problems.push(`car: "${asked.slice(0, 40)}" is not one of this layout's car classes.`);
  const askedSkill = query.get("skill");
  const skill: SkillLevel = (SKILL_LEVELS as readonly string[]).includes(askedSkill ?? "")
    ? (askedSkill as SkillLevel)
    : "club";
  if (askedSkill && askedSkill !== skill) problems.push(`skill: must be ${wordList(SKILL_LEVELS)}.`);
  const options = classes.map((id) => ({ value: id, label: carPreset(id)?.label ?? id, own: false }));
  return { car, classId: car, skill, own: null, options, problems };
}
