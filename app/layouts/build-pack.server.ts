/**
 * The build pack's request work, shared by its page, PDFs and CSV: directors only (decision 0600),
 * the query parsed and checked (every problem named by its field), the chosen layout version
 * loaded and the datum stakes resolved against its site points.
 */
import { desc, eq } from "drizzle-orm";
import type { LayoutDocument } from "~/analysis";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { getDb } from "~/db/client.server";
import { layoutVersions } from "~/db/schema";
import { fileSlug } from "~/lib/layout-file-name";
import type { FieldErrors } from "~/lib/forms";
import { buildPackQuerySchema } from "~/lib/schemas/build-pack";
import {
  datumChoices,
  resolveSettings,
  type DatumPoint,
  type SettingsResult,
} from "./build-pack-settings.server";
import { buildSheet } from "./build-pack-sheet.server";
import { loadLayoutDocument, loadVersionDocument } from "./documents.server";

export { settingsQuery, type BuildSettings } from "./build-pack-settings.server";

export type BuildPackLoad = {
  club: { id: string; name: string };
  layout: { id: string; name: string; status: string };
  versions: { number: number; createdAt: string; note: string | null }[];
  document: LayoutDocument;
  /** The saved version number the document is (null: never drawn, the starter loop). */
  documentVersion: number | null;
  choices: DatumPoint[];
  /** The query as typed, to fill the form again. */
  values: Record<string, string>;
  result: SettingsResult;
};

/**
 * Directors only: 403 for other members, 404 for an unknown layout. Never throws for a bad
 * query: the problems come back in `result` with the status to answer.
 */
export async function loadBuildPack(request: Request, layoutId: string | undefined): Promise<BuildPackLoad> {
  const { layout, club } = await requireLayoutAccess(request, layoutId, "director");
  const params = new URL(request.url).searchParams;
  const values: Record<string, string> = {};
  for (const [k, v] of params) values[k] ??= v;
  const versions = await savedVersions(layout.id);
  const latest = await loadLayoutDocument(layout);
  const base = {
    club,
    layout: { id: layout.id, name: layout.name, status: layout.status },
    versions,
    values,
  };
  const parsed = buildPackQuerySchema.safeParse(values);
  if (!parsed.success) {
    const errors: FieldErrors = {};
    for (const issue of parsed.error.issues) {
      if (issue.code === "unrecognized_keys") {
        for (const key of issue.keys) errors[key] = ["is not a setting of the build pack."];
      } else (errors[issue.path.join(".") || "form"] ??= []).push(issue.message);
    }
    return { ...base, ...forDocument(latest), result: { ok: false, status: 400, errors } };
  }
  const q = parsed.data;
  let loaded = latest;
  if (q.version !== undefined && q.version !== latest.versionNumber) {
    const document = await loadVersionDocument(layout.id, q.version);
    if (!document) {
      const errors = { version: [`${layout.name} has no saved version ${q.version}.`] };
      return { ...base, ...forDocument(latest), result: { ok: false, status: 404, errors } };
    }
    loaded = { document, versionNumber: q.version };
  }
  const here = forDocument(loaded);
  const result = resolveSettings(q, here.choices, here.document);
  return { ...base, ...here, result };
}

function forDocument(loaded: { document: LayoutDocument; versionNumber: number | null }) {
  return {
    document: loaded.document,
    documentVersion: loaded.versionNumber,
    choices: datumChoices(loaded.document),
  };
}

async function savedVersions(layoutId: string) {
  const db = await getDb();
  const rows = await db
    .select({ number: layoutVersions.number, createdAt: layoutVersions.createdAt, note: layoutVersions.note })
    .from(layoutVersions)
    .where(eq(layoutVersions.layoutId, layoutId))
    .orderBy(desc(layoutVersions.number));
  return rows.map((r) => ({ number: r.number, createdAt: r.createdAt.toISOString(), note: r.note }));
}

/** "version 3", or what the sheet is for when the layout was never saved from the editor. */
export function versionLabel(load: Pick<BuildPackLoad, "documentVersion">): string {
  return load.documentVersion === null ? "starter loop (never saved)" : `version ${load.documentVersion}`;
}

/**
 * For the PDF and CSV routes: the load and its sheet, or a thrown plain-text Response naming
 * every field that is wrong (400) or the missing version (404).
 */
export async function requireBuildSheet(request: Request, layoutId: string | undefined) {
  const load = await loadBuildPack(request, layoutId);
  if (!load.result.ok) {
    const text = Object.entries(load.result.errors)
      .map(([field, messages]) => `${field}: ${(messages ?? []).join(" ")}`)
      .join("\n");
    throw new Response(`${text}\n`, {
      status: load.result.status,
      headers: { "Content-Type": "text/plain; charset=utf-8" },
    });
  }
  const sheet = buildSheet(load.document, load.result.settings, versionLabel(load));
  const stem = `${fileSlug(load.layout.name)}-${load.documentVersion === null ? "starter" : `v${load.documentVersion}`}`;
  return { load, sheet, stem };
}
