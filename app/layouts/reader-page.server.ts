/**
 * What the reader's plan page and the driver's sheet load: the layout at the version the reader
 * may read (marshals and drivers: the race-day version or `?version=n`; directors: the draft), the
 * remembered or asked car and skill, and the analysis in the shape the layout page's section
 * takes. Kept apart from the layout page's own loader so the two change independently.
 */
import { requireLayoutAccess } from "~/auth/permissions.server";
import { readerChoice } from "~/cars/reader-choice.server";
import type { LayoutAnalysisData } from "~/components/analysis/layout-analysis-section";
import { parseJumpSort } from "~/components/analysis/jump-sort";
import { unpackOverlay } from "~/lib/packed-line";
import { pageAnalysis } from "./analysis-page.server";
import { readingFor, readingView } from "./reading.server";

export async function readerPage(request: Request, layoutId: string | undefined) {
  const { layout, club, role, user } = await requireLayoutAccess(request, layoutId);
  const query = new URL(request.url).searchParams;
  const isDirector = role === "director";
  const reading = await readingFor(layout, role, query);
  const choice = await readerChoice(user.id, query, reading.document.carClasses);
  const page = await pageAnalysis(layout, query, { reading, choice });
  const { driverStand, marshalPoints, siteBoundary, trackWidth } = page.document;
  const analysis: LayoutAnalysisData = {
    layoutId: layout.id,
    clubId: club.id,
    isDirector,
    document: { driverStand, marshalPoints, siteBoundary, trackWidth },
    classId: page.classId,
    skill: page.skill,
    classes: page.classes,
    car: page.car,
    cars: page.cars,
    version: reading.query,
    problems: page.problems,
    sort: parseJumpSort(new URLSearchParams()),
    result: page.result.ok
      ? {
          ok: true,
          summary: page.result.summary,
          chosen: page.result.chosen,
          // The plan and the sheet draw on the server and are not kept rendered: the line unpacked here.
          overlay: unpackOverlay(page.result.overlay),
        }
      : page.result,
  };
  return {
    club: { id: club.id, name: club.name },
    layout: {
      id: layout.id,
      name: page.document.name,
      status: layout.status,
      version: isDirector ? layout.version : (reading.number ?? layout.version),
    },
    isDirector,
    reading: readingView(reading),
    analysis,
    status: page.problems.length ? 400 : 200,
  };
}
