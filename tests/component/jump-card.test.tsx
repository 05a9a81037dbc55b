/**
 * The jump cards of the driver's preview, from a real analysis of the demo club's summer layout:
 * each card leads with its number and verdict, carries every column of the jumps table, links to
 * the jump's page, and the cards come in lap order whatever order they are given in.
 */
import { render, screen, within } from "@testing-library/react";
import { createRoutesStub } from "react-router";
import { beforeAll, describe, expect, it } from "vitest";
import {
  analyseLayout,
  REASON_TEXT,
  VERDICT_WORDS,
  verdictKind,
  type JumpAnalysis,
  type SkillLevel,
} from "~/analysis";
import { jumpName } from "~/components/analysis/format";
import { JumpCards, landsIntoText, windowText } from "~/components/analysis/jump-card";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";

let jumps: JumpAnalysis[];
let numbers: Record<string, number>;

beforeAll(() => {
  const analysis = analyseLayout(SUMMER_LAYOUT, { classIds: [SUMMER_LAYOUT.carClasses[0]] });
  jumps = analysis.classes[0].jumps;
  numbers = Object.fromEntries(jumps.map((j, i) => [j.sectionId, i + 1]));
});

function showCards(list: JumpAnalysis[], skill: SkillLevel = "club") {
  const Stub = createRoutesStub([
    {
      path: "/layout",
      Component: () => (
        <JumpCards jumps={list} numbers={numbers} skill={skill} jumpHref={(id) => `/layout/jumps/${id}`} />
      ),
    },
  ]);
  render(<Stub initialEntries={["/layout"]} />);
}

const cards = async () =>
  within(await screen.findByRole("list", { name: "Jumps in lap order" })).getAllByRole("link");

describe("jump cards", () => {
  it("shows every jump in lap order, even when given in another order", async () => {
    showCards([...jumps].reverse());
    const links = await cards();
    expect(links).toHaveLength(jumps.length);
    expect(links.map((l) => l.textContent!.match(/^J\d+/)![0])).toEqual(jumps.map((_, i) => `J${i + 1}`));
  });

  it("leads with the number and the verdict, then every column, and opens the jump's page", async () => {
    showCards(jumps, "expert");
    const links = await cards();
    jumps.forEach((j, i) => {
      const card = links[i];
      const v = j.verdicts.expert;
      const first = card.querySelector("p")!.textContent!;
      expect(first).toBe(`J${i + 1}${VERDICT_WORDS[verdictKind(v)]}`);
      expect(card.getAttribute("href")).toBe(`/layout/jumps/${j.sectionId}`);
      const text = card.textContent!;
      expect(text).toContain(v.reasonText);
      expect(text).toContain(jumpName(j));
      const facts = Object.fromEntries(
        within(card)
          .getAllByRole("term")
          .map((t) => [t.textContent, t.nextElementSibling!.textContent]),
      );
      const flown = j.flownOverBy !== null;
      expect(facts.Takeoff).toBe(flown ? REASON_TEXT["flown-over"] : `${j.takeoffSpeed.toFixed(1)} m/s`);
      expect(facts["Speed window"]).toBe(windowText(j));
      expect(facts.Airtime).toBe(flown ? "\u2013" : `${j.airtime.toFixed(2)} s`);
      expect(facts["Landing (EFH)"]).toMatch(flown ? /^\u2013$/ : /^\d+(\.\d+)? m$/);
      expect(facts["Lands into"]).toBe(landsIntoText(j));
      expect("Expected gain" in facts).toBe(Boolean(j.plan?.feasible));
    });
  });

  it("names the turn a landing runs into and the distance to the next one otherwise", () => {
    const into = jumps.find((j) => j.turn)!;
    expect(landsIntoText(into)).toMatch(/^(left|right) turn \d+° .* after touchdown$/);
    const clear = jumps.find((j) => !j.turn && j.nextTurnDistance !== null)!;
    expect(landsIntoText(clear)).toMatch(/^no turn \(next in .* m\)$/);
  });
});
