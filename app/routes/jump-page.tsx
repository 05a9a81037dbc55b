import { data, Link } from "react-router";
import type { Route } from "./+types/jump-page";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { AnalysisPickers } from "~/components/analysis/analysis-pickers";
import { jumpName } from "~/components/analysis/format";
import { JumpElevation } from "~/components/analysis/jump-elevation";
import { JumpFacts } from "~/components/analysis/jump-facts";
import { JumpPlanSection } from "~/components/analysis/jump-plan-section";
import { JumpVerdictsTable } from "~/components/analysis/jump-verdicts-table";
import { VerdictMark } from "~/components/analysis/verdict-mark";
import { Cautions } from "~/components/cautions";
import { pageAnalysis } from "~/layouts/analysis-page.server";
import { elevationData, steeringSeries } from "~/layouts/jump-page.server";
import {
  JUMP_PRESET_LABELS,
  skillPhrase,
  speedSpreadPhrase,
  timingErrorsPhrase,
  verdictKind,
  type JumpSection,
} from "~/analysis";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${data?.jump ? jumpName(data.jump) : "Jump"} · ${data?.layout.name ?? "Layout"} · Loftline` },
];

/**
 * One jump of a layout for a car class and skill level: side elevation with the flight, numbers,
 * verdict per skill level and the set-up plan. Same permissions as the layout page; 404 for a
 * section that is not a jump of the layout.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, club } = await requireLayoutAccess(request, params.layoutId);
  const page = await pageAnalysis(layout, new URL(request.url).searchParams);
  const section = page.document.sections.find((s) => s.id === params.sectionId);
  if (!section || section.kind !== "jump")
    throw new Response("No such jump in this layout.", {
      status: 404,
      statusText: "No such jump in this layout.",
    });
  if (!page.result.ok)
    throw new Response(page.result.message, { status: 422, statusText: page.result.message });
  const jumps = page.result.chosen.jumps;
  const index = jumps.findIndex((j) => j.sectionId === section.id);
  const jump = jumps[index];
  const neighbour = (i: number) =>
    jumps[i] ? { sectionId: jumps[i].sectionId, name: jumpName(jumps[i]) } : null;
  return data(
    {
      club,
      layout: { id: layout.id, name: layout.name },
      classId: page.classId,
      classLabel: page.result.chosen.label,
      skill: page.skill,
      classes: page.classes,
      problems: page.problems,
      number: index + 1,
      jump,
      elevation: elevationData(section as JumpSection, jump),
      steering: steeringSeries(jump.plan, page.classId, jump.airtime),
      previous: neighbour(index - 1),
      next: neighbour(index + 1),
    },
    { status: page.problems.length ? 400 : 200 },
  );
}

export default function JumpPage({ loaderData: d }: Route.ComponentProps) {
  const j = d.jump;
  const kind = verdictKind(j.verdicts[d.skill]);
  const q = `?${new URLSearchParams({ class: d.classId, skill: d.skill })}`;
  return (
    <article className="space-y-8">
      <header className="space-y-3">
        <p className="text-sm">
          <Link to={`/clubs/${d.club.id}`} className="text-pine-700 hover:underline">
            {d.club.name}
          </Link>
          {" / "}
          <Link to={`/layouts/${d.layout.id}${q}`} className="text-pine-700 hover:underline">
            {d.layout.name}
          </Link>
        </p>
        <div className="flex flex-wrap items-end justify-between gap-4">
          <div>
            <h1 className="text-2xl font-semibold">
              J{d.number} {jumpName(j)}
            </h1>
            <p className="text-sm text-ink-500">
              {JUMP_PRESET_LABELS[j.preset]} · {d.classLabel} · verdicts for {skillPhrase(d.skill)} · model
              estimates
            </p>
          </div>
          <AnalysisPickers
            key={`${d.classId}-${d.skill}`}
            classes={d.classes}
            classId={d.classId}
            skill={d.skill}
          />
        </div>
        {d.problems.length ? (
          <p role="alert" className="rounded-md bg-danger-100 px-3 py-2 text-sm text-danger-700">
            {d.problems.join(" ")}
          </p>
        ) : null}
      </header>
      <section aria-labelledby="verdict-heading" className="rounded-lg border border-sand-200 bg-white p-4">
        <h2 id="verdict-heading" className="flex items-center gap-2 text-lg font-semibold">
          <VerdictMark kind={kind} size={18} className="gap-2" />
        </h2>
        <p className="mt-1 text-ink-700">{j.verdict.text}</p>
      </section>
      <Cautions headingLevel={2} />
      <section aria-labelledby="elevation-heading" className="space-y-2">
        <h2 id="elevation-heading" className="text-lg font-semibold">
          Side elevation and flight
        </h2>
        <JumpElevation e={d.elevation} name={jumpName(j)} />
      </section>
      <div className="space-y-8">
        <section aria-labelledby="numbers-heading" className="max-w-3xl space-y-2">
          <h2 id="numbers-heading" className="text-lg font-semibold">
            Numbers (estimates)
          </h2>
          <JumpFacts jump={j} />
        </section>
        <section aria-labelledby="skills-heading" className="space-y-2">
          <h2 id="skills-heading" className="text-lg font-semibold">
            Verdict per skill level
          </h2>
          <JumpVerdictsTable jump={j} />
        </section>
      </div>
      <JumpPlanSection jump={j} steering={d.steering} skill={d.skill} />
      <Assumptions />
      <nav aria-label="Other jumps" className="flex flex-wrap justify-between gap-3 text-sm">
        {d.previous ? (
          <Link
            to={`/layouts/${d.layout.id}/jumps/${encodeURIComponent(d.previous.sectionId)}${q}`}
            className="text-pine-700 hover:underline"
          >
            &larr; J{d.number - 1} {d.previous.name}
          </Link>
        ) : (
          <span />
        )}
        {d.next ? (
          <Link
            to={`/layouts/${d.layout.id}/jumps/${encodeURIComponent(d.next.sectionId)}${q}`}
            className="text-pine-700 hover:underline"
          >
            J{d.number + 1} {d.next.name} &rarr;
          </Link>
        ) : null}
      </nav>
    </article>
  );
}

function Assumptions() {
  return (
    <section aria-labelledby="assumptions-heading" className="space-y-2 text-sm text-ink-700">
      <h2 id="assumptions-heading" className="text-lg font-semibold text-ink-900">
        What these numbers assume
      </h2>
      <ul className="list-disc space-y-1 pl-5">
        <li>
          The car takes off at the planned speed along the face, as a point mass with air drag; the class data
          are estimates, not measurements.
        </li>
        <li>
          The planned speed lands a third of the way down the landing ramp, or is the most the approach allows
          if that is less.
        </li>
        <li>
          In the air the car is a rigid body with spinning wheels: steering rolls and turns it, brake drops
          the nose, throttle raises it.
        </li>
        <li>Driver timing errors: {timingErrorsPhrase()} (estimates); a failed landing costs about 3 s.</li>
        <li>
          Takeoff speed from one pass to the next varies by {speedSpreadPhrase()}: estimates of what is left
          after the driver's own correction in the air by eye, which the model does not simulate.
        </li>
        <li>A jump lands into a turn when the turn starts within half a second of travel after touchdown.</li>
      </ul>
    </section>
  );
}
