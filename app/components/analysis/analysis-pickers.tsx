import { Form } from "react-router";
import { SKILL_LABELS, SKILL_LEVELS, type SkillLevel } from "~/analysis";

export type CarChoiceOption = { value: string; label: string; own: boolean };

/**
 * Car and skill level pickers as a plain GET form (works without JavaScript: the Show button
 * submits; with JavaScript a change submits at once and the router fetches the page's loader, no
 * reload). The car is one of the layout's classes or one of the reader's own car profiles
 * (`car=profile:<id>`). Keeps the table's sort order and the version read.
 */
export function AnalysisPickers({
  cars,
  car,
  skill,
  keep = {},
}: {
  cars: CarChoiceOption[];
  /** The chosen car: a class id or "profile:<id>". */
  car: string;
  skill: SkillLevel;
  /** Other query parameters to keep (sort order, version), by name. */
  keep?: Record<string, string>;
}) {
  const classes = cars.filter((c) => !c.own);
  const own = cars.filter((c) => c.own);
  return (
    <Form method="get" className="flex flex-wrap items-end gap-3 print:hidden" preventScrollReset>
      {Object.entries(keep).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      <div className="space-y-1">
        <label htmlFor="pick-class" className="block text-sm font-medium text-ink-700">
          Car
        </label>
        <select
          id="pick-class"
          name="car"
          defaultValue={car}
          className="max-w-[16rem] rounded-md border border-ink-300 bg-white px-3 py-2 text-sm"
          onChange={(e) => e.currentTarget.form?.requestSubmit()}
        >
          <optgroup label="Car classes (estimates)">
            {classes.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </optgroup>
          {own.length ? (
            <optgroup label="Your cars">
              {own.map((c) => (
                <option key={c.value} value={c.value}>
                  {c.label}
                </option>
              ))}
            </optgroup>
          ) : null}
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
