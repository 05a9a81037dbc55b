/**
 * The driver's sheet: one A4 portrait page for the pit table or the pocket, for the chosen car and
 * skill. The layout, its version and date, the plan with J1..Jn and M1..Mn, every jump in lap order
 * with every column of the layout page's jumps table, and the cautions. On screen it carries the
 * car and skill pickers and a print button; on paper only the sheet (app/styles/print.css).
 */
import { AnalysisAlert } from "~/components/analysis/analysis-alert";
import { Link } from "react-router";
import { skillPhrase } from "~/analysis";
import { AnalysisPickers } from "~/components/analysis/analysis-pickers";
import { JumpsTable } from "~/components/analysis/jumps-table";
import {
  jumpNames,
  jumpNumbers,
  type LayoutAnalysisData,
} from "~/components/analysis/layout-analysis-section";
import { Cautions } from "~/components/cautions";
import { TrackDrawing } from "~/components/drawing/track-drawing";
import type { VersionBannerReading } from "~/components/publishing/version-banner";
import { raceDateText } from "~/lib/race-date";

export interface DriverSheetProps {
  club: { id: string; name: string };
  layout: { id: string; name: string; version: number };
  reading: VersionBannerReading;
  analysis: LayoutAnalysisData;
}

export function DriverSheet({ club, layout, reading, analysis: d }: DriverSheetProps) {
  const query = `?${new URLSearchParams({ car: d.car, skill: d.skill, ...d.version })}`;
  const jumpHref = (id: string) => `/layouts/${layout.id}/jumps/${encodeURIComponent(id)}${query}`;
  const own = d.cars.find((c) => c.value === d.car)?.own;
  const carLabel = d.classes.find((c) => c.classId === d.classId)?.label ?? d.classId;
  const date = reading.publication?.raceDate;
  return (
    <article className="driver-sheet space-y-4">
      <nav aria-label="Back" className="text-sm print:hidden">
        <Link to={`/clubs/${club.id}`} className="text-pine-700 hover:underline">
          {club.name}
        </Link>
        {" / "}
        <Link to={`/layouts/${layout.id}${query}`} className="text-pine-700 hover:underline">
          {layout.name}
        </Link>
      </nav>
      <header className="space-y-1">
        <h1 className="text-2xl font-semibold print:text-lg">Driver's sheet: {layout.name}</h1>
        <p className="text-sm text-ink-700">
          {club.name} · version {layout.version}
          {date ? ` · race day ${raceDateText(date)}` : ""} · {own ? "your car " : ""}
          <strong>{carLabel}</strong> · verdicts for <strong>{skillPhrase(d.skill)}</strong> · model estimates
        </p>
      </header>
      <div className="flex flex-wrap items-end gap-3 print:hidden">
        <AnalysisPickers
          key={`${d.car}-${d.skill}`}
          cars={d.cars}
          car={d.car}
          skill={d.skill}
          keep={d.version}
        />
        <p className="text-sm text-ink-500">Print this page from your browser (A4 portrait, one page).</p>
      </div>
      <Cautions compact />
      <AnalysisAlert text={d.problems.join(" ")} />
      {d.result.ok ? (
        <Sheet data={d} result={d.result} name={layout.name} jumpHref={jumpHref} />
      ) : (
        <AnalysisAlert text={d.result.message} />
      )}
    </article>
  );
}

function Sheet({
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
  return (
    <>
      <section aria-labelledby="sheet-jumps-heading" className="space-y-1">
        <h2 id="sheet-jumps-heading" className="text-lg font-semibold print:text-base">
          Jumps in lap order ({jumps.length})
        </h2>
        {jumps.length ? (
          <JumpsTable jumps={jumps} numbers={numbers} skill={d.skill} sort={d.sort} jumpHref={jumpHref} />
        ) : (
          <p className="text-sm text-ink-700">This layout has no jumps.</p>
        )}
        <p className="text-xs text-ink-500">
          EFH: equivalent fall height, the drop onto flat ground that would hit as hard as the landing.
          Expected gain: time won per pass by trying the set-up, after the time lost to failed landings (3 s
          each, an estimate).
        </p>
      </section>
      <section aria-labelledby="sheet-plan-heading" className="sheet-plan space-y-1">
        <h2 id="sheet-plan-heading" className="text-lg font-semibold print:text-base">
          Plan
        </h2>
        <TrackDrawing
          overlay={result.overlay}
          site={d.document}
          numbers={numbers}
          names={names}
          jumpHref={jumpHref}
          title={name}
          classLabel={result.chosen.label}
        />
      </section>
    </>
  );
}
