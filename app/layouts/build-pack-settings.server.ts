/**
 * The build pack's settings: the site points a datum stake can be set on, the settings with their
 * defaults filled in and checked against the layout, and the settings as a query string again.
 */
import { MAX_STATIONS, smallestSpacing, type LayoutDocument } from "~/analysis";
import { DATUM_CHOICE_LABELS } from "~/lib/build-pack-words";
import type { FieldErrors } from "~/lib/forms";
import { BUILD_LIMITS, type BuildPackQuery } from "~/lib/schemas/build-pack";

/** A point the director may pick as a datum stake: plan metres. */
export type DatumPoint = { key: string; label: string; x: number; y: number };

export type SettingsResult =
  { ok: true; settings: BuildSettings } | { ok: false; status: 400 | 404; errors: FieldErrors };

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

/** The settings with the defaults filled in and the datums found among the site points. */
export function resolveSettings(
  q: BuildPackQuery,
  choices: DatumPoint[],
  doc: LayoutDocument,
): SettingsResult {
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
  const spacing = q.spacing ?? BUILD_LIMITS.spacing.default;
  const least = smallestSpacing(doc);
  if (spacing < least) {
    errors.spacing = [
      `At ${spacing} m this lap needs more than ${MAX_STATIONS} stations; use a spacing of at least ${Math.ceil(least * 10) / 10} m.`,
    ];
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
      spacing,
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
