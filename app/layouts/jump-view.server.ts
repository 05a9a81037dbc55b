/**
 * The data of a jump page from the page's analysis: the jump for the chosen car and skill, its
 * number, side elevation, steering chart and neighbours. Used by the jump page and a share link's
 * jump page.
 */
import type { CarParams, JumpSection } from "~/analysis";
import { jumpName } from "~/components/analysis/format";
import type { PageAnalysis } from "./analysis-page.server";
import { elevationData, steeringSeries } from "./jump-page.server";

/**
 * @throws 404 for a section that is not a jump of the version read, 422 when the layout cannot be analysed.
 * @param ownCar the reader's own car when one is chosen (its servo draws the steering chart).
 */
export function jumpViewData(page: PageAnalysis, sectionId: string | undefined, ownCar?: CarParams) {
  const section = page.document.sections.find((s) => s.id === sectionId);
  if (!section || section.kind !== "jump")
    throw new Response("No such jump in this layout.", {
      status: 404,
      statusText: "No such jump in this layout.",
    });
  if (!page.result.ok)
    throw new Response(page.result.message, { status: 422, statusText: page.result.message });
  const jumps = page.result.chosen.jumps;
  const index = jumps.findIndex((j) => j.sectionId === section.id);
  const jump = jumps[index];
  const neighbour = (i: number) =>
    jumps[i] ? { sectionId: jumps[i].sectionId, name: jumpName(jumps[i]) } : null;
  return {
    classId: page.classId,
    classLabel: page.result.chosen.label,
    skill: page.skill,
    classes: page.classes,
    car: page.car,
    cars: page.cars,
    problems: page.problems,
    number: index + 1,
    jump,
    elevation: elevationData(section as JumpSection, jump),
    steering: steeringSeries(jump.plan, page.classId, jump.airtime, ownCar),
    previous: neighbour(index - 1),
    next: neighbour(index + 1),
  };
}
