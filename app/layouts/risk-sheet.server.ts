/**
 * The corner-risk sheet's request work, shared by its page and its PDF (decision 0711): any
 * member of the layout's club (403 for another club), the version read as every reader page reads
 * it (marshals and drivers: published versions only, a draft is 404; directors: the draft unless
 * `?version=n`), the car class from `?class=` (400 naming `class` when it is not the layout's),
 * the analysis through the pool and its memo, and the engine's marshal plan with the club's
 * reach and heat size.
 */
import {
  carPreset,
  marshalPlan,
  type AnalysisOverlay,
  type LayoutDocument,
  type MarshalPlan,
} from "~/analysis";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { loadClubMarshal } from "~/clubs/marshal-settings.server";
import { raceDateText } from "~/lib/race-date";
import { fileSlug } from "~/lib/layout-file-name";
import { clubMarshalSettings } from "~/lib/schemas/marshal-settings";
import { analyseStoredLayout, overlayFor } from "./analysis.server";
import { readingFor, savedSource } from "./reading.server";

export interface RiskSheet {
  club: { id: string; name: string };
  layout: { id: string; name: string };
  isDirector: boolean;
  /** "draft", "published" or "saved"; the version's number (null for a never-saved draft). */
  kind: "draft" | "published" | "saved";
  version: number | null;
  /** "version 4" or "draft (not published)". */
  versionLabel: string;
  raceDate: string;
  classId: string;
  classLabel: string;
  classes: { classId: string; label: string }[];
  /** The query naming this sheet's version and class, for links. */
  query: Record<string, string>;
  site: Pick<LayoutDocument, "driverStand" | "marshalPoints" | "siteBoundary" | "trackWidth">;
  overlay: AnalysisOverlay;
  plan: MarshalPlan;
}

const refuse = (status: number, message: string) =>
  new Response(message, {
    status,
    statusText: message,
    headers: { "Content-Type": "text/plain; charset=utf-8" },
  });

const round2 = (v: number) => Math.round(v * 100) / 100;

/**
 * The sheet, or a thrown Response: 401 signed out, 403 another club, 404 no such layout or a
 * version the reader may not see, 400 a bad `version` or `class`, 503 when the analysis cannot run.
 */
export async function loadRiskSheet(request: Request, layoutId: string | undefined): Promise<RiskSheet> {
  const { layout, club, role } = await requireLayoutAccess(request, layoutId);
  const query = new URL(request.url).searchParams;
  const reading = await readingFor(layout, role, query);
  const doc = reading.document;
  const classes = doc.carClasses.map((id) => ({ classId: id, label: carPreset(id)?.label ?? id }));
  const asked = query.get("class");
  if (asked && !doc.carClasses.includes(asked))
    throw refuse(
      400,
      `class: "${asked.slice(0, 40)}" is not one of this layout's car classes (${doc.carClasses.join(", ")}).`,
    );
  const classId = asked || doc.carClasses[0];
  let run;
  try {
    run = await analyseStoredLayout(layout, { skill: "club", saved: savedSource(reading) });
  } catch (error) {
    if (error instanceof Response) throw error;
    throw refuse(503, `The layout cannot be analysed just now: ${(error as Error).message}`);
  }
  const settings = clubMarshalSettings(await loadClubMarshal(club.id));
  const plan = marshalPlan(doc, run.analysis, { classIds: [classId], settings });
  const o = overlayFor(run, classId, "club");
  const overlay = {
    ...o,
    line: { ...o.line, x: o.line.x.map(round2), y: o.line.y.map(round2), speed: o.line.speed.map(round2) },
  };
  const { driverStand, marshalPoints, siteBoundary, trackWidth } = doc;
  return {
    club: { id: club.id, name: club.name },
    layout: { id: layout.id, name: layout.name },
    isDirector: role === "director",
    kind: reading.kind,
    version: reading.number,
    versionLabel:
      reading.kind === "draft"
        ? `draft${reading.number === null ? "" : ` (after version ${reading.number})`}, not published`
        : `version ${reading.number}`,
    raceDate: raceDateText(reading.publication?.raceDate ?? null),
    classId,
    classLabel: classes.find((c) => c.classId === classId)?.label ?? classId,
    classes,
    query: { ...reading.query, class: classId },
    site: { driverStand, marshalPoints, siteBoundary, trackWidth },
    overlay,
    plan,
  };
}

/** The PDF's file name: "kestrel-summer-v4-1-10-buggy-corner-risk.pdf". */
export function riskFileName(sheet: Pick<RiskSheet, "layout" | "version" | "kind" | "classId">): string {
  const v = sheet.kind === "draft" ? "draft" : `v${sheet.version}`;
  return `${fileSlug(sheet.layout.name)}-${v}-${fileSlug(sheet.classId)}-corner-risk.pdf`;
}
