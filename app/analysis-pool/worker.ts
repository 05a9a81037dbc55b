/**
 * One worker thread of the analysis pool (pool.server.ts): runs the engine's whole-layout analysis
 * off the server's request thread. Each worker keeps its own memo of per-jump work, so an edited
 * draft sent again recomputes only the jumps that changed. Bundled on its own for production
 * (scripts/build-analysis-worker.ts), loaded through tsx in development and tests
 * (worker-source.mjs).
 */
import type { MessagePort } from "node:worker_threads";
import {
  analyseLayout,
  createAnalysisCache,
  type AnalyseOptions,
  type LayoutAnalysis,
  type LayoutDocument,
} from "~/analysis";
import { compactJsonBytes } from "./analysis-json";

export interface AnalysisTask {
  document: LayoutDocument;
  options: Pick<AnalyseOptions, "classIds" | "skill" | "guidance" | "overrides" | "thresholds" | "cars">;
  /** Told when the work starts, so the time limit counts running time, not time in the queue. */
  port?: MessagePort;
}

/**
 * The analysis with its JSON text (UTF-8, compact numbers; the request thread splices it into
 * answers instead of serialising it), or the engine's refusal (a RangeError names the field).
 */
export type AnalysisReply =
  { ok: true; analysis: LayoutAnalysis; json: Uint8Array } | { ok: false; name: string; message: string };

/** Per-jump work remembered by this thread (entries; a few hundred bytes to a few kB each). */
const engineCache = createAnalysisCache(4000);

export default function analyse(task: AnalysisTask): AnalysisReply {
  task.port?.postMessage("started");
  task.port?.close();
  try {
    const analysis = analyseLayout(task.document, { ...task.options, cache: engineCache });
    return { ok: true, analysis, json: compactJsonBytes(analysis) };
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    return { ok: false, name: e.name, message: e.message };
  }
}
