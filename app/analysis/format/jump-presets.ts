/**
 * Starting shapes of new jumps, one per preset (their names: JUMP_PRESET_LABELS in words.ts).
 * Sizes are estimates from memory of common club jumps for 1/10 and 1/8 off-road cars (common
 * practice, no source); every one passes the layout document's checks
 * (tests/unit/editor/section-ops.test.ts).
 */
import type { JumpPreset } from "../words";
import type { JumpSection } from "./layout-document";

/** The preset a new jump starts as. */
export const DEFAULT_JUMP_PRESET: JumpPreset = "tabletop";

/**
 * A new jump of the preset with the given id, sizes in m and deg as in the layout file.
 * @param preset the jump's kind
 * @param id the new section's id
 */
export function defaultJump(preset: JumpPreset, id: string): JumpSection {
  switch (preset) {
    case "tabletop":
      return {
        id,
        kind: "jump",
        preset,
        faceHeight: 0.5,
        faceAngleDeg: 30,
        tableLength: 3,
        landingAngleDeg: 25,
      };
    case "double":
      return {
        id,
        kind: "jump",
        preset,
        faceHeight: 0.6,
        faceAngleDeg: 30,
        gap: 4,
        landingHeight: 0.6,
        landingAngleDeg: 25,
      };
    case "triple":
      return {
        id,
        kind: "jump",
        preset,
        faceHeight: 0.5,
        faceAngleDeg: 30,
        gap: 6,
        landingHeight: 0.5,
        landingAngleDeg: 25,
      };
    case "step-up":
      return {
        id,
        kind: "jump",
        preset,
        faceHeight: 0.4,
        faceAngleDeg: 30,
        gap: 2.5,
        landingHeight: 0.7,
        deckLength: 2,
        landingAngleDeg: 25,
      };
    case "step-down":
      return {
        id,
        kind: "jump",
        preset,
        faceHeight: 0.8,
        faceAngleDeg: 30,
        gap: 3,
        landingHeight: 0.4,
        landingAngleDeg: 25,
      };
    case "whoops":
      return { id, kind: "jump", preset, count: 6, bumpHeight: 0.25, spacing: 1.2 };
    case "custom":
      return {
        id,
        kind: "jump",
        preset,
        profile: [
          [0, 0],
          [1, 0.45],
          [2.8, 0],
          [3.4, 0.45],
          [4.6, 0],
        ],
        lipIndex: 1,
        landingStartIndex: 3,
        landingEndIndex: 4,
      };
  }
}
