/**
 * The verdict's mark, defined once for everything that draws it: the pages' tables and headings
 * (VerdictMark), the plan drawing (SVG) and the editor's canvas (konva). Each verdict kind has
 * its own shape and its word, so colour is never the only signal; the colour comes from the
 * plan's palette (PLAN.verdict). The cross is kept for "cannot clear" because the square is the
 * driver stand's sign on the same plans (docs/decisions/0020-product-words-once.md).
 */
import { VERDICT_WORDS, type VerdictKind } from "~/analysis";

export type VerdictShape = "triangle" | "circle" | "cross";

export interface VerdictMarkDefinition {
  shape: VerdictShape;
  /** SVG path data centred on (0, 0), about 1 unit in radius, y down (SVG and canvas alike). */
  path: string;
  /** The verdict's word, shown beside the mark or as its label. */
  word: string;
}

export const VERDICT_MARKS: Record<VerdictKind, VerdictMarkDefinition> = {
  "set-up": {
    shape: "triangle",
    path: "M 0 -1.15 L 1.05 0.75 L -1.05 0.75 Z",
    word: VERDICT_WORDS["set-up"],
  },
  straight: {
    shape: "circle",
    path: "M 1 0 A 1 1 0 1 1 -1 0 A 1 1 0 1 1 1 0 Z",
    word: VERDICT_WORDS.straight,
  },
  "cannot-clear": {
    shape: "cross",
    path: "M -0.9 -0.6 L -0.6 -0.9 L 0 -0.3 L 0.6 -0.9 L 0.9 -0.6 L 0.3 0 L 0.9 0.6 L 0.6 0.9 L 0 0.3 L -0.6 0.9 L -0.9 0.6 L -0.3 0 Z",
    word: VERDICT_WORDS["cannot-clear"],
  },
};

/** Width of the white outline that keeps the mark readable on the track, in the path's units. */
export const VERDICT_MARK_OUTLINE = 0.15;
