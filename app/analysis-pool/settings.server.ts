/**
 * Settings of the analysis pool, from the environment with defaults for one small machine
 * (docs/decisions/0462-analysis-pool-settings.md). Read once, when the first analysis starts.
 */
import os from "node:os";

export interface AnalysisPoolSettings {
  /** Worker threads; 0 runs analyses on the request thread (comparison runs only). */
  threads: number;
  /** Analyses waiting for a worker at most; more are answered 503. */
  maxQueue: number;
  /** Analyses one account may have queued or running at once; more are answered 429. */
  perAccount: number;
  /** Running time of one analysis at most, ms; longer ones are stopped and answered 422. */
  timeLimitMs: number;
  /** Heap of one worker at most, MB. */
  workerMemoryMb: number;
  /** What a busy answer tells the client to wait, s. */
  retryAfterS: number;
}

function whole(name: string, fallback: number, min: number, max: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min || value > max)
    throw new Error(`${name} must be a whole number from ${min} to ${max} (got "${raw}")`);
  return value;
}

/** The settings from LOFTLINE_ANALYSIS_* variables, each with its default. */
export function analysisPoolSettings(): AnalysisPoolSettings {
  return {
    threads: whole("LOFTLINE_ANALYSIS_THREADS", Math.max(1, os.availableParallelism() - 1), 0, 64),
    maxQueue: whole("LOFTLINE_ANALYSIS_QUEUE", 16, 1, 1000),
    perAccount: whole("LOFTLINE_ANALYSIS_PER_ACCOUNT", 2, 1, 100),
    timeLimitMs: whole("LOFTLINE_ANALYSIS_TIME_LIMIT_MS", 20_000, 10, 600_000),
    workerMemoryMb: whole("LOFTLINE_ANALYSIS_WORKER_MB", 512, 64, 8192),
    retryAfterS: 5,
  };
}
