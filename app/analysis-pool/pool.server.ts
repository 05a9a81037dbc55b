/**
 * Whole-layout analyses run in a pool of worker threads (piscina), so the server's request thread
 * stays free while the engine works: a bounded queue, a work budget checked before a task is
 * queued (budget.ts), a time limit on each task's running time, and at most a few analyses per
 * account at once. `runAnalysis` is the one way the server runs the engine's `analyseLayout`.
 * Settings: docs/decisions/0462-analysis-pool-settings.md.
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { MessageChannel } from "node:worker_threads";
import { Piscina } from "piscina";
import { analyseLayout, createAnalysisCache, type LayoutAnalysis, type LayoutDocument } from "~/analysis";
import { rememberJson } from "./analysis-json";
import { budgetIssues } from "./budget";
import { AnalysisBudgetError, AnalysisBusyError } from "./errors";
import { analysisPoolSettings, type AnalysisPoolSettings } from "./settings.server";
import type { AnalysisReply, AnalysisTask } from "./worker";

export { AnalysisBudgetError, AnalysisBusyError } from "./errors";

export type RunAnalysisOptions = AnalysisTask["options"] & {
  /** The account asking (user id): it may have only a few analyses queued or running at once. */
  owner?: string;
};

/** The worker file: the bundle beside the server build, or the tsx-loaded source beside this file. */
function workerFile(): string {
  const here = fileURLToPath(import.meta.url);
  if (here.endsWith(".ts")) return path.join(path.dirname(here), "worker-source.mjs");
  // The server build is build/server/index.js, or a chunk in build/server/assets/.
  const candidates = [path.dirname(here), path.dirname(path.dirname(here))].map((dir) =>
    path.join(dir, "analysis-worker.js"),
  );
  const built = candidates.find((file) => fs.existsSync(file));
  if (!built)
    throw new Error(
      `${candidates[0]} is missing: build the app with \`npm run build\` (it builds the worker too).`,
    );
  return built;
}

let settings: AnalysisPoolSettings | undefined;
let pool: Piscina<AnalysisTask, AnalysisReply> | undefined;
/** Only for `threads: 0` (comparison runs): the engine's per-jump memo on the request thread. */
let inlineCache: ReturnType<typeof createAnalysisCache> | undefined;
const perOwner = new Map<string, number>();
const counts = { started: 0, timedOut: 0, refusedBusy: 0, refusedBudget: 0 };

function currentSettings(): AnalysisPoolSettings {
  settings ??= analysisPoolSettings();
  return settings;
}

function thePool(s: AnalysisPoolSettings): Piscina<AnalysisTask, AnalysisReply> {
  pool ??= new Piscina<AnalysisTask, AnalysisReply>({
    filename: workerFile(),
    minThreads: s.threads,
    maxThreads: s.threads,
    maxQueue: s.maxQueue,
    // Workers keep their per-jump memo warm; they stop only with the server.
    idleTimeout: 2 ** 31 - 1,
    // The request thread comes first when the cores are busy (Linux: the workers are reniced).
    niceIncrement: 10,
    resourceLimits: { maxOldGenerationSizeMb: s.workerMemoryMb },
  });
  return pool;
}

/** Runs the task on a worker; the time limit starts when a worker picks it up. */
async function onWorker(s: AnalysisPoolSettings, task: AnalysisTask): Promise<AnalysisReply> {
  const p = thePool(s);
  const { port1, port2 } = new MessageChannel();
  const controller = new AbortController();
  let timer: NodeJS.Timeout | undefined;
  port1.once("message", () => {
    timer = setTimeout(() => controller.abort(), s.timeLimitMs);
  });
  try {
    return await p.run({ ...task, port: port2 }, { transferList: [port2], signal: controller.signal });
  } catch (error) {
    if (controller.signal.aborted) {
      counts.timedOut += 1;
      throw new AnalysisBudgetError(
        [
          {
            path: "(document)",
            message: `took longer than the limit of ${s.timeLimitMs / 1000} s for one analysis and was stopped: remove jumps, car classes or sections`,
          },
        ],
        "time",
      );
    }
    if (error instanceof Error && /queue is at limit/i.test(error.message)) {
      throw new AnalysisBusyError("server", s.retryAfterS);
    }
    if (error instanceof Error && /out of memory|ERR_WORKER_OUT_OF_MEMORY/i.test(`${error.message}`)) {
      throw new AnalysisBudgetError(
        [{ path: "(document)", message: `needed more than the ${s.workerMemoryMb} MB one analysis may use` }],
        "memory",
      );
    }
    throw error;
  } finally {
    clearTimeout(timer);
    port1.close();
  }
}

/**
 * Analyses a layout document in the pool.
 * @returns the engine's analysis (lengths m, speeds m/s, times s, angles deg).
 * @throws AnalysisBudgetError (answer 422) over the work budget or the time or memory limit;
 * AnalysisBusyError (503 for the server's queue, 429 for the account's own limit); RangeError
 * from the engine, naming the field it refuses.
 */
export async function runAnalysis(document: LayoutDocument, options: RunAnalysisOptions = {}) {
  const s = currentSettings();
  const { owner, ...engineOptions } = options;
  const over = budgetIssues(document, engineOptions.classIds);
  if (over.length) {
    counts.refusedBudget += 1;
    throw new AnalysisBudgetError(over, "work");
  }
  if (s.threads > 0 && thePool(s).queueSize >= s.maxQueue) {
    counts.refusedBusy += 1;
    throw new AnalysisBusyError("server", s.retryAfterS);
  }
  const mine = owner === undefined ? 0 : (perOwner.get(owner) ?? 0);
  if (owner !== undefined && mine >= s.perAccount) {
    counts.refusedBusy += 1;
    throw new AnalysisBusyError("account", s.retryAfterS, s.perAccount);
  }
  if (owner !== undefined) perOwner.set(owner, mine + 1);
  counts.started += 1;
  try {
    const task: AnalysisTask = { document, options: engineOptions };
    if (s.threads === 0) {
      inlineCache ??= createAnalysisCache(4000);
      return analyseLayout(document, { ...engineOptions, cache: inlineCache });
    }
    const reply = await onWorker(s, task).catch((error: unknown) => {
      if (error instanceof AnalysisBusyError) counts.refusedBusy += 1;
      throw error;
    });
    if (reply.ok) {
      rememberJson(reply.analysis, reply.json);
      return reply.analysis as LayoutAnalysis;
    }
    throw reply.name === "RangeError" ? new RangeError(reply.message) : new Error(reply.message);
  } finally {
    if (owner !== undefined) {
      const left = (perOwner.get(owner) ?? 1) - 1;
      if (left > 0) perOwner.set(owner, left);
      else perOwner.delete(owner);
    }
  }
}

/** What the pool is doing: threads, tasks queued and done, and refusals since start. */
export function analysisPoolStats() {
  return {
    threads: pool?.threads.length ?? 0,
    queued: pool?.queueSize ?? 0,
    completed: pool?.completed ?? 0,
    ...counts,
  };
}

/**
 * Stops the workers (a server shutting down, tests). With `next`, the following analysis starts a
 * pool with these settings instead of the environment's (tests of the limits).
 */
export async function closeAnalysisPool(next?: Partial<AnalysisPoolSettings>): Promise<void> {
  const old = pool;
  pool = undefined;
  settings = next ? { ...analysisPoolSettings(), ...next } : undefined;
  perOwner.clear();
  await old?.destroy();
}
