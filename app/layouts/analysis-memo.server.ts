/**
 * The server's one memo of whole layout analyses (docs/decisions/0458-one-memo.md). Keyed by the
 * engine's own hash (`fnv1a64`, 64 bits) of the engine's canonical JSON of the inputs: the
 * document, the car classes, the skill level, the guidance set, the club's overrides and verdict
 * values. A hit also compares the canonical text, so two inputs sharing a hash are a miss, never a
 * wrong answer. Bounded by bytes (lru-cache's maxSize): least recently used entries go first.
 * Concurrent misses of the same inputs run the analysis once.
 *
 * Each entry keeps what is made from its analysis (JSON answers and their gzip form, overlays, the
 * pages' data), counted in its bytes. Stored layouts get an alias (layout id, version, guidance,
 * classes, skill) -> key, so a warm request for a saved layout does not read its document.
 */
import { promisify } from "node:util";
import { gzip } from "node:zlib";
import { LRUCache } from "lru-cache";
import {
  canonicalJson,
  fnv1a64,
  type GuidanceOverrides,
  type GuidanceSetId,
  type LayoutAnalysis,
  type LayoutDocument,
  type SkillLevel,
} from "~/analysis";
import { composeJson, jsonBytesOf } from "~/analysis-pool/analysis-json";

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

/** The canonical text of the inputs (keys sorted at every level): equal inputs, equal text. */
export function inputsText(inputs: AnalysisInputs): string {
  const { document, classIds, skill, guidance, overrides, verdict } = inputs;
  return canonicalJson({ v: 2, document, classIds, skill, guidance, overrides, verdict });
}

/** One remembered analysis and what has been made from it. */
export interface MemoEntry {
  /** "analysis:" and 16 hex digits. */
  readonly key: string;
  /** The canonical inputs text, compared on every hit. */
  readonly inputs: string;
  readonly value: LayoutAnalysis;
  /** Values made from the analysis, by purpose ("body:get:...", "overlay:..."), with their bytes. */
  readonly made: Map<string, { value: unknown; bytes: number }>;
  /** Bytes held, estimated: the inputs text (UTF-16), the analysis's JSON and what is made. */
  bytes: number;
}

/** Bytes the process-wide memo may hold (docs/decisions/0458-one-memo.md). */
export const MEMO_MAX_BYTES = 64 * 1024 * 1024;

type Compute = () => Promise<LayoutAnalysis>;
type Slot = { entry: MemoEntry };
type Context = { inputs: string; compute: Compute };

/**
 * A byte-bounded memo of whole analyses (the app uses one, `analysisMemo`; tests make their own).
 * @param hash the key's hash of the canonical text (the engine's FNV-1a; tests force collisions).
 */
export function createAnalysisMemo({ maxBytes = MEMO_MAX_BYTES, maxAliases = 4000, hash = fnv1a64 } = {}) {
  const stats = { hits: 0, misses: 0, collisions: 0, evictions: 0 };
  const newEntry = async (key: string, inputs: string, compute: Compute): Promise<MemoEntry> => {
    const value = await compute();
    const bytes = 2 * inputs.length + (jsonBytesOf(value)?.byteLength ?? JSON.stringify(value).length);
    return { key, inputs, value, made: new Map(), bytes };
  };
  const entries = new LRUCache<string, Slot, Context>({
    maxSize: maxBytes,
    // An entry larger than the whole memo is answered but not kept.
    maxEntrySize: maxBytes,
    sizeCalculation: (slot) => Math.max(1, slot.entry.bytes),
    // An entry pushed out while its analysis runs is still answered.
    ignoreFetchAbort: true,
    dispose: (_slot, _key, reason) => {
      if (reason === "evict") stats.evictions += 1;
    },
    fetchMethod: async (key, _stale, { context }) => ({
      entry: await newEntry(key, context.inputs, context.compute),
    }),
  });
  const aliases = new LRUCache<string, string>({ max: maxAliases });

  /** Counts an entry's bytes again after something was made from it (if it is still held). */
  const recount = (entry: MemoEntry) => {
    if (entries.peek(entry.key)?.entry === entry) entries.set(entry.key, { entry });
  };

  return {
    /**
     * The remembered analysis of these inputs, or `compute()`'s, remembered. Requests for the same
     * inputs while it is being computed wait for that one computation.
     * @returns the entry and whether it was a hit (false for the request that ran the analysis).
     */
    async recall(inputs: AnalysisInputs, compute: Compute): Promise<{ entry: MemoEntry; hit: boolean }> {
      const text = inputsText(inputs);
      const key = `analysis:${hash(text)}`;
      const status: LRUCache.Status<string, Slot, Context> = {};
      const slot = await entries.fetch(key, { context: { inputs: text, compute }, status });
      if (slot && slot.entry.inputs === text) {
        const hit = status.fetch !== "miss";
        stats[hit ? "hits" : "misses"] += 1;
        return { entry: slot.entry, hit };
      }
      // Other inputs with the same 64-bit hash hold the key: answer these without keeping them.
      stats.collisions += 1;
      stats.misses += 1;
      return { entry: await newEntry(key, text, compute), hit: false };
    },

    /** The entry an alias points at, if both are still remembered (counts as a hit). */
    byAlias(alias: string): MemoEntry | undefined {
      const key = aliases.get(alias);
      const entry = key === undefined ? undefined : entries.get(key)?.entry;
      if (entry) stats.hits += 1;
      return entry;
    },

    /** Remembers that `alias` (a stored layout at one version with its settings) means `entry`. */
    setAlias(alias: string, entry: MemoEntry): void {
      aliases.set(alias, entry.key);
    },

    /**
     * A value made once per entry and purpose, counted in the entry's bytes (`size`, by default
     * the length of its JSON text). Read-only: every later request gets the same value.
     */
    made<T>(entry: MemoEntry, purpose: string, make: () => T, size?: (value: T) => number): T {
      const found = entry.made.get(purpose);
      if (found) return found.value as T;
      const value = make();
      const bytes = size ? size(value) : (JSON.stringify(value)?.length ?? 0);
      entry.made.set(purpose, { value, bytes });
      entry.bytes += bytes;
      recount(entry);
      return value;
    },

    /** Adds bytes made later for a value already counted (a gzip form made on first request). */
    grow(entry: MemoEntry, bytes: number): void {
      entry.bytes += bytes;
      recount(entry);
    },

    /** Hits, misses, hash collisions, evictions, entries and bytes held. */
    stats() {
      return { ...stats, size: entries.size, bytes: entries.calculatedSize };
    },

    /** Forgets everything (tests and benchmarks measuring a cold start). */
    clear(): void {
      entries.clear();
      aliases.clear();
      Object.assign(stats, { hits: 0, misses: 0, collisions: 0, evictions: 0 });
    },
  };
}

export type AnalysisMemo = ReturnType<typeof createAnalysisMemo>;

/** The process-wide memo: every route and page that shows an analysis goes through it. */
export const analysisMemo = createAnalysisMemo();

/** A JSON answer made once: UTF-8 bytes, and the same gzip-compressed when first asked for. */
export interface CachedBody {
  bytes: Uint8Array;
  /** Compressed on libuv's thread pool, off the request thread. */
  gzip(): Promise<Uint8Array>;
}

const gzipAsync = promisify(gzip);

/**
 * A JSON body made once per entry and purpose: a repeat neither serialises, encodes nor compresses
 * again. An analysis a worker made comes with its JSON already written, which is spliced in
 * (app/analysis-pool/analysis-json.ts), so a large analysis is not serialised here.
 */
export function cachedBody(
  entry: MemoEntry,
  purpose: string,
  make: () => Record<string, unknown>,
  memo: AnalysisMemo = analysisMemo,
): CachedBody {
  return memo.made(
    entry,
    `body:${purpose}`,
    (): CachedBody => {
      const bytes = composeJson(make());
      let gzipped: Promise<Uint8Array> | undefined;
      const compress = async () => {
        const made = await gzipAsync(bytes);
        memo.grow(entry, made.byteLength);
        return made;
      };
      return { bytes, gzip: () => (gzipped ??= compress()) };
    },
    (body) => body.bytes.byteLength,
  );
}
