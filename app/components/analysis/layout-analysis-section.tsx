import { AnalysisAlert } from "~/components/analysis/analysis-alert";
import { Link } from "react-router";
import {
  skillPhrase,
  type ClassAnalysis,
  type SkillLevel,
  type AnalysisOverlay,
  type LayoutDocument,
} from "~/analysis";
import { Cautions } from "~/components/cautions";
import { AnalysisPickers, type CarChoiceOption } from "./analysis-pickers";
import { AnalysisSummary } from "./analysis-summary";
import { jumpName } from "./format";
import { sortJumps, type JumpSort, type JumpSortKey } from "./jump-sort";
import { JumpsTable } from "./jumps-table";
import { JumpCards } from "./jump-card";
import { TrackDrawing } from "~/components/drawing/track-drawing";
import { RuleChecksTable } from "./rule-checks-table";
import type { SummaryData } from "./summary-data";

export type LayoutAnalysisData = {
  layoutId: string;
  clubId: string;
  isDirector: boolean;
  document: Pick<LayoutDocument, "driverStand" | "marshalPoints" | "siteBoundary" | "trackWidth">;
  classId: string;
  skill: SkillLevel;
  classes: { classId: string; label: string }[];
  /** The chosen car (a class id or "profile:<id>") and the picker's choices. */
  car: string;
  cars: CarChoiceOption[];
  /** The query parameter naming the version read ({} for the reader's default). */
  version: Record<string, string>;
  problems: string[];
  sort: JumpSort;
  result:
    | { ok: true; summary: SummaryData; chosen: ClassAnalysis; overlay: AnalysisOverlay }
    | { ok: false; message: string };
};

/**
 * The layout page's analysis: class and skill pickers, links (export, plan, editor, JSON), the
 * safety cautions, the summary, the plan with speeds, the jumps table and the rule checks.
 */
export function LayoutAnalysisSection({
  data: d,
  layoutName,
  shared,
}: {
  data: LayoutAnalysisData;
  layoutName: string;
  /** A share link's page: jump pages under its own address, and no member tools. */
  shared?: { base: string };
}) {
  const query = (extra: Record<string, string>) => {
    const p = new URLSearchParams({ car: d.car, skill: d.skill, ...d.version, ...extra });
    return `?${p.toString()}`;
  };
  const keep: Record<string, string> = {
    ...d.version,
    ...(d.sort.key === "order" && d.sort.dir === "asc" ? {} : { sort: d.sort.key, dir: d.sort.dir }),
  };
  const jumpHref = (sectionId: string) =>
    `${shared?.base ?? `/layouts/${d.layoutId}`}/jumps/${encodeURIComponent(sectionId)}${query({})}`;
  const sortHref = (key: JumpSortKey, dir: "asc" | "desc") => `${query({ sort: key, dir })}#jumps-heading`;
  return (
    <section aria-labelledby="analysis-heading" className="space-y-8">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h2 id="analysis-heading" className="text-xl font-semibold">
            Analysis
          </h2>
          <p className="text-sm text-ink-500">
            {d.cars.find((c) => c.value === d.car)?.own ? "For your car " : "For the "}
            {d.classes.find((c) => c.classId === d.classId)?.label ?? d.classId}, verdicts for{" "}
            {skillPhrase(d.skill)}. Model estimates.
          </p>
        </div>
        <AnalysisPickers key={`${d.car}-${d.skill}`} cars={d.cars} car={d.car} skill={d.skill} keep={keep} />
      </div>
      <AnalysisAlert text={d.problems.join(" ")} />
      <Cautions compact />
      {d.result.ok ? (
        <section aria-labelledby="cards-heading" className="space-y-2 print:hidden">
          <h2 id="cards-heading" className="text-lg font-semibold">
            Jumps in lap order ({d.result.chosen.jumps.length})
          </h2>
          {d.result.chosen.jumps.length ? (
            <JumpCards
              jumps={d.result.chosen.jumps}
              numbers={jumpNumbers(d.result.chosen.jumps)}
              skill={d.skill}
              jumpHref={jumpHref}
            />
          ) : (
            <p className="text-sm text-ink-700">This layout has no jumps.</p>
          )}
        </section>
      ) : (
        <AnalysisAlert text={d.result.message} />
      )}
      {shared ? null : <ToolLinks data={d} query={query({})} />}
      {d.result.ok ? (
        <Results data={d} result={d.result} layoutName={layoutName} jumpHref={jumpHref} sortHref={sortHref} />
      ) : null}
    </section>
  );
}

function Results({
  data: d,
  result,
  layoutName,
  jumpHref,
  sortHref,
}: {
  data: LayoutAnalysisData;
  result: Extract<LayoutAnalysisData["result"], { ok: true }>;
  layoutName: string;
  jumpHref: (id: string) => string;
  sortHref: (key: JumpSortKey, dir: "asc" | "desc") => string;
}) {
  const jumps = result.chosen.jumps;
  const numbers = jumpNumbers(jumps);
  const names = jumpNames(jumps);
  return (
    <>
      <AnalysisSummary analysis={result.summary} />
      <section aria-labelledby="plan-heading" className="space-y-2">
        <h2 id="plan-heading" className="text-lg font-semibold">
          Plan with speeds
        </h2>
        <TrackDrawing
          overlay={result.overlay}
          site={d.document}
          numbers={numbers}
          names={names}
          jumpHref={jumpHref}
          title={layoutName}
          classLabel={result.chosen.label}
        />
      </section>
      <section aria-labelledby="jumps-heading" className="space-y-2">
        <h2 id="jumps-heading" className="text-lg font-semibold">
          Jumps table ({jumps.length})
        </h2>
        <p className="text-sm text-ink-500 md:hidden print:hidden">
          The cards above carry every column; the sortable table shows on wider screens and on paper.
        </p>
        {jumps.length ? (
          <div className="hidden md:block print:block">
            <JumpsTable
              jumps={sortJumps(jumps, d.sort, d.skill)}
              numbers={numbers}
              skill={d.skill}
              sort={d.sort}
              sortHref={sortHref}
              jumpHref={jumpHref}
            />
          </div>
        ) : (
          <p className="text-sm text-ink-700">This layout has no jumps.</p>
        )}
        <p className="text-xs text-ink-500">
          EFH: equivalent fall height, the drop onto flat ground that would hit as hard as the landing.
          Expected gain: time won per pass by trying the set-up, after the time lost to failed landings (3 s
          each, an estimate).
        </p>
      </section>
      <RuleChecksTable
        report={result.summary.rules}
        settingsHref={d.isDirector ? `/clubs/${d.clubId}/settings` : undefined}
      />
    </>
  );
}

/** Jump numbers in lap order (J1, J2, ...) by section id, as on the plan. */
export function jumpNumbers(jumps: readonly { sectionId: string }[]): Record<string, number> {
  return Object.fromEntries(jumps.map((j, i) => [j.sectionId, i + 1]));
}

/** Each jump's name for the plan's labels, by section id. */
export function jumpNames(jumps: readonly Parameters<typeof jumpName>[0][]): Record<string, string> {
  return Object.fromEntries(jumps.map((j) => [j.sectionId, jumpName(j)]));
}

/** Links to the plan, the driver's sheet, the editor (directors), the layout file and the JSON. */
function ToolLinks({ data: d, query }: { data: LayoutAnalysisData; query: string }) {
  const link = "text-pine-700 hover:underline";
  return (
    <nav aria-label="Layout tools" className="flex flex-wrap gap-x-5 gap-y-2 text-sm print:hidden">
      <Link to={`/layouts/${d.layoutId}/plan${query}`} className={link}>
        Open the plan
      </Link>
      <Link to={`/layouts/${d.layoutId}/driver-sheet${query}`} className={link}>
        Driver's sheet (one page to print)
      </Link>
      {d.isDirector ? (
        <Link to={`/layouts/${d.layoutId}/edit`} className={link}>
          Edit the drawing
        </Link>
      ) : null}
      <a
        href={`/layouts/${d.layoutId}/export${d.version.version ? `?version=${d.version.version}` : ""}`}
        download
        className={link}
      >
        Export the layout file (.json)
      </a>
      <a href={`/api/layouts/${d.layoutId}/analysis${query}`} className={link}>
        This analysis as JSON
      </a>
    </nav>
  );
}
