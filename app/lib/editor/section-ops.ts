/**
 * Pure operations on a layout document's sections: add (after the selected one or at the end),
 * delete, reorder, duplicate and change. Each returns a new document and leaves the old one as it
 * was, so the undo history can keep both by reference.
 */
import { DEFAULT_JUMP_PRESET, defaultJump } from "~/analysis";
import type { JumpPreset, LayoutDocument, LayoutSection, TurnSection } from "~/analysis";

export type NewSectionKind = "straight" | "turn-left" | "turn-right" | "jump";

const PREFIX: Record<LayoutSection["kind"], string> = { straight: "s", turn: "t", jump: "j" };

/** An id not used by any section of the document: the kind's letter and the next free number. */
export function freeSectionId(doc: Pick<LayoutDocument, "sections">, kind: LayoutSection["kind"]): string {
  const used = new Set(doc.sections.map((s) => s.id));
  for (let n = doc.sections.length + 1; ; n++) {
    const id = `${PREFIX[kind]}${n}`;
    if (!used.has(id)) return id;
  }
}

/**
 * A new section with starting values: a 10 m straight, a 90 degree turn of 6 m radius, or a jump
 * of the preset.
 */
export function newSection(
  doc: Pick<LayoutDocument, "sections">,
  kind: NewSectionKind,
  preset: JumpPreset = DEFAULT_JUMP_PRESET,
): LayoutSection {
  if (kind === "straight") return { id: freeSectionId(doc, "straight"), kind: "straight", length: 10 };
  if (kind === "jump") return defaultJump(preset, freeSectionId(doc, "jump"));
  const turn: TurnSection = {
    id: freeSectionId(doc, "turn"),
    kind: "turn",
    radius: 6,
    angleDeg: 90,
    direction: kind === "turn-left" ? "left" : "right",
  };
  return turn;
}

/**
 * Inserts a section after the given index, or at the end when `afterIndex` is null.
 * @returns the new document and the new section's index.
 */
export function insertSection<D extends Pick<LayoutDocument, "sections">>(
  doc: D,
  section: LayoutSection,
  afterIndex: number | null,
): { doc: D; index: number } {
  const index =
    afterIndex === null ? doc.sections.length : Math.min(Math.max(afterIndex + 1, 0), doc.sections.length);
  const sections = doc.sections.slice();
  sections.splice(index, 0, section);
  return { doc: { ...doc, sections }, index };
}

/**
 * Removes a section. A layout keeps at least one section, so removing the last one is refused.
 * @returns the new document, or null when the section cannot be removed.
 */
export function deleteSection<D extends Pick<LayoutDocument, "sections">>(doc: D, index: number): D | null {
  if (doc.sections.length <= 1 || index < 0 || index >= doc.sections.length) return null;
  return { ...doc, sections: doc.sections.filter((_, i) => i !== index) };
}

/** Moves a section from one place in the lap to another (indices after the move). */
export function moveSection<D extends Pick<LayoutDocument, "sections">>(doc: D, from: number, to: number): D {
  const n = doc.sections.length;
  if (from < 0 || from >= n || to < 0 || to >= n || from === to) return doc;
  const sections = doc.sections.slice();
  const [moved] = sections.splice(from, 1);
  sections.splice(to, 0, moved);
  return { ...doc, sections };
}

/** Inserts a copy of a section (with a fresh id) right after it. */
export function duplicateSection<D extends Pick<LayoutDocument, "sections">>(
  doc: D,
  index: number,
): { doc: D; index: number } | null {
  const original = doc.sections[index];
  if (!original) return null;
  const copy = { ...structuredClone(original), id: freeSectionId(doc, original.kind) } as LayoutSection;
  if (original.name) copy.name = `${original.name} (copy)`.slice(0, 60);
  return insertSection(doc, copy, index);
}

/** Replaces a section's fields; the section keeps its id unless the patch names a new one. */
export function updateSection<D extends Pick<LayoutDocument, "sections">>(
  doc: D,
  index: number,
  patch: Partial<LayoutSection>,
): D {
  const old = doc.sections[index];
  if (!old) return doc;
  const sections = doc.sections.slice();
  sections[index] = { ...old, ...patch } as LayoutSection;
  return { ...doc, sections };
}

/**
 * Turns a section into another kind in place (same id and position): a straight of the same plan
 * length, a turn of the same direction, or a jump of the preset.
 */
export function changeSectionKind<D extends Pick<LayoutDocument, "sections">>(
  doc: D,
  index: number,
  kind: NewSectionKind,
  preset: JumpPreset = DEFAULT_JUMP_PRESET,
): D {
  const old = doc.sections[index];
  if (!old) return doc;
  const fresh = newSection({ sections: [] }, kind, preset);
  const next = { ...fresh, id: old.id, ...(old.name ? { name: old.name } : {}) } as LayoutSection;
  if (next.kind === "straight" && old.kind === "turn")
    next.length = Math.max(0.5, Math.round(old.radius * old.angleDeg * (Math.PI / 180) * 10) / 10);
  if (next.kind === "straight" && old.kind === "straight") return doc;
  const sections = doc.sections.slice();
  sections[index] = next;
  return { ...doc, sections };
}
