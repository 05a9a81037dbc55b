import { data, Link } from "react-router";
import type { Route } from "./+types/layout-import";
import { requireClubRole } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { ImportForm } from "~/components/analysis/import-form";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import { readLayoutImport } from "~/layouts/import.server";

export const meta: Route.MetaFunction = () => [{ title: "Import a layout · Loftline" }];

/** Directors only: the import form (the club's layout list has the same form). */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { club } = await requireClubRole(request, params.clubId, "director");
  return { club };
}

/**
 * Imports a layout file as a new draft. An invalid file is refused with every problem named by its
 * field (400), a file over 1 MB with 413; in both cases nothing is created.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const { club, user } = await requireClubRole(request, params.clubId, "director");
  const reading = await readLayoutImport(request, club.id);
  if (!reading.ok) {
    const { status, field, message, issues, pasted } = reading;
    return data({ field, message, issues, pasted }, { status });
  }
  const layout = await createLayoutFromDocument(club.id, reading.document, user.id);
  const notice = [`${reading.document.name} is imported as a draft.`, ...reading.notes].join(" ");
  throw await redirectWithNotice(request, `/layouts/${layout.id}`, notice);
}

export default function LayoutImport({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <section aria-labelledby="import-heading" className="max-w-2xl">
      <h2 id="import-heading" className="text-lg font-semibold">
        Import a layout
      </h2>
      <p className="mt-1 text-sm text-ink-700">
        A layout file is the .json file Loftline exports from a layout page (the format is described in the
        layout file guide). The import becomes a new draft that only race directors see; nothing existing is
        changed.
      </p>
      <ImportForm clubId={loaderData.club.id} result={actionData} />
      <p className="mt-4 text-sm">
        <Link to={`/clubs/${loaderData.club.id}`} className="text-pine-700 hover:underline">
          Back to the layouts
        </Link>
      </p>
    </section>
  );
}
