import type { Route } from "./+types/api-layout";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { readingFor } from "~/layouts/reading.server";

/**
 * GET /api/layouts/:layoutId[?version=n]: the document of the version the caller reads (marshals
 * and drivers: the race-day version or a published `version`; directors: the working draft or any
 * saved version) in the product's own format. Same permissions as the layout page, answered as
 * JSON: 401 signed out, 403 for non-members, 404 for a missing layout (or a draft or unpublished
 * version, for anyone but a director), 400 for a bad `version`.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, role } = await requireLayoutAccess(request, params.layoutId, "member", { api: true });
  const reading = await readingFor(layout, role, new URL(request.url).searchParams, { api: true });
  const { document, number: versionNumber } = reading;
  return Response.json(
    {
      layoutId: layout.id,
      clubId: layout.clubId,
      status: layout.status,
      /** The layout's version counter (every save or change adds one). */
      version: layout.version,
      /** Number of the stored document version, null while nothing has been drawn. */
      documentVersion: versionNumber,
      /** The publication of this version (race date, note, withdrawn), or null for a draft. */
      published: reading.publication
        ? {
            versionNumber: reading.publication.versionNumber,
            raceDate: reading.publication.raceDate,
            note: reading.publication.note,
            withdrawn: reading.publication.withdrawnAt !== null,
          }
        : null,
      document,
    },
    { headers: { "Cache-Control": "private, no-cache" } },
  );
}
