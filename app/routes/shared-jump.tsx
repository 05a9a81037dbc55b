import { data } from "react-router";
import type { Route } from "./+types/shared-jump";
import { jumpName } from "~/components/analysis/format";
import { JumpView } from "~/components/analysis/jump-view";
import { versionAnalysis } from "~/layouts/analysis-page.server";
import { jumpViewData } from "~/layouts/jump-view.server";
import { SHARE_HEADERS, sharedChoice, sharedVersionFor } from "~/layouts/share-access.server";

/** The page is a pure function of its data: kept rendered (app/lib/html-cache.server.ts). */
export const handle = { htmlCache: true };

export const meta: Route.MetaFunction = ({ data }) => [
  {
    title: `${data?.jump ? jumpName(data.jump) : "Jump"} · ${data?.layout.name ?? "Shared layout"} · Loftline`,
  },
  { name: "robots", content: "noindex, nofollow" },
];

export const headers: Route.HeadersFunction = () => SHARE_HEADERS;

/** One jump of a shared layout version, signed out; the same answers as the shared layout page. */
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const shared = await sharedVersionFor(params.token, context?.clientAddress);
  const query = new URL(request.url).searchParams;
  const { document } = shared;
  const choice = sharedChoice(query, document.carClasses);
  const reading = { kind: "published" as const, number: shared.publication.versionNumber, document };
  const page = await versionAnalysis(shared.layout, reading, choice);
  const jump = jumpViewData(page, params.sectionId);
  return data(
    {
      club: { id: "", name: shared.clubName },
      layout: { id: "", name: shared.layout.name },
      version: {},
      ...jump,
    },
    { status: page.problems.length ? 400 : 200, headers: SHARE_HEADERS },
  );
}

export default function SharedJump({ loaderData, params }: Route.ComponentProps) {
  return <JumpView d={loaderData} base={`/shared/${params.token}`} clubLink={false} />;
}
