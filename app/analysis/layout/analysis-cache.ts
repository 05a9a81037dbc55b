/**
 * A small in-memory memo for the layout analysis: results keyed by a stable hash of their inputs,
 * least recently used entries dropped beyond a bounded size. The analysis stores each jump's
 * costly parts here (speed window, flight, set-up plan) so that a repeat costs nothing and an
 * edit recomputes only the jumps whose inputs changed (docs/decisions/0402).
 *
 * Pure JavaScript (no Node imports): the hash is FNV-1a over a canonical JSON string, run twice
 * with different offset bases for a 64-bit key. The server's memo of whole analyses
 * (app/layouts/analysis-memo.server.ts, docs/decisions/0458-one-memo.md) keys by the same
 * `canonicalJson` and `fnv1a64`.
 */

/** Counters for tests and benchmarks. */
export interface CacheStats {
  /** Lookups answered from the cache. */
  hits: number;
  /** Lookups that had to compute (each one call of the compute function). */
  misses: number;
  /** Misses by kind (the key's prefix before ":"). */
  missesByKind: Record<string, number>;
  /** Entries dropped to stay within the size limit. */
  evictions: number;
}

export interface AnalysisCache {
  /** Most entries kept. */
  readonly maxEntries: number;
  /** Entries held now. */
  readonly size: number;
  readonly stats: CacheStats;
  /**
   * The value stored under `key`, or `compute()` stored under it. Keys are strings such as
   * `cacheKey("plan", inputs)`. Values are shared between callers: treat them as read-only.
   */
  memo<T>(key: string, compute: () => T): T;
  /** Whether `key` is held (does not count as a use). */
  has(key: string): boolean;
  /** Empties the cache and zeroes the counters. */
  clear(): void;
}

/** Default size: enough for several layouts of 40 jumps x 4 classes x 3 kinds of entry. */
export const DEFAULT_CACHE_ENTRIES = 2000;

/** A new, empty cache holding at most `maxEntries` entries (least recently used go first). */
export function createAnalysisCache(maxEntries = DEFAULT_CACHE_ENTRIES): AnalysisCache {
  if (!Number.isInteger(maxEntries) || maxEntries < 1)
    throw new RangeError("maxEntries must be a whole number of at least 1");
  // A Map keeps insertion order: re-inserting on each use keeps the least recent entry first.
  const entries = new Map<string, unknown>();
  const stats: CacheStats = { hits: 0, misses: 0, missesByKind: {}, evictions: 0 };
  return {
    maxEntries,
    get size() {
      return entries.size;
    },
    stats,
    memo<T>(key: string, compute: () => T): T {
      if (entries.has(key)) {
        const value = entries.get(key) as T;
        entries.delete(key);
        entries.set(key, value);
        stats.hits++;
        return value;
      }
      stats.misses++;
      const kind = key.slice(0, Math.max(0, key.indexOf(":")));
      stats.missesByKind[kind] = (stats.missesByKind[kind] ?? 0) + 1;
      const value = compute();
      entries.set(key, value);
      while (entries.size > maxEntries) {
        entries.delete(entries.keys().next().value as string);
        stats.evictions++;
      }
      return value;
    },
    has: (key) => entries.has(key),
    clear() {
      entries.clear();
      stats.hits = 0;
      stats.misses = 0;
      stats.missesByKind = {};
      stats.evictions = 0;
    },
  };
}

/**
 * Canonical JSON: object keys sorted, undefined members left out, non-finite numbers written as
 * strings ("Infinity", "NaN") so that they stay distinct. Equal data gives equal text whatever
 * the order its keys were written in. Typed arrays are written as plain arrays.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || value === undefined) return "null";
  switch (typeof value) {
    case "number":
      return Number.isFinite(value) ? String(value) : JSON.stringify(String(value));
    case "string":
      return JSON.stringify(value);
    case "boolean":
      return value ? "true" : "false";
    case "object": {
      if (Array.isArray(value) || ArrayBuffer.isView(value)) {
        const items = Array.from(value as ArrayLike<unknown>, canonicalJson);
        return `[${items.join(",")}]`;
      }
      const obj = value as Record<string, unknown>;
      const parts: string[] = [];
      for (const k of Object.keys(obj).sort()) {
        if (obj[k] === undefined || typeof obj[k] === "function") continue;
        parts.push(`${JSON.stringify(k)}:${canonicalJson(obj[k])}`);
      }
      return `{${parts.join(",")}}`;
    }
    default:
      throw new TypeError(`cannot hash a ${typeof value}`);
  }
}

/**
 * FNV-1a over the UTF-16 code units of `text`, twice with different offset bases (the standard
 * 32-bit basis and a second one), as 16 hex digits. Stable across runs and platforms.
 */
export function fnv1a64(text: string): string {
  let a = 0x811c9dc5;
  let b = 0x050c5d1f;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    a = Math.imul(a ^ c, 0x01000193);
    b = Math.imul(b ^ c, 0x01000193);
    b ^= b >>> 15;
  }
  return (a >>> 0).toString(16).padStart(8, "0") + (b >>> 0).toString(16).padStart(8, "0");
}

/** A cache key: the kind of entry, then the hash of its inputs' canonical JSON ("plan:1f0c..."). */
export function cacheKey(kind: string, inputs: unknown): string {
  return `${kind}:${fnv1a64(canonicalJson(inputs))}`;
}

const remembered = new WeakMap<object, string>();

/**
 * `fnv1a64(canonicalJson(o))`, remembered per object: for objects that are never changed after
 * they are first hashed (a jump profile, a car class).
 */
export function hashOnce(o: object): string {
  let h = remembered.get(o);
  if (h === undefined) {
    h = fnv1a64(canonicalJson(o));
    remembered.set(o, h);
  }
  return h;
}

/**
 * A cache key from plain parts (hashes, ids, numbers), cheaper than `cacheKey` for keys made
 * many times an analysis: `kind:` then the hash of the parts joined by "|" (numbers written
 * exactly, as `String(n)` does).
 */
export function cacheKeyOf(kind: string, ...parts: readonly (string | number)[]): string {
  return `${kind}:${fnv1a64(parts.join("|"))}`;
}
