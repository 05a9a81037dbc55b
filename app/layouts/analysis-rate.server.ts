/**
 * Each account may ask the analysis API (POST /api/analysis, GET /api/layouts/:id/analysis) a
 * limited number of times a minute; beyond it the API answers 429 with Retry-After. Counted in
 * this process's memory (one server process; decision 0462). The editor asks at most about twice
 * a second while a director drags, and only after the drawing stops changing for 0.4 s.
 */
import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";

/** Analysis requests one account may make a minute (LOFTLINE_ANALYSIS_RATE, default 120). */
export function analysisRatePerMinute(): number {
  const raw = process.env.LOFTLINE_ANALYSIS_RATE;
  const value = raw ? Number(raw) : 120;
  if (!Number.isInteger(value) || value < 1)
    throw new Error(`LOFTLINE_ANALYSIS_RATE must be a whole number of at least 1 (got "${raw}")`);
  return value;
}

let limiter: { perMinute: number; limiter: RateLimiterMemory } | undefined;

/**
 * Counts one analysis request of the account.
 * @throws a 429 JSON Response naming the limit and when to try again.
 */
export async function countAnalysisRequest(userId: string): Promise<void> {
  const perMinute = analysisRatePerMinute();
  if (limiter?.perMinute !== perMinute)
    limiter = {
      perMinute,
      limiter: new RateLimiterMemory({ keyPrefix: "analysis", points: perMinute, duration: 60 }),
    };
  try {
    await limiter.limiter.consume(userId);
  } catch (refusal) {
    if (!(refusal instanceof RateLimiterRes)) throw refusal;
    const wait = Math.max(1, Math.ceil(refusal.msBeforeNext / 1000));
    throw Response.json(
      {
        error: `Too many analysis requests: at most ${perMinute} a minute for each account. Try again in ${wait} s.`,
        limit: "rate",
      },
      { status: 429, headers: { "Retry-After": String(wait) } },
    );
  }
}
