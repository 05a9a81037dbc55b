import type { Route } from "./+types/file";
import { requireClubRole, requireUser } from "~/auth/permissions.server";
import { findStoredFile, openStoredFile } from "~/storage/uploads.server";

/**
 * A stored file (a site photo) for members of the club that uploaded it. Anyone else gets 404, so
 * a file id reveals nothing. File ids never change content, so browsers may keep them privately.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request, { api: true });
  const notFound = () => Response.json({ error: "No such file." }, { status: 404 });
  const file = params.fileId ? await findStoredFile(params.fileId) : null;
  if (!file) throw notFound();
  try {
    await requireClubRole(request, file.clubId, "member", { api: true });
  } catch (error) {
    if (error instanceof Response && (error.status === 403 || error.status === 404)) throw notFound();
    throw error;
  }
  // Opened only after the permission check; streamed from the store (503 when it is down).
  const opened = await openStoredFile(file.storageKey);
  if (!opened) throw notFound();
  return new Response(opened.body, {
    headers: {
      "Content-Type": file.contentType,
      "Content-Length": String(opened.size),
      "Cache-Control": "private, max-age=31536000, immutable",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
