import { redirect } from "react-router";
import type { Route } from "./+types/layout-settings";
import { requireLayoutAccess } from "~/auth/permissions.server";

/**
 * The settings live on the layout page itself (docs/decisions/0354-layout-settings-on-the-page.md).
 * This address stays for links and bookmarks: directors go to the details form there.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout } = await requireLayoutAccess(request, params.layoutId, "director");
  throw redirect(`/layouts/${layout.id}#details`);
}

export default function LayoutSettings() {
  return null;
}
