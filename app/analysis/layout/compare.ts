/**
 * Comparing two versions of a layout: which sections were added, removed or changed (matched by
 * section id), what else about the layout changed, and per car class how the lap time, the speeds
 * and every jump's verdict moved. Plain data in and out, for the compare page and the API.
 */
import type { LayoutDocument, LayoutSection } from "../format/layout-document";
import { verdictKind, type SkillLevel, type VerdictKind } from "../words";
import type { LayoutAnalysis } from "./layout-analysis-types";

export type SectionDiffKind = "added" | "removed" | "changed" | "same";

export interface FieldDiff {
  field: string;
  from: unknown;
  to: unknown;
}

export interface SectionDiff {
  sectionId: string;
  kind: SectionDiffKind;
  /** The section in the older version (null when added) and in the newer one (null when removed). */
  from: LayoutSection | null;
  to: LayoutSection | null;
  /** Position (0-based) in each version; null where it is absent. */
  fromIndex: number | null;
  toIndex: number | null;
  /** For a changed section: its fields that differ. */
  fields: FieldDiff[];
}

export interface DocumentComparison {
  sections: SectionDiff[];
  /** Layout-wide fields that differ (name, width, start, stand, marshal points, classes, ...). */
  layout: FieldDiff[];
  counts: Record<Exclude<SectionDiffKind, "same">, number>;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

function fieldChanges(a: object, b: object, skip: readonly string[] = []): FieldDiff[] {
  const ra = a as Record<string, unknown>;
  const rb = b as Record<string, unknown>;
  const keys = [...new Set([...Object.keys(ra), ...Object.keys(rb)])].filter((k) => !skip.includes(k));
  return keys.filter((k) => !same(ra[k], rb[k])).map((k) => ({ field: k, from: ra[k], to: rb[k] }));
}

/** The section-by-section and layout-wide differences from version `a` (older) to `b` (newer). */
export function compareDocuments(a: LayoutDocument, b: LayoutDocument): DocumentComparison {
  const inA = new Map(a.sections.map((s, i) => [s.id, { s, i }]));
  const inB = new Map(b.sections.map((s, i) => [s.id, { s, i }]));
  const sections: SectionDiff[] = [];
  b.sections.forEach((s, i) => {
    const old = inA.get(s.id);
    if (!old) {
      sections.push({
        sectionId: s.id,
        kind: "added",
        from: null,
        to: s,
        fromIndex: null,
        toIndex: i,
        fields: [],
      });
      return;
    }
    const fields = fieldChanges(old.s, s, ["id"]);
    sections.push({
      sectionId: s.id,
      kind: fields.length ? "changed" : "same",
      from: old.s,
      to: s,
      fromIndex: old.i,
      toIndex: i,
      fields,
    });
  });
  a.sections.forEach((s, i) => {
    if (!inB.has(s.id))
      sections.push({
        sectionId: s.id,
        kind: "removed",
        from: s,
        to: null,
        fromIndex: i,
        toIndex: null,
        fields: [],
      });
  });
  const counts = { added: 0, removed: 0, changed: 0 };
  for (const c of sections) if (c.kind !== "same") counts[c.kind] += 1;
  return { sections, layout: fieldChanges(a, b, ["sections"]), counts };
}

export interface JumpVerdictMove {
  sectionId: string;
  name: string | null;
  /** Verdict kind at the chosen skill in each version; null where the jump is absent. */
  from: VerdictKind | null;
  to: VerdictKind | null;
  takeoffSpeed: { from: number | null; to: number | null };
  airtime: { from: number | null; to: number | null };
}

export interface ClassComparison {
  classId: string;
  label: string;
  /** Lap time, s, and speeds, m/s, in each version (null where the class is not analysed). */
  lapTime: { from: number | null; to: number | null };
  speed: {
    from: { min: number; max: number; mean: number } | null;
    to: { min: number; max: number; mean: number } | null;
  };
  jumps: JumpVerdictMove[];
}

/**
 * Per car class (those of either version): lap time s and speeds m/s in each, and every jump's
 * verdict at `skill` with its takeoff speed m/s and airtime s, in the newer version's order and
 * then the jumps only the older one has.
 */
export function compareAnalyses(a: LayoutAnalysis, b: LayoutAnalysis, skill: SkillLevel): ClassComparison[] {
  const ids = [...new Set([...b.classes.map((c) => c.classId), ...a.classes.map((c) => c.classId)])];
  return ids.map((classId) => {
    const ca = a.classes.find((c) => c.classId === classId) ?? null;
    const cb = b.classes.find((c) => c.classId === classId) ?? null;
    const ja = new Map((ca?.jumps ?? []).map((j) => [j.sectionId, j]));
    const jb = new Map((cb?.jumps ?? []).map((j) => [j.sectionId, j]));
    const order = [...jb.keys(), ...[...ja.keys()].filter((id) => !jb.has(id))];
    const jumps = order.map((id) => {
      const x = ja.get(id);
      const y = jb.get(id);
      return {
        sectionId: id,
        name: y?.name ?? x?.name ?? null,
        from: x ? verdictKind(x.verdicts[skill]) : null,
        to: y ? verdictKind(y.verdicts[skill]) : null,
        takeoffSpeed: { from: x?.takeoffSpeed ?? null, to: y?.takeoffSpeed ?? null },
        airtime: { from: x?.airtime ?? null, to: y?.airtime ?? null },
      };
    });
    return {
      classId,
      label: cb?.label ?? ca?.label ?? classId,
      lapTime: { from: ca?.lapTime ?? null, to: cb?.lapTime ?? null },
      speed: { from: ca ? { ...ca.speed } : null, to: cb ? { ...cb.speed } : null },
      jumps,
    };
  });
}
