/**
 * A jump's new size without opening the loop: when a jump grows or shrinks along the track, the
 * straight the director chose next to it (the one before, the one after, or none) gives or takes
 * the same length, so everything else stays where it was (docs/decisions/0510-jump-size-keeps-the-loop.md).
 */
import { FIELD_LIMITS, jumpProfile, type JumpSection, type LayoutDocument } from "~/analysis";

/** Which straight keeps the loop closed when a jump changes size. */
export type KeepClosedBy = "before" | "after" | "none";

export const KEEP_CLOSED_LABELS: Record<KeepClosedBy, string> = {
  before: "the straight before it",
  after: "the straight after it (its run-out)",
  none: "nothing (the loop may open)",
};

/** The neighbour's index on that side, or null when there is none to adjust. */
export function keepClosedNeighbour(
  doc: Pick<LayoutDocument, "sections">,
  index: number,
  by: KeepClosedBy,
): number | null {
  if (by === "none") return null;
  const n = doc.sections.length;
  const k = by === "before" ? (index - 1 + n) % n : (index + 1) % n;
  return k === index ? null : k;
}

/**
 * The document with the jump at `index` replaced by `jump` and, unless `by` is "none", the chosen
 * neighbouring straight changed by minus the change of the jump's plan length.
 * @returns the new document, or why the chosen straight cannot take the change.
 */
export function resizeJump<D extends Pick<LayoutDocument, "sections">>(
  doc: D,
  index: number,
  jump: JumpSection,
  by: KeepClosedBy,
): { ok: true; doc: D } | { ok: false; message: string } {
  const old = doc.sections[index];
  const sections = doc.sections.slice();
  sections[index] = jump;
  const k = keepClosedNeighbour(doc, index, by);
  if (old?.kind !== "jump" || k === null) return { ok: true, doc: { ...doc, sections } };
  const delta = jumpProfile(jump).length - jumpProfile(old).length;
  if (Math.abs(delta) < 1e-9) return { ok: true, doc: { ...doc, sections } };
  const neighbour = doc.sections[k];
  const side = by === "before" ? "before" : "after";
  if (neighbour.kind !== "straight")
    return {
      ok: false,
      message: `cannot keep the loop closed: the section ${side} the jump is not a straight`,
    };
  if (neighbour.locked)
    return { ok: false, message: `cannot keep the loop closed: the straight ${side} the jump is locked` };
  const length = Math.round((neighbour.length - delta) * 1e4) / 1e4;
  const { min, max } = FIELD_LIMITS.straightLength;
  if (length < min || length > max)
    return {
      ok: false,
      message: `would make the straight ${side} the jump ${length.toFixed(2)} m long (it must stay ${min} to ${max} m); choose the other straight or nothing`,
    };
  sections[k] = { ...neighbour, length };
  return { ok: true, doc: { ...doc, sections } };
}
