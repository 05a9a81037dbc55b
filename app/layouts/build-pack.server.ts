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
import { DATUM_CHOICE_LABELS } from "~/lib/build-pack-words";
import { fileSlug } from "~/lib/layout-file-name";
import type { FieldErrors } from "~/lib/forms";
import { buildPackQuerySchema, BUILD_LIMITS, type BuildPackQuery } from "~/lib/schemas/build-pack";
import { buildSheet } from "./build-pack-sheet.server";
import { loadLayoutDocument, loadVersionDocument } from "./documents.server";

/** A point the director may pick as a datum stake: plan metres. */
export type DatumPoint = { key: string; label: string; x: number; y: number };

export type BuildSettings = {
  /** The saved version the sheets are for; null for the layout as it is now. */
  version: number | null;
  a: DatumPoint;
  b: DatumPoint;
  spacing: number;
  truck: number;
  /** Where datum A lies on the earth and how the plan is turned (true bearings in degrees). */
  geo: { lat: number; lon: number; orient: "grid" | "ab"; trueBearing: number } | null;
};

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
  result: { ok: true; settings: BuildSettings } | { ok: false; status: 400 | 404; errors: FieldErrors };
};

/** The layout's site points a datum can be set on, in the order the form lists them. */
export function datumChoices(doc: LayoutDocument): DatumPoint[] {
  const out: DatumPoint[] = [];
  if (doc.driverStand) out.push({ key: "stand", label: DATUM_CHOICE_LABELS.stand, ...xy(doc.driverStand) });
  (doc.siteBoundary ?? []).forEach(([x, y], i) =>
    out.push({ key: `corner-${i + 1}`, label: `${DATUM_CHOICE_LABELS.corner} ${i + 1}`, x, y }),
  );
  doc.marshalPoints.forEach((m, i) =>
    out.push({ key: `marshal-${i + 1}`, label: `${DATUM_CHOICE_LABELS.marshal} ${i + 1}`, ...xy(m) }),
  );
  out.push({ key: "start", label: DATUM_CHOICE_LABELS.start, ...xy(doc.start) });
  return out;
}

const xy = (p: { x: number; y: number }) => ({ x: p.x, y: p.y });

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

/** The settings with the defaults filled in and the datums found among the site points. */
export function resolveSettings(
  q: BuildPackQuery,
  choices: DatumPoint[],
  doc: LayoutDocument,
): BuildPackLoad["result"] {
  const errors: FieldErrors = {};
  const pick = (field: "a" | "b", key: string | undefined, x?: number, y?: number): DatumPoint | null => {
    if (key === "xy") {
      return { key: "xy", label: DATUM_CHOICE_LABELS.xy, x: x!, y: y! };
    }
    const found = choices.find((c) => c.key === key);
    if (!found) errors[field] = [`${doc.name} has no site point "${key}"; choose one from the list.`];
    return found ?? null;
  };
  const a = q.a ? pick("a", q.a, q.ax, q.ay) : choices[0];
  const b = q.b ? pick("b", q.b, q.bx, q.by) : a ? farthestFrom(a, choices) : null;
  if (a && b && Math.hypot(b.x - a.x, b.y - a.y) < 1) {
    errors.b = ["Put datum B at least 1 m from datum A (a longer line sets out more accurately)."];
  }
  if (!a || !b || Object.keys(errors).length) return { ok: false, status: 400, errors };
  const geo =
    q.lat !== undefined && q.lon !== undefined
      ? { lat: q.lat, lon: q.lon, orient: q.orient ?? "grid", trueBearing: (q.trueBearing ?? 0) % 360 }
      : null;
  return {
    ok: true,
    settings: {
      version: q.version ?? null,
      a,
      b,
      spacing: q.spacing ?? BUILD_LIMITS.spacing.default,
      truck: q.truck ?? BUILD_LIMITS.truck.default,
      geo,
    },
  };
}

/**
 * Datum B by default: the site point farthest from A (the longer the line, the smaller the error
 * a sighting mistake makes); with no other site point, plan coordinates 10 m up the plan from A.
 */
function farthestFrom(a: DatumPoint, choices: DatumPoint[]): DatumPoint {
  let best: DatumPoint | null = null;
  let bestD = 1;
  for (const c of choices) {
    const d = Math.hypot(c.x - a.x, c.y - a.y);
    if (d >= bestD) {
      best = c;
      bestD = d;
    }
  }
  return best ?? { key: "xy", label: DATUM_CHOICE_LABELS.xy, x: a.x, y: a.y + 10 };
}

/** The settings as a query string, for the download links and the printed sheet's address. */
export function settingsQuery(s: BuildSettings): string {
  const p = new URLSearchParams();
  if (s.version !== null) p.set("version", String(s.version));
  for (const [field, d] of [
    ["a", s.a],
    ["b", s.b],
  ] as const) {
    p.set(field, d.key);
    if (d.key === "xy") {
      p.set(`${field}x`, String(d.x));
      p.set(`${field}y`, String(d.y));
    }
  }
  p.set("spacing", String(s.spacing));
  if (s.geo) {
    p.set("lat", String(s.geo.lat));
    p.set("lon", String(s.geo.lon));
    p.set("orient", s.geo.orient);
    p.set("trueBearing", String(s.geo.trueBearing));
  }
  p.set("truck", String(s.truck));
  return p.toString();
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
