/**
 * Shared by `npm run demo` and the browser tests: build the app when its sources changed, start the
 * built server as a child process and wait until it answers.
 */
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";
import { WORKER_BUNDLE } from "../build-analysis-worker";

const ROOT = path.resolve(import.meta.dirname, "../..");
const SERVER_ENTRY = path.join(ROOT, "build/server/index.js");
/** The project's own server (server/index.ts), bundled by `npm run build`. */
const SERVE_ENTRY = path.join(ROOT, "build/serve/index.js");
/** What the build depends on besides node_modules. */
const SOURCES = [
  "app",
  "server",
  "public",
  "package-lock.json",
  "vite.config.ts",
  "react-router.config.ts",
  "tsconfig.json",
];

function newestMtime(p: string): number {
  if (!fs.existsSync(p)) return 0;
  const stat = fs.statSync(p);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of fs.readdirSync(p)) newest = Math.max(newest, newestMtime(path.join(p, entry)));
  return newest;
}

/** True when build/ (the server or its analysis worker) is missing or older than any source file. */
export function buildIsStale(): boolean {
  const outputs = [SERVER_ENTRY, SERVE_ENTRY, WORKER_BUNDLE];
  if (!outputs.every((f) => fs.existsSync(f))) return true;
  const built = Math.min(...outputs.map((f) => fs.statSync(f).mtimeMs));
  return SOURCES.some((s) => newestMtime(path.join(ROOT, s)) > built);
}

/**
 * Runs `npm run build` (the app, the analysis worker's bundle, then the server entry) when the build
 * is stale (or always with `force`). Returns the seconds it took, or null when the build was already
 * current. Throws when the build fails.
 */
export function buildApp({ force = false, quiet = false } = {}): number | null {
  if (!force && !buildIsStale()) return null;
  const started = performance.now();
  const result = spawnSync("npm", ["run", "--silent", "build"], {
    cwd: ROOT,
    stdio: quiet ? "pipe" : "inherit",
    env: { ...process.env, NODE_ENV: "production" },
  });
  if (result.status !== 0) {
    if (quiet) process.stderr.write(String(result.stdout ?? "") + String(result.stderr ?? ""));
    throw new Error(`npm run build failed (exit ${result.status})`);
  }
  return (performance.now() - started) / 1000;
}

/** A TCP port that was free a moment ago on 127.0.0.1. */
export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

export type AppServer = { url: string; child: ChildProcess; stop: () => Promise<void> };

/**
 * Starts the built app with the project's server entry (node itself, not an npm wrapper, so that
 * stopping the child stops the server) and resolves once it answers HTTP.
 */
export async function startAppServer(opts: {
  port: number;
  env: Record<string, string>;
  output?: "inherit" | "ignore";
  timeoutMs?: number;
  /** Flags for Node that NODE_OPTIONS refuses, e.g. `--cpu-prof`. */
  nodeArgs?: string[];
}): Promise<AppServer> {
  const child = spawn(process.execPath, [...(opts.nodeArgs ?? []), SERVE_ENTRY], {
    cwd: ROOT,
    env: { ...process.env, ...opts.env, PORT: String(opts.port) },
    stdio: ["ignore", opts.output ?? "inherit", "inherit"],
  });
  const url = `http://localhost:${opts.port}`;
  const exited = new Promise<never>((_, reject) =>
    child.once("exit", (code) => reject(new Error(`the app server exited early (code ${code})`))),
  );
  exited.catch(() => {}); // only observed during start-up below
  await Promise.race([waitForHttp(url, opts.timeoutMs ?? 30_000), exited]);
  const stop = () =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve();
      child.once("exit", () => resolve());
      child.kill("SIGTERM");
      // A profiling run must stop gracefully to write its profile, so it gets longer.
      setTimeout(() => child.kill("SIGKILL"), opts.nodeArgs?.length ? 30_000 : 5000).unref();
    });
  return { url, child, stop };
}

/** Polls the URL until it answers with any HTTP status. */
export async function waitForHttp(url: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      await fetch(url, { redirect: "manual" });
      return;
    } catch {
      if (Date.now() > deadline) throw new Error(`${url} did not answer within ${timeoutMs / 1000} s`);
      await new Promise((r) => setTimeout(r, 150));
    }
  }
}
