import type { Route } from "./+types/layout-drawing";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { DrawingViewer } from "~/components/reader/drawing-viewer";
import { loadLayoutDocument } from "~/layouts/documents.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Plan of ${data?.layout.name ?? "layout"} · Loftline` },
];

/** Any member who may see the layout (marshals and drivers: published ones; 404 otherwise). */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, club, role } = await requireLayoutAccess(request, params.layoutId, "member");
  const { document } = await loadLayoutDocument(layout);
  return {
    club,
    layout: { id: layout.id, name: layout.name, status: layout.status },
    document,
    canEdit: role === "director",
  };
}

export default function LayoutViewRoute({ loaderData }: Route.ComponentProps) {
  return <DrawingViewer {...loaderData} />;
}
