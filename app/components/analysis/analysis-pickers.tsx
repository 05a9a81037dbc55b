import { Form } from "react-router";
import { SKILL_LABELS, SKILL_LEVELS, type SkillLevel } from "~/analysis";

/**
 * Car class and skill level pickers as a plain GET form (works without JavaScript: the Show button
 * submits; with JavaScript a change submits at once). Keeps the table's sort order.
 */
export function AnalysisPickers({
  classes,
  classId,
  skill,
  keep = {},
}: {
  classes: { classId: string; label: string }[];
  classId: string;
  skill: SkillLevel;
  /** Other query parameters to keep (sort order), by name. */
  keep?: Record<string, string>;
}) {
  return (
    <Form method="get" className="flex flex-wrap items-end gap-3" preventScrollReset>
      {Object.entries(keep).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      <div className="space-y-1">
        <label htmlFor="pick-class" className="block text-sm font-medium text-ink-700">
          Car class
        </label>
        <select
          id="pick-class"
          name="class"
          defaultValue={classId}
          className="rounded-md border border-ink-300 bg-white px-3 py-2 text-sm"
          onChange={(e) => e.currentTarget.form?.requestSubmit()}
        >
          {classes.map((c) => (
            <option key={c.classId} value={c.classId}>
              {c.label}
            </option>
          ))}
        </select>
      </div>
      <div className="space-y-1">
        <label htmlFor="pick-skill" className="block text-sm font-medium text-ink-700">
          Driver skill
        </label>
        <select
          id="pick-skill"
          name="skill"
          defaultValue={skill}
          className="rounded-md border border-ink-300 bg-white px-3 py-2 text-sm"
          onChange={(e) => e.currentTarget.form?.requestSubmit()}
        >
          {SKILL_LEVELS.map((s) => (
            <option key={s} value={s}>
              {SKILL_LABELS[s]}
            </option>
          ))}
        </select>
      </div>
      <button
        type="submit"
        className="rounded-md border border-ink-300 bg-white px-3 py-2 text-sm hover:bg-sand-100"
      >
        Show
      </button>
    </Form>
  );
}
