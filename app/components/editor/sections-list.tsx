import { type ResolvedSection, JUMP_PRESET_LABELS, type LayoutSection } from "~/analysis";
import { turnWord } from "./section-panel";

/** One line describing a section: "Left hairpin 180° R 6.0 m". */
export function describeSection(s: LayoutSection, r?: ResolvedSection): string {
  const name = `${s.name ? ` “${s.name}”` : ""}${s.locked ? " (locked)" : ""}`;
  if (s.kind === "straight") return `Straight ${s.length.toFixed(1)} m${name}`;
  if (s.kind === "turn")
    return `${s.direction === "left" ? "Left" : "Right"} ${turnWord(s.radius, s.angleDeg)} ${s.angleDeg.toFixed(0)}° R ${s.radius.toFixed(1)} m${name}`;
  return `${JUMP_PRESET_LABELS[s.preset]}${r ? ` ${r.length.toFixed(1)} m` : ""}${name}`;
}

/** The lap's sections in order; clicking one selects it (also on the plan). */
export function SectionsList({
  sections,
  resolved,
  selected,
  onSelect,
}: {
  sections: LayoutSection[];
  resolved: ResolvedSection[];
  selected: number | null;
  onSelect(index: number): void;
}) {
  return (
    <ol className="max-h-64 space-y-0.5 overflow-y-auto pr-1 text-sm" aria-label="Sections in lap order">
      {sections.map((s, i) => (
        <li key={s.id}>
          <button
            type="button"
            aria-current={selected === i ? "true" : undefined}
            className={`w-full rounded px-2 py-1 text-left tabular-nums ${selected === i ? "bg-clay-100 font-semibold text-clay-700" : "hover:bg-sand-100"}`}
            onClick={() => onSelect(i)}
          >
            {i + 1}. {describeSection(s, resolved[i])}
          </button>
        </li>
      ))}
    </ol>
  );
}
