import { Form, Link } from "react-router";
import type { Route } from "./+types/layout-compare";
import { skillPhrase, SKILL_LABELS, SKILL_LEVELS } from "~/analysis";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { readerSkill } from "~/cars/reader-choice.server";
import { Cautions } from "~/components/cautions";
import { CompareDrawing } from "~/components/publishing/compare-drawing";
import {
  ClassComparisonTable,
  LayoutChangesList,
  SectionChangesList,
} from "~/components/publishing/compare-tables";
import { compareVersions } from "~/layouts/compare.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Compare versions · ${data?.layout.name ?? "Layout"} · Loftline` },
];

/**
 * Two versions side by side: `from` and `to` (a saved version's number or "draft"), `skill` for the
 * verdicts. Marshals and drivers compare published versions (404 for anything else); directors
 * any saved version and the working draft.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, club, role, user } = await requireLayoutAccess(request, params.layoutId);
  const query = new URL(request.url).searchParams;
  const skill = await readerSkill(user.id, query);
  const data = await compareVersions(layout, role, query, skill);
  const { result } = data;
  // Numbers for the changed, added and removed sections: the list and the drawing share them.
  const numbers: Record<string, number> = {};
  result?.documents.sections
    .filter((s) => s.kind !== "same")
    .forEach((s, i) => (numbers[s.sectionId] = i + 1));
  return { club, layout: { id: layout.id, name: layout.name }, skill, numbers, ...data };
}

export default function LayoutCompare({ loaderData: d }: Route.ComponentProps) {
  const label = (v: number | "draft" | null) => (v === "draft" ? "the working draft" : `version ${v}`);
  const r = d.result;
  return (
    <article className="space-y-8">
      <header className="space-y-3">
        <p className="text-sm">
          <Link to={`/clubs/${d.club.id}`} className="text-pine-700 hover:underline">
            {d.club.name}
          </Link>
          {" / "}
          <Link to={`/layouts/${d.layout.id}`} className="text-pine-700 hover:underline">
            {d.layout.name}
          </Link>
        </p>
        <h1 className="text-2xl font-semibold">Compare versions</h1>
        <Form method="get" className="flex flex-wrap items-end gap-3">
          {(["from", "to"] as const).map((name) => (
            <div key={name} className="space-y-1">
              <label htmlFor={`cmp-${name}`} className="block text-sm font-medium text-ink-700">
                {name === "from" ? "Older version" : "Newer version"}
              </label>
              <select
                id={`cmp-${name}`}
                name={name}
                defaultValue={String(d[name] ?? "")}
                className="rounded-md border border-ink-300 bg-white px-3 py-2 text-sm"
              >
                {d.options.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </select>
            </div>
          ))}
          <div className="space-y-1">
            <label htmlFor="cmp-skill" className="block text-sm font-medium text-ink-700">
              Driver skill
            </label>
            <select
              id="cmp-skill"
              name="skill"
              defaultValue={d.skill}
              className="rounded-md border border-ink-300 bg-white px-3 py-2 text-sm"
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
            Compare
          </button>
        </Form>
      </header>
      {!r ? (
        <p className="text-ink-700">There is only one version to see, so there is nothing to compare yet.</p>
      ) : (
        <>
          <section aria-labelledby="sections-heading" className="space-y-3">
            <h2 id="sections-heading" className="text-lg font-semibold">
              From {label(d.from)} to {label(d.to)}: {r.documents.counts.added} added,{" "}
              {r.documents.counts.removed} removed, {r.documents.counts.changed} changed
            </h2>
            <div className="grid gap-6 lg:grid-cols-[1.3fr_1fr]">
              <CompareDrawing lines={r.lines} numbers={d.numbers} title={d.layout.name} />
              <div className="space-y-3">
                <SectionChangesList changes={r.documents.sections} numbers={d.numbers} />
                <LayoutChangesList changes={r.documents.layout} />
              </div>
            </div>
          </section>
          <section aria-labelledby="classes-heading" className="space-y-4">
            <h2 id="classes-heading" className="text-lg font-semibold">
              Lap and jump verdicts per class, for {skillPhrase(d.skill)} (model estimates)
            </h2>
            {r.classes.map((c) => (
              <ClassComparisonTable key={c.classId} c={c} numbers={r.jumpNumbers} />
            ))}
          </section>
          <Cautions compact />
        </>
      )}
    </article>
  );
}
