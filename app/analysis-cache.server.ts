/**
 * Memo of whole layout analyses, keyed by a SHA-256 of their canonical inputs (the layout
 * document, the car classes, the skill level, the guidance set and the club's overrides). A repeat
 * of the same inputs returns the stored result, and the JSON text already made from it, without
 * running the engine again. Bounded: the least recently used entries go first.
 *
 * Stored layouts also get an alias (layout id, layout version, guidance, classes, skill) -> key, so
 * a warm request for a saved layout skips reading and checking its document as well.
 */
import { createHash } from "node:crypto";
import { promisify } from "node:util";
import { gzip } from "node:zlib";
import { composeJson } from "~/analysis-pool/analysis-json";
import type { GuidanceOverrides, GuidanceSetId } from "~/analysis";
import type { SkillLevel } from "~/analysis";
import type { LayoutDocument } from "~/analysis";

/** Everything an analysis depends on. */
export interface AnalysisInputs {
  document: LayoutDocument;
  classIds: readonly string[];
  skill: SkillLevel;
  guidance: GuidanceSetId;
  overrides: GuidanceOverrides;
  /** The club's own verdict values, when it set any. */
  verdict?: { minGainPerPass?: number; minNoseTurnDeg?: number };
}

/** JSON with object keys sorted at every level, so equal inputs give equal text. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(",")}}`;
}

/** SHA-256 (hex) of the canonical inputs. */
export function analysisKey(inputs: AnalysisInputs): string {
  const text = canonicalJson({
    v: 1,
    document: inputs.document,
    classIds: inputs.classIds,
    skill: inputs.skill,
    guidance: inputs.guidance,
    overrides: inputs.overrides,
    ...(inputs.verdict ? { verdict: inputs.verdict } : {}),
  });
  return createHash("sha256").update(text).digest("hex");
}

/** A Map that forgets its least recently used entries beyond `max`. */
export class LruMap<K, V> {
  private readonly map = new Map<K, V>();
  constructor(readonly max: number) {}

  get(key: K): V | undefined {
    const value = this.map.get(key);
    if (value === undefined) return undefined;
    this.map.delete(key);
    this.map.set(key, value);
    return value;
  }

  set(key: K, value: V): void {
    this.map.delete(key);
    this.map.set(key, value);
    while (this.map.size > this.max) this.map.delete(this.map.keys().next().value as K);
  }

  get size(): number {
    return this.map.size;
  }

  clear(): void {
    this.map.clear();
  }
}

/** A JSON answer made once: UTF-8 bytes, and the same gzip-compressed when first asked for. */
export interface CachedBody {
  bytes: Uint8Array;
  /** Compressed on libuv's thread pool, off the request thread. */
  gzip(): Promise<Uint8Array>;
}

/** One remembered analysis and the JSON bodies already made from it (by what they hold). */
export interface CacheEntry<T> {
  key: string;
  value: T;
  bodies: Map<string, CachedBody>;
}

/** Most analyses kept; a full analysis of a large layout is some tens of kilobytes. */
export const ANALYSIS_CACHE_SIZE = 200;

const entries = new LruMap<string, CacheEntry<unknown>>(ANALYSIS_CACHE_SIZE);
const aliases = new LruMap<string, string>(ANALYSIS_CACHE_SIZE * 4);
const stats = { hits: 0, misses: 0 };

const pending = new Map<string, Promise<CacheEntry<unknown>>>();

/**
 * The remembered result for these inputs, or `compute()`'s result, remembered. Requests for the
 * same inputs while it is being computed wait for that one computation.
 * @returns the entry and whether it was a hit (remembered, or already being computed).
 */
export async function memoAnalysis<T>(
  inputs: AnalysisInputs,
  compute: () => Promise<T>,
): Promise<{ entry: CacheEntry<T>; hit: boolean }> {
  const key = analysisKey(inputs);
  const found = entries.get(key) as CacheEntry<T> | undefined;
  if (found) {
    stats.hits += 1;
    return { entry: found, hit: true };
  }
  const running = pending.get(key) as Promise<CacheEntry<T>> | undefined;
  if (running) {
    stats.hits += 1;
    return { entry: await running, hit: true };
  }
  stats.misses += 1;
  const made = compute().then((value) => {
    const entry: CacheEntry<T> = { key, value, bodies: new Map() };
    entries.set(key, entry as CacheEntry<unknown>);
    return entry;
  });
  pending.set(key, made as Promise<CacheEntry<unknown>>);
  try {
    return { entry: await made, hit: false };
  } finally {
    pending.delete(key);
  }
}

/** The entry an alias points at, if both are still remembered (counts as a hit). */
export function entryByAlias<T>(alias: string): CacheEntry<T> | undefined {
  const key = aliases.get(alias);
  const entry = key ? (entries.get(key) as CacheEntry<T> | undefined) : undefined;
  if (entry) stats.hits += 1;
  return entry;
}

/** Remembers that `alias` (a stored layout at one version with its settings) means entry `key`. */
export function setAlias(alias: string, key: string): void {
  aliases.set(alias, key);
}

export { JSON_DIGITS } from "~/analysis-pool/analysis-json";

const gzipAsync = promisify(gzip);

/**
 * A JSON body made once per entry and purpose: a repeat neither serialises, encodes nor compresses
 * again (clients that accept gzip get the compressed bytes, made on the first such request). An
 * analysis a worker made comes with its JSON already written, which is spliced in
 * (app/analysis-pool/analysis-json.ts), so a large analysis is not serialised here.
 */
export function cachedBody<T>(
  entry: CacheEntry<T>,
  purpose: string,
  make: () => Record<string, unknown>,
): CachedBody {
  let body = entry.bodies.get(purpose);
  if (body === undefined) {
    const bytes = composeJson(make());
    let gzipped: Promise<Uint8Array> | undefined;
    body = { bytes, gzip: () => (gzipped ??= gzipAsync(bytes)) };
    entry.bodies.set(purpose, body);
  }
  return body;
}

/** Hit and miss counts since start (or the last reset), and the entries held. */
export function analysisCacheStats() {
  return { ...stats, size: entries.size };
}

/** Forgets everything (tests and benchmarks measuring a cold start). */
export function clearAnalysisCache(): void {
  entries.clear();
  aliases.clear();
  stats.hits = 0;
  stats.misses = 0;
}
