import { data, isRouteErrorResponse, Link, type ShouldRevalidateFunctionArgs } from "react-router";
import type { Route } from "./+types/layout-editor";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { LayoutEditor } from "~/components/editor/layout-editor";
import {
  createLayoutFromDocument,
  loadLayoutDocument,
  saveLayoutDocument,
  StaleVersionError,
} from "~/layouts/documents.server";
import { currentPublication, listPublications } from "~/layouts/publications.server";
import { parseSaveRequest } from "~/lib/editor/save-request";
import { describeFirstIssue, refuseDocument } from "~/layouts/document-checks.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Edit ${data?.layout.name ?? "layout"} · Loftline` },
];

/** The club's directors edit; everyone else is refused (403) by requireLayoutAccess. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, club } = await requireLayoutAccess(request, params.layoutId, "director");
  const [{ document }, publications] = await Promise.all([
    loadLayoutDocument(layout),
    listPublications(layout.id),
  ]);
  const current = currentPublication(publications);
  return {
    club,
    layout: { id: layout.id, name: layout.name, status: layout.status },
    document,
    version: layout.version,
    // Saves go to the working draft: the editor says which version drivers and marshals read.
    raceDay: current ? { number: current.versionNumber, raceDate: current.raceDate } : null,
  };
}

/** Largest save body, bytes: a 500-section layout with long free profiles stays well below it. */
const MAX_BODY_BYTES = 5 * 1024 * 1024;

/**
 * Saves the drawing as a new version ("save", naming the version it started from; 409 when someone
 * saved meanwhile) or as a new layout ("save-copy"). Answers JSON, never throws at the editor: 400
 * naming the field (also what the analysis would refuse: an unknown class, a jump that cannot be
 * flown, another club's photo), 401 signed out, 403 for other roles, 409 stale, 413 too large,
 * 415 wrong type, 422 over the analysis budget.
 */
export async function action({ request, params }: Route.ActionArgs) {
  try {
    const { layout, club, user } = await requireLayoutAccess(request, params.layoutId, "director", {
      api: true,
    });
    const body = await readBody(request);
    const parsed = parseSaveRequest(body);
    if (!parsed.ok)
      return data(
        {
          ok: false as const,
          error: parsed.error,
          issues: parsed.issues,
          field: parsed.issues[0]?.path ?? null,
        },
        { status: 400 },
      );
    const { intent, document, baseVersion, note } = parsed.request;
    // The same checks as the analysis and the import: known classes, flyable jumps, the club's photo, the budget.
    const refused = await refuseDocument(document, club.id);
    if (refused)
      return data(
        {
          ok: false as const,
          error: `Not saved: ${describeFirstIssue(refused.issues)}.`,
          issues: refused.issues,
          field: refused.issues[0].path,
        },
        { status: refused.status },
      );
    if (intent === "save-copy") {
      const copy = await createLayoutFromDocument(
        club.id,
        { ...document, name: copyName(document.name) },
        user.id,
        "Saved as a copy from the editor",
      );
      return data(
        { ok: true as const, intent, layoutId: copy.id, url: `/layouts/${copy.id}/edit`, name: copy.name },
        { status: 201 },
      );
    }
    try {
      const { version } = await saveLayoutDocument(layout.id, baseVersion!, document, user.id, note);
      return { ok: true as const, intent, version };
    } catch (error) {
      if (!(error instanceof StaleVersionError)) throw error;
      const message = `Not saved: someone else saved this layout after you opened it (you started from version ${error.expected}; it is now at version ${error.current}). Your drawing is still here: reload the saved version (your drawing stays one undo step back) or save yours as a copy.`;
      return data(
        {
          ok: false as const,
          error: message,
          field: "baseVersion",
          conflict: { yours: error.expected, current: error.current },
        },
        { status: 409 },
      );
    }
  } catch (error) {
    if (error instanceof Response) return asData(error);
    throw error;
  }
}

/** Reads a JSON body or form fields; refuses other types (415) and oversized bodies (413). */
async function readBody(request: Request): Promise<unknown> {
  const type = request.headers.get("Content-Type") ?? "";
  if (Number(request.headers.get("Content-Length") ?? 0) > MAX_BODY_BYTES) throw tooLarge();
  if (type.startsWith("application/json")) {
    const text = await request.text();
    if (text.length > MAX_BODY_BYTES) throw tooLarge();
    try {
      return JSON.parse(text);
    } catch {
      throw Response.json(
        { ok: false, error: "The body is not valid JSON.", field: "(body)" },
        { status: 400 },
      );
    }
  }
  if (type.startsWith("application/x-www-form-urlencoded") || type.startsWith("multipart/form-data")) {
    return Object.fromEntries(await request.formData());
  }
  throw Response.json(
    { ok: false, error: "Send the layout as JSON (application/json) or as form fields.", field: "(body)" },
    { status: 415 },
  );
}

function tooLarge() {
  return Response.json(
    {
      ok: false,
      error: `The layout is too large to save: at most ${MAX_BODY_BYTES / (1024 * 1024)} MB.`,
      field: "document",
    },
    { status: 413 },
  );
}

/** A thrown JSON Response (401, 403, 404, 413, 415) as returned data, so the editor stays on screen. */
async function asData(response: Response) {
  const body = await response.json().catch(() => ({ error: response.statusText || "Refused." }));
  return data(
    {
      ok: false as const,
      error: String(body.error ?? "Refused."),
      field: (body.field as string | undefined) ?? null,
    },
    { status: response.status },
  );
}

function copyName(name: string): string {
  return `${name} (copy)`.slice(0, 100);
}

/** The drawing lives in the browser: a save or a check of the analysis never reloads it. */
export function shouldRevalidate({ formMethod, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) {
  return formMethod && formMethod !== "GET" ? false : defaultShouldRevalidate;
}

export default function LayoutEditorRoute({ loaderData }: Route.ComponentProps) {
  // A new layout (the copy, say) gets a fresh editor, not the last one's state.
  return <LayoutEditor key={loaderData.layout.id} {...loaderData} />;
}

export function ErrorBoundary({ error, params }: Route.ErrorBoundaryProps) {
  const status = isRouteErrorResponse(error) ? error.status : 500;
  return (
    <section className="mx-auto max-w-lg py-16 text-center">
      <p className="text-sm font-semibold text-clay-700">Error {status}</p>
      <h1 className="mt-2 text-2xl font-semibold">
        {status === 403
          ? "Only the club's race directors edit layouts"
          : status === 404
            ? "Not found"
            : "The editor stopped"}
      </h1>
      <p className="mt-3 text-ink-700">
        {status === 403 || status === 404
          ? "You can still look at published layouts of your club."
          : "Unsaved changes are kept in this browser: open the editor again and it offers to bring them back."}
      </p>
      <p className="mt-6 flex justify-center gap-4">
        {params.layoutId ? (
          <Link className="text-pine-700 underline" to={`/layouts/${params.layoutId}/plan`}>
            Look at the plan
          </Link>
        ) : null}
        <Link className="text-pine-700 underline" to="/clubs">
          Your clubs
        </Link>
      </p>
    </section>
  );
}
