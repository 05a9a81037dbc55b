import type { Route } from "./+types/layout-drawing";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { DrawingViewer } from "~/components/reader/drawing-viewer";
import { readerChoice } from "~/cars/reader-choice.server";
import { readingFor } from "~/layouts/reading.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Plan of ${data?.layout.name ?? "layout"} · Loftline` },
];

/**
 * Any member who may see the layout, at the version they read (marshals and drivers: the race-day
 * version or `?version=n` of a published one; 404 otherwise), opening with their car and skill.
 * The document is read once; the browser asks the analysis API's cached GET for the overlay.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, club, role, user } = await requireLayoutAccess(request, params.layoutId, "member");
  const query = new URL(request.url).searchParams;
  const reading = await readingFor(layout, role, query);
  const choice = await readerChoice(user.id, query, reading.document.carClasses);
  return {
    club,
    layout: { id: layout.id, name: layout.name, status: layout.status },
    document: reading.document,
    canEdit: role === "director",
    shown: {
      version: layout.version,
      read: reading.kind === "draft" ? null : reading.number,
      query: reading.query,
    },
    choice: { car: choice.car, skill: choice.skill, cars: choice.options, problems: choice.problems },
  };
}

export default function LayoutViewRoute({ loaderData }: Route.ComponentProps) {
  return <DrawingViewer {...loaderData} />;
}
