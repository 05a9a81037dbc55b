import { useMemo } from "react";
import { withUnpackedOverlay } from "~/lib/packed-line";
import { data } from "react-router";
import type { Route } from "./+types/shared-layout";
import { parseJumpSort } from "~/components/analysis/jump-sort";
import { LayoutAnalysisSection } from "~/components/analysis/layout-analysis-section";
import { SharedHeader } from "~/components/publishing/shared-header";
import { versionAnalysis } from "~/layouts/analysis-page.server";
import { SHARE_HEADERS, sharedChoice, sharedVersionFor } from "~/layouts/share-access.server";

/** The page is a pure function of its data: kept rendered (app/lib/html-cache.server.ts). */
export const handle = { htmlCache: true };

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${data?.layoutName ?? "Shared layout"} · Loftline` },
  { name: "robots", content: "noindex, nofollow" },
];

export const headers: Route.HeadersFunction = () => SHARE_HEADERS;

/**
 * A layout version a director shared by link, signed out: the published plan, the jumps and their
 * verdicts for a class and skill from the address. Nothing about the club's members. 404 for a
 * link that is unknown, revoked or of a withdrawn version; 429 past the rate limit.
 */
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const shared = await sharedVersionFor(params.token, context?.clientAddress);
  const query = new URL(request.url).searchParams;
  const { document } = shared;
  const choice = sharedChoice(query, document.carClasses);
  const reading = { kind: "published" as const, number: shared.publication.versionNumber, document };
  const page = await versionAnalysis(shared.layout, reading, choice);
  const sort = parseJumpSort(query);
  const problems = sort.problem ? [...page.problems, sort.problem] : page.problems;
  const { driverStand, marshalPoints, siteBoundary, trackWidth } = document;
  const analysis = {
    layoutId: "",
    clubId: "",
    isDirector: false,
    document: { driverStand, marshalPoints, siteBoundary, trackWidth },
    classId: page.classId,
    skill: page.skill,
    classes: page.classes,
    car: page.car,
    cars: page.cars,
    version: {},
    problems,
    sort,
    result: page.result,
  };
  return data(
    { layoutName: shared.layout.name, clubName: shared.clubName, publication: shared.publication, analysis },
    { status: problems.length ? 400 : 200, headers: SHARE_HEADERS },
  );
}

export default function SharedLayout({ loaderData: d, params }: Route.ComponentProps) {
  // The racing line travels as one text (app/lib/packed-line.ts): unpacked once per data.
  const unpacked = useMemo(() => withUnpackedOverlay(d.analysis), [d.analysis]);
  return (
    <article className="space-y-8">
      <SharedHeader layoutName={d.layoutName} clubName={d.clubName} publication={d.publication} />
      <LayoutAnalysisSection
        data={unpacked}
        layoutName={d.layoutName}
        shared={{ base: `/shared/${params.token}` }}
      />
    </article>
  );
}
