/**
 * One word, one spelling (docs/decisions/0020-product-words-once.md): the product's words and the
 * verdict marks are written in one file each, and every other source file imports them. A second
 * copy of a label as a string or as JSX text, a copied list of ids, a copied mark shape or a
 * retired spelling fails here, naming the file.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";
import {
  ERROR_WORDS,
  GUIDANCE_SET_LABELS,
  JUMP_PRESET_LABELS,
  REASON_TEXT,
  SKILL_LABELS,
  SURFACE_LABELS,
  VERDICT_WORDS,
  WHOOPS_WORDS,
} from "~/analysis";
import { VERDICT_MARKS } from "~/lib/verdict-marks";

const ROOT = join(import.meta.dirname, "../../..");
const WORDS = "app/analysis/words.ts";
const MARKS = "app/lib/verdict-marks.ts";

/** Code without its comments (comments may quote a word to explain it). */
const code = (text: string) => text.replace(/\/\*[\s\S]*?\*\//g, "").replace(/^\s*\/\/.*$/gm, "");

/**
 * Every TypeScript source of the app and the command line. The demo layouts are left out: their
 * jump names ("Triple", "Step-up") are a director's own names in a document, not product words.
 */
const sources: { path: string; text: string }[] = ["app", "scripts"].flatMap((dir) =>
  readdirSync(join(ROOT, dir), { recursive: true, encoding: "utf8" })
    .filter((f) => /\.(ts|tsx)$/.test(f))
    .map((f) =>
      relative(ROOT, join(ROOT, dir, f))
        .split("\\")
        .join("/"),
    )
    .filter((path) => path !== "app/db/demo-layouts.ts")
    .map((path) => ({ path, text: code(readFileSync(join(ROOT, path), "utf8")) })),
);

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/** Files other than `home` that write `word` as a whole string literal or as a JSX text node. */
function copiesOf(word: string, home: string): string[] {
  const w = escape(word);
  const literal = new RegExp(`["'\`]${w}["'\`]|>\\s*${w}\\s*<`);
  return sources.filter((s) => s.path !== home && literal.test(s.text)).map((s) => s.path);
}

describe("the product's words are defined once", () => {
  it("reads the sources (the check means something only if it sees the app)", () => {
    expect(sources.some((s) => s.path === WORDS)).toBe(true);
    expect(sources.some((s) => s.path === "app/components/editor/analysis-panel.tsx")).toBe(true);
    expect(sources.length).toBeGreaterThan(100);
  });

  const labels: [string, Record<string, string>][] = [
    ["skill levels", SKILL_LABELS],
    ["jump presets", JUMP_PRESET_LABELS],
    ["surfaces", SURFACE_LABELS],
    ["guidance sets", GUIDANCE_SET_LABELS],
    ["verdict words", VERDICT_WORDS],
    ["verdict reasons", REASON_TEXT],
    ["driver's errors", ERROR_WORDS],
    ["ways through a whoops row", WHOOPS_WORDS],
  ];
  it.each(labels)("%s: each label is written only in words.ts", (_name, words) => {
    for (const word of Object.values(words))
      expect({ word, copies: copiesOf(word, WORDS) }).toEqual({ word, copies: [] });
  });

  it("the lists of ids are written only in words.ts", () => {
    const lists = [
      /\[\s*"novice",\s*"club",\s*"expert"\s*\]/,
      /\[\s*"dirt",\s*"clay",\s*"turf",\s*"carpet"\s*\]/,
      /\[\s*"club",\s*"national"\s*\]/,
      /\[\s*"tabletop",\s*"double",/,
      /\[\s*"set-up",\s*"straight",\s*"cannot-clear"\s*\]/,
      /\[\s*"steering",\s*"pulse",\s*"speed"\s*\]/,
    ];
    for (const list of lists) {
      const copies = sources.filter((s) => s.path !== WORDS && list.test(s.text)).map((s) => s.path);
      expect({ list: String(list), copies }).toEqual({ list: String(list), copies: [] });
    }
  });

  it("the custom preset is the free profile everywhere; the retired spelling is gone", () => {
    expect(JUMP_PRESET_LABELS.custom).toBe("Free profile");
    expect(sources.filter((s) => /own profile/i.test(s.text)).map((s) => s.path)).toEqual([]);
  });

  it("each verdict mark's shape is drawn from verdict-marks.ts only", () => {
    for (const mark of Object.values(VERDICT_MARKS)) {
      const copies = sources.filter((s) => s.path !== MARKS && s.text.includes(mark.path)).map((s) => s.path);
      expect({ shape: mark.shape, copies }).toEqual({ shape: mark.shape, copies: [] });
    }
    expect(new Set(Object.values(VERDICT_MARKS).map((m) => m.shape)).size).toBe(3);
  });
});
