/**
 * Pure operations on a layout document's sections: add (after the selected one or at the end),
 * delete, reorder, duplicate and change. Each returns a new document and leaves the old one as it
 * was, so the undo history can keep both by reference.
 */
import {
  DEFAULT_JUMP_PRESET,
  defaultJump,
  FIELD_LIMITS,
  jumpProfile,
  type CustomJumpSection,
  type JumpPreset,
  type JumpSection,
  type LayoutDocument,
  type LayoutSection,
  type TurnSection,
} from "~/analysis";

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
 * length, a turn of the same direction, or a jump of the preset. A jump made a free profile keeps
 * its current shape's points (asFreeProfile).
 */
export function changeSectionKind<D extends Pick<LayoutDocument, "sections">>(
  doc: D,
  index: number,
  kind: NewSectionKind,
  preset: JumpPreset = DEFAULT_JUMP_PRESET,
): D {
  const old = doc.sections[index];
  if (!old) return doc;
  if (old.kind === "jump" && kind === "jump" && preset === "custom" && old.preset !== "custom") {
    const sections = doc.sections.slice();
    sections[index] = asFreeProfile(old);
    return { ...doc, sections };
  }
  const fresh = newSection({ sections: [] }, kind, preset);
  const next = {
    ...fresh,
    id: old.id,
    ...(old.name ? { name: old.name } : {}),
    ...(old.locked ? { locked: true } : {}),
  } as LayoutSection;
  if (next.kind === "straight" && old.kind === "turn")
    next.length = Math.max(0.5, Math.round(old.radius * old.angleDeg * (Math.PI / 180) * 10) / 10);
  if (next.kind === "straight" && old.kind === "straight") return doc;
  const sections = doc.sections.slice();
  sections[index] = next;
  return { ...doc, sections };
}

/**
 * A preset jump as a free profile with the same points (rounded to 1 mm), the same lip and the
 * same landing ramp, so switching to "Free profile" changes nothing until a point is moved.
 */
export function asFreeProfile(jump: Exclude<JumpSection, CustomJumpSection>): CustomJumpSection {
  const p = jumpProfile(jump);
  const mm = (x: number) => Math.round(x * 1000) / 1000;
  const { min, max } = FIELD_LIMITS.profileHeight;
  const profile: [number, number][] = [];
  const indexOf: number[] = [];
  p.d.forEach((d, k) => {
    const point: [number, number] = [mm(d), Math.min(max, Math.max(min, mm(p.h[k])))];
    const last = profile[profile.length - 1];
    // Points closer than 1 mm along the track become one (the format wants increasing distances).
    if (last && point[0] <= last[0]) indexOf.push(profile.length - 1);
    else {
      indexOf.push(profile.length);
      profile.push(point);
    }
  });
  profile[0] = [0, 0];
  profile[profile.length - 1] = [profile[profile.length - 1][0], 0];
  const { id, name, locked } = jump;
  return {
    id,
    ...(name ? { name } : {}),
    ...(locked ? { locked } : {}),
    kind: "jump",
    preset: "custom",
    profile,
    lipIndex: indexOf[p.lipIndex],
    landingStartIndex: indexOf[p.landingStartIndex],
    landingEndIndex: indexOf[p.landingEndIndex],
  };
}
