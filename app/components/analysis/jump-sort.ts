/**
 * Sorting the jumps table by GET parameters (`sort`, `dir`), so it works without JavaScript.
 * Pure: the loader and the tests use it.
 */
import { VERDICT_KINDS, verdictKind, type JumpAnalysis, type SkillLevel } from "~/analysis";
import { jumpName } from "./format";

export const JUMP_SORT_KEYS = [
  "order",
  "name",
  "takeoff",
  "airtime",
  "efh",
  "turn",
  "verdict",
  "gain",
] as const;
export type JumpSortKey = (typeof JUMP_SORT_KEYS)[number];
export type SortDir = "asc" | "desc";

export interface JumpSort {
  key: JumpSortKey;
  dir: SortDir;
  /** A plain-words note when a parameter was not understood (the table falls back to track order). */
  problem: string | null;
}

/** Reads `sort` and `dir`; unknown values fall back to track order with a note naming the parameter. */
export function parseJumpSort(params: URLSearchParams): JumpSort {
  const key = params.get("sort") ?? "order";
  const dir = params.get("dir") ?? "asc";
  if (!(JUMP_SORT_KEYS as readonly string[]).includes(key))
    return {
      key: "order",
      dir: "asc",
      problem: `sort: "${key.slice(0, 20)}" is not a column to sort by; showing track order.`,
    };
  if (dir !== "asc" && dir !== "desc")
    return {
      key: key as JumpSortKey,
      dir: "asc",
      problem: `dir: "${dir.slice(0, 20)}" must be asc or desc; sorted ascending.`,
    };
  return { key: key as JumpSortKey, dir, problem: null };
}

function value(j: JumpAnalysis, key: JumpSortKey, skill: SkillLevel): number | string {
  switch (key) {
    case "order":
      return j.sectionIndex;
    case "name":
      return jumpName(j).toLowerCase();
    case "takeoff":
      return j.takeoffSpeed;
    case "airtime":
      return j.airtime;
    case "efh":
      return j.equivalentFallHeight;
    case "turn":
      return j.nextTurnDistance ?? Number.POSITIVE_INFINITY;
    case "verdict":
      // In the order of VERDICT_KINDS: set up, take it straight, cannot clear.
      return VERDICT_KINDS.indexOf(verdictKind(j.verdicts[skill]));
    case "gain":
      return j.verdicts[skill].expectedGain;
  }
}

/** The jumps in the asked order (ties keep track order). Does not change the input. */
export function sortJumps(
  jumps: readonly JumpAnalysis[],
  sort: Pick<JumpSort, "key" | "dir">,
  skill: SkillLevel,
): JumpAnalysis[] {
  const sign = sort.dir === "asc" ? 1 : -1;
  return [...jumps].sort((a, b) => {
    const va = value(a, sort.key, skill);
    const vb = value(b, sort.key, skill);
    const c = va < vb ? -1 : va > vb ? 1 : 0;
    return c !== 0 ? sign * c : a.sectionIndex - b.sectionIndex;
  });
}
