/**
 * The plan for readers (marshals, drivers, directors who only want to look): the layout page's
 * static drawing (the same symbols, J1..Jn and M1..Mn placed by the one label placer), drawn on
 * the server for the reader's car and skill, larger, with the jumps as cards beside it. No editor
 * canvas, handles or status lines; the car and skill pickers are a GET form, so the page works
 * without JavaScript and prints as it reads (docs/decisions/0812-reader-plan-drawn-on-the-server.md).
 */
import { AnalysisAlert } from "~/components/analysis/analysis-alert";
import { Link } from "react-router";
import { skillPhrase } from "~/analysis";
import { AnalysisPickers } from "~/components/analysis/analysis-pickers";
import { JumpCards } from "~/components/analysis/jump-card";
import { JumpsTable } from "~/components/analysis/jumps-table";
import {
  jumpNames,
  jumpNumbers,
  type LayoutAnalysisData,
} from "~/components/analysis/layout-analysis-section";
import { Cautions } from "~/components/cautions";
import { DrawingTitle } from "~/components/drawing/drawing-title";
import { TrackDrawing } from "~/components/drawing/track-drawing";
import { VersionBanner, type VersionBannerReading } from "~/components/publishing/version-banner";

export interface DrawingViewerProps {
  club: { id: string; name: string };
  layout: { id: string; name: string; status: string };
  isDirector: boolean;
  reading: VersionBannerReading;
  analysis: LayoutAnalysisData;
}

export function DrawingViewer({ club, layout, isDirector, reading, analysis: d }: DrawingViewerProps) {
  const query = `?${new URLSearchParams({ car: d.car, skill: d.skill, ...d.version })}`;
  const jumpHref = (id: string) => `/layouts/${layout.id}/jumps/${encodeURIComponent(id)}${query}`;
  const own = d.cars.find((c) => c.value === d.car)?.own;
  const carLabel = d.classes.find((c) => c.classId === d.classId)?.label ?? d.classId;
  const links = [{ to: `/layouts/${layout.id}/driver-sheet${query}`, label: "Driver's sheet" }];
  return (
    <article className="reader-plan space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-x-4 gap-y-3">
        <div className="min-w-0">
          <DrawingTitle club={club} layoutId={layout.id} heading={`Plan of ${layout.name}`} links={links} />
          <p className="text-sm text-ink-500">
            {own ? "For your car " : "For the "}
            {carLabel}, verdicts for {skillPhrase(d.skill)}. Model estimates.
          </p>
        </div>
        <div className="flex flex-wrap items-end gap-3">
          <AnalysisPickers
            key={`${d.car}-${d.skill}`}
            cars={d.cars}
            car={d.car}
            skill={d.skill}
            keep={d.version}
          />
          {isDirector ? (
            <Link
              to={`/layouts/${layout.id}/edit`}
              className="rounded-md bg-pine-700 px-3 py-2 text-sm font-medium text-white hover:bg-pine-800 print:hidden"
            >
              Edit the layout
            </Link>
          ) : null}
        </div>
      </header>
      <VersionBanner layoutId={layout.id} reading={reading} isDirector={isDirector} />
      <AnalysisAlert text={d.problems.join(" ")} />
      <Cautions compact />
      {d.result.ok ? (
        <Plan data={d} result={d.result} name={layout.name} jumpHref={jumpHref} />
      ) : (
        <AnalysisAlert text={d.result.message} />
      )}
    </article>
  );
}

function Plan({
  data: d,
  result,
  name,
  jumpHref,
}: {
  data: LayoutAnalysisData;
  result: Extract<LayoutAnalysisData["result"], { ok: true }>;
  name: string;
  jumpHref: (id: string) => string;
}) {
  const jumps = result.chosen.jumps;
  const numbers = jumpNumbers(jumps);
  const names = jumpNames(jumps);
  const marshals = d.document.marshalPoints;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem] print:block">
      <TrackDrawing
        overlay={result.overlay}
        site={d.document}
        numbers={numbers}
        names={names}
        jumpHref={jumpHref}
        title={name}
        classLabel={result.chosen.label}
      />
      <div className="space-y-4">
        <section aria-labelledby="plan-jumps-heading" className="space-y-2">
          <h2 id="plan-jumps-heading" className="text-lg font-semibold">
            Jumps in lap order ({jumps.length})
          </h2>
          {jumps.length ? (
            <>
              <div className="lg:[&_ol]:grid-cols-1 print:hidden">
                <JumpCards jumps={jumps} numbers={numbers} skill={d.skill} jumpHref={jumpHref} />
              </div>
              <div className="hidden print:block">
                <JumpsTable
                  jumps={jumps}
                  numbers={numbers}
                  skill={d.skill}
                  sort={d.sort}
                  jumpHref={jumpHref}
                />
              </div>
            </>
          ) : (
            <p className="text-sm text-ink-700">This layout has no jumps.</p>
          )}
        </section>
        {marshals.length ? (
          <section aria-labelledby="plan-marshals-heading" className="space-y-1 text-sm print-keep">
            <h2 id="plan-marshals-heading" className="text-lg font-semibold">
              Marshal points ({marshals.length})
            </h2>
            <p className="text-ink-700">
              M1 to M{marshals.length} on the plan. Stand out of the overshoot zone beyond landings and off
              the outside of fast turns, stay low and face the traffic.
            </p>
          </section>
        ) : null}
      </div>
    </div>
  );
}
