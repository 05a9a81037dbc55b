import type { Route } from "./+types/profile-export";
import { carProfileFile } from "~/analysis";
import { requireUser } from "~/auth/permissions.server";
import { getOwnProfile } from "~/cars/profiles.server";
import { exportFileName } from "~/lib/layout-file-name";

/**
 * GET /profiles/:profileId/export: the owner's car profile as a .json file (the command line's
 * `analyse --car FILE`). 401 signed out, 404 for anyone else's profile.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request, { api: true });
  const stored = await getOwnProfile(user.id, params.profileId);
  if (!stored) return Response.json({ error: "No such car profile of yours." }, { status: 404 });
  const name = exportFileName(stored.profile.label, 1).replace(/-v1\.loftline\.json$/, ".loftline-car.json");
  return new Response(`${JSON.stringify(carProfileFile(stored.profile), null, 2)}\n`, {
    headers: {
      "Content-Type": "application/json; charset=utf-8",
      "Content-Disposition": `attachment; filename="${name}"; filename*=UTF-8''${encodeURIComponent(name)}`,
      "Cache-Control": "private, no-cache",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
