/**
 * Bundles the analysis worker (app/analysis-pool/worker.ts with the engine it imports) into one
 * JavaScript file beside the server build, build/server/analysis-worker.js, where the built server
 * looks for it. Run by `npm run build` after `react-router build` (which empties build/).
 * The engine has no framework imports, so it bundles on its own (decision 0461).
 */
import path from "node:path";
import { build } from "esbuild";

const ROOT = path.resolve(import.meta.dirname, "..");
export const WORKER_BUNDLE = path.join(ROOT, "build/server/analysis-worker.js");

/** Builds the worker bundle; returns its size in bytes. */
export async function buildAnalysisWorker(): Promise<number> {
  const result = await build({
    entryPoints: [path.join(ROOT, "app/analysis-pool/worker.ts")],
    outfile: WORKER_BUNDLE,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    tsconfig: path.join(ROOT, "tsconfig.json"),
    // zod and the engine are bundled; Node's own modules stay imports.
    packages: "bundle",
    minify: false,
    sourcemap: false,
    metafile: true,
    logLevel: "warning",
  });
  return Object.values(result.metafile.outputs).reduce((sum, o) => sum + o.bytes, 0);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const bytes = await buildAnalysisWorker();
  console.log(`analysis worker: ${path.relative(ROOT, WORKER_BUNDLE)} (${(bytes / 1024).toFixed(0)} kB)`);
}
