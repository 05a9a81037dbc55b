import { AnalysisAlert } from "~/components/analysis/analysis-alert";
import { Link } from "react-router";
import { AnalysisPickers, type CarChoiceOption } from "~/components/analysis/analysis-pickers";
import { jumpName } from "~/components/analysis/format";
import { JumpElevation, type ElevationData } from "~/components/analysis/jump-elevation";
import { JumpFacts } from "~/components/analysis/jump-facts";
import { JumpPlanSection } from "~/components/analysis/jump-plan-section";
import { JumpVerdictsTable } from "~/components/analysis/jump-verdicts-table";
import type { SteeringSeries } from "~/components/analysis/steering-chart";
import { VerdictMark } from "~/components/analysis/verdict-mark";
import { Cautions } from "~/components/cautions";
import {
  JUMP_PRESET_LABELS,
  skillPhrase,
  speedSpreadPhrase,
  timingErrorsPhrase,
  verdictKind,
  type JumpAnalysis,
  type SkillLevel,
} from "~/analysis";

export type JumpViewData = {
  club: { id: string; name: string };
  layout: { id: string; name: string };
  classLabel: string;
  skill: SkillLevel;
  car: string;
  cars: CarChoiceOption[];
  version: Record<string, string>;
  problems: string[];
  number: number;
  jump: JumpAnalysis;
  elevation: ElevationData;
  steering: SteeringSeries | null;
  previous: { sectionId: string; name: string } | null;
  next: { sectionId: string; name: string } | null;
};

/**
 * One jump of a layout for a car and skill level: side elevation with the flight, numbers,
 * verdict per skill level and the set-up plan. The jump page and a share link's jump page.
 * @param base the layout's address (its jump pages are under `${base}/jumps/`); `clubLink` false
 *   on a share link's page, which does not link into the club.
 */
export function JumpView({
  d,
  base,
  clubLink = true,
}: {
  d: JumpViewData;
  base: string;
  clubLink?: boolean;
}) {
  const j = d.jump;
  const kind = verdictKind(j.verdicts[d.skill]);
  const q = `?${new URLSearchParams({ car: d.car, skill: d.skill, ...d.version })}`;
  return (
    <article className="space-y-8">
      <header className="space-y-3">
        <p className="text-sm">
          {clubLink ? (
            <Link to={`/clubs/${d.club.id}`} className="text-pine-700 hover:underline">
              {d.club.name}
            </Link>
          ) : (
            d.club.name
          )}
          {" / "}
          <Link to={`${base}${q}`} className="text-pine-700 hover:underline">
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
            key={`${d.car}-${d.skill}`}
            cars={d.cars}
            car={d.car}
            skill={d.skill}
            keep={d.version}
          />
        </div>
        <AnalysisAlert text={d.problems.join(" ")} />
      </header>
      <section aria-labelledby="verdict-heading" className="rounded-lg border border-sand-200 bg-white p-4">
        <h2 id="verdict-heading" className="flex items-center gap-2 text-lg font-semibold">
          <VerdictMark kind={kind} size={18} className="gap-2" />
        </h2>
        <p className="mt-1 text-ink-700">{j.verdict.text}</p>
      </section>
      <Cautions compact />
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
            to={`${base}/jumps/${encodeURIComponent(d.previous.sectionId)}${q}`}
            className="text-pine-700 hover:underline"
          >
            &larr; J{d.number - 1} {d.previous.name}
          </Link>
        ) : (
          <span />
        )}
        {d.next ? (
          <Link
            to={`${base}/jumps/${encodeURIComponent(d.next.sectionId)}${q}`}
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
