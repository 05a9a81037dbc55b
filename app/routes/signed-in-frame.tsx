import { Outlet } from "react-router";
import type { Route } from "./+types/signed-in-frame";
import { requireUser } from "~/auth/permissions.server";

/** Everything under this layout is for signed-in people; each page checks its club role itself. */
export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  return { user };
}

export default function SignedInLayout() {
  return <Outlet />;
}
