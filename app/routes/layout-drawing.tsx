import { data } from "react-router";
import type { Route } from "./+types/layout-drawing";
import { DrawingViewer } from "~/components/reader/drawing-viewer";
import { readerPage } from "~/layouts/reader-page.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Plan of ${data?.layout.name ?? "layout"} · Loftline` },
];

/**
 * Any member who may see the layout, at the version they read (marshals and drivers: the race-day
 * version or `?version=n` of a published one; 404 otherwise), for their car and skill (`car`,
 * `skill`, remembered); a parameter not understood is named on the page (400).
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { status, ...page } = await readerPage(request, params.layoutId);
  return data(page, { status });
}

export default function LayoutViewRoute({ loaderData }: Route.ComponentProps) {
  return <DrawingViewer {...loaderData} />;
}
