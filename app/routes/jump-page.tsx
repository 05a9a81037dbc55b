import { data } from "react-router";
import type { Route } from "./+types/jump-page";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { readerChoice } from "~/cars/reader-choice.server";
import { jumpName } from "~/components/analysis/format";
import { JumpView } from "~/components/analysis/jump-view";
import { pageAnalysis } from "~/layouts/analysis-page.server";
import { jumpViewData } from "~/layouts/jump-view.server";
import { readingFor } from "~/layouts/reading.server";

/** The page is a pure function of its data: kept rendered (app/lib/html-cache.server.ts). */
export const handle = { htmlCache: true };

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${data?.jump ? jumpName(data.jump) : "Jump"} · ${data?.layout.name ?? "Layout"} · Loftline` },
];

/**
 * One jump of a layout for a car class and skill level: side elevation with the flight, numbers,
 * verdict per skill level and the set-up plan. Same permissions, version (`?version=n`) and car
 * choice (`car`, `skill`, remembered) as the layout page; 404 for a section that is not a jump of
 * the version read.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, club, role, user, guidance } = await requireLayoutAccess(request, params.layoutId);
  const query = new URL(request.url).searchParams;
  const reading = await readingFor(layout, role, query);
  const choice = await readerChoice(user.id, query, reading.document.carClasses);
  const page = await pageAnalysis(layout, query, { reading, choice, guidance });
  const jump = jumpViewData(page, params.sectionId, choice.own?.car);
  return data(
    { club, layout: { id: layout.id, name: layout.name }, version: reading.query, ...jump },
    { status: page.problems.length ? 400 : 200 },
  );
}

export default function JumpPage({ loaderData }: Route.ComponentProps) {
  return <JumpView d={loaderData} base={`/layouts/${loaderData.layout.id}`} />;
}
