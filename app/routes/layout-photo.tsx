import type { Route } from "./+types/layout-photo";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { receiveUpload, SITE_PHOTO } from "~/storage/uploads.server";

/**
 * Upload of a layout's site photo (multipart field "photo", PNG or JPEG, at most 10 MB), for the
 * club's directors. Answers JSON: 201 {fileId, url}; 400, 413 or 415 with a message naming the
 * field; 401 signed out; 403 for other roles. The editor then places the photo in the document.
 */
export async function action({ request, params }: Route.ActionArgs) {
  if (request.method !== "POST")
    return Response.json({ error: "Send the photo with POST." }, { status: 405, headers: { Allow: "POST" } });
  const { layout, user } = await requireLayoutAccess(request, params.layoutId, "director", { api: true });
  const { fileId } = await receiveUpload(request, SITE_PHOTO, { clubId: layout.clubId, userId: user.id });
  return Response.json({ fileId, url: `/files/${fileId}` }, { status: 201 });
}

export async function loader() {
  return Response.json(
    { error: 'Send the photo with POST as the multipart field "photo".' },
    { status: 405, headers: { Allow: "POST" } },
  );
}
