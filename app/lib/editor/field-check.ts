/**
 * Checks a section the way the layout document format does (app/lib/layout-document.ts), so the
 * side panel can show a message beside the field and keep a bad value out of the drawing.
 */
import { parseLayoutDocument, type LayoutDocument, type LayoutSection } from "~/analysis";

export interface FieldIssue {
  /** The field inside the section: "radius", "profile[2][0]", "id". */
  field: string;
  message: string;
}

/** Every problem of one section on its own (its fields and the rules spanning them). */
export function sectionIssues(section: LayoutSection): FieldIssue[] {
  const filler = section.id === "check-filler" ? "check-filler-2" : "check-filler";
  const result = parseLayoutDocument({
    format: "loftline-layout",
    formatVersion: 1,
    name: "check",
    surface: "dirt",
    trackWidth: 3,
    start: { x: 0, y: 0, headingDeg: 0 },
    sections: [section, { id: filler, kind: "straight", length: 1 }],
    carClasses: ["check"],
  });
  if (result.ok) return [];
  return result.issues
    .filter((i) => i.path.startsWith("sections[0]"))
    .map((i) => ({
      field: i.path.slice("sections[0]".length).replace(/^\./, "") || "section",
      message: i.message,
    }));
}

/**
 * A section's fields changed by a patch, checked; the id must also stay unique in the layout.
 * @returns the changed section, or the issues keyed by field.
 */
export function checkSectionPatch(
  doc: Pick<LayoutDocument, "sections">,
  index: number,
  patch: Partial<LayoutSection>,
): { ok: true; section: LayoutSection } | { ok: false; issues: FieldIssue[] } {
  const old = doc.sections[index];
  if (!old) return { ok: false, issues: [{ field: "section", message: "no longer exists" }] };
  const section = { ...old, ...patch } as LayoutSection;
  const issues = sectionIssues(section);
  if (section.id !== old.id && doc.sections.some((s, i) => i !== index && s.id === section.id)) {
    issues.push({ field: "id", message: "is already used by another section" });
  }
  return issues.length ? { ok: false, issues } : { ok: true, section };
}
