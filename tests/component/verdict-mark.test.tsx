/**
 * The verdict's mark as readers meet it: its word is its text, its shape is the second signal
 * (never colour alone), and the editor's jump list, the pages' jumps table, the plan drawing and
 * its legend all show the same mark for the same verdict.
 */
import { render, screen, within } from "@testing-library/react";
import { createRoutesStub } from "react-router";
import { describe, expect, it } from "vitest";
import { analyseLayout, buildOverlay, VERDICT_KINDS, type VerdictKind } from "~/analysis";
import { JumpsTable } from "~/components/analysis/jumps-table";
import { VerdictMark } from "~/components/analysis/verdict-mark";
import { DrawingLegend } from "~/components/drawing/drawing-legend";
import { TrackDrawing } from "~/components/drawing/track-drawing";
import { AnalysisPanel } from "~/components/editor/analysis-panel";
import { BIG_DOUBLE, ovalWithJump } from "../unit/analysis/analysis-fixtures";

const EXPECTED: Record<VerdictKind, { word: string; shape: string }> = {
  "set-up": { word: "Set up in the air", shape: "triangle" },
  straight: { word: "Take it straight", shape: "circle" },
  "cannot-clear": { word: "Cannot clear", shape: "cross" },
};

const shapeOf = (el: Element) => el.querySelector("svg[data-shape]")!;

describe("the verdict mark", () => {
  it.each(VERDICT_KINDS.map((k) => [k]))(
    "%s: the word is its text, the shape is hidden from readers",
    (kind) => {
      const { container } = render(<VerdictMark kind={kind} />);
      expect(container.textContent).toBe(EXPECTED[kind].word);
      expect(screen.getByText(EXPECTED[kind].word)).toBeTruthy();
      const svg = shapeOf(container);
      expect(svg.getAttribute("data-shape")).toBe(EXPECTED[kind].shape);
      expect(svg.getAttribute("aria-hidden")).toBe("true");
      expect(svg.querySelector("path")!.getAttribute("d")).toMatch(/^M /);
    },
  );

  it("gives each kind its own shape and outline", () => {
    const drawn = VERDICT_KINDS.map((kind) => {
      const { container } = render(<VerdictMark kind={kind} />);
      return shapeOf(container).querySelector("path")!.getAttribute("d");
    });
    expect(new Set(drawn).size).toBe(3);
  });

  it("without its word it is only a shape, hidden from screen readers (the caller writes the word)", () => {
    const { container } = render(<VerdictMark kind="cannot-clear" showWord={false} />);
    expect(container.textContent).toBe("");
    expect(container.firstElementChild!.tagName.toLowerCase()).toBe("svg");
    expect(container.firstElementChild!.getAttribute("aria-hidden")).toBe("true");
    expect(container.firstElementChild!.getAttribute("data-shape")).toBe("cross");
  });

  it("the legend explains every mark with its word", () => {
    render(<DrawingLegend min={4} max={12} bins={8} hidden={false} conflicts={false} />);
    for (const kind of VERDICT_KINDS) {
      const item = screen.getByText(EXPECTED[kind].word).closest("li")!;
      expect(shapeOf(item).getAttribute("data-shape")).toBe(EXPECTED[kind].shape);
    }
  });

  it("the editor's jump list, the jumps table and the plan show the same mark for the same jump", async () => {
    // A big double with a 1 m approach: nobody can clear it (engine.md section 6's "cannot clear").
    const analysis = analyseLayout(ovalWithJump(BIG_DOUBLE, { approach: 1 }), { skill: "club" });
    const overlay = buildOverlay(analysis, "buggy-4wd-10", "club");
    const jumps = analysis.classes[0].jumps;
    expect(overlay.jumps[0].verdict).toBe("cannot-clear");

    const editor = render(
      <AnalysisPanel
        overlay={overlay}
        status={{ state: "ready", message: null }}
        stale={false}
        sections={ovalWithJump(BIG_DOUBLE, { approach: 1 }).sections}
        classIds={["buggy-4wd-10"]}
        classId="buggy-4wd-10"
        skill="club"
        selected={null}
        onClass={() => {}}
        onSkill={() => {}}
        onSelect={() => {}}
      />,
    );
    const item = within(editor.container)
      .getByRole("list", { name: "Jumps and their verdicts" })
      .querySelector("button")!;
    expect(item.textContent).toContain("J1 Cannot clear");
    const editorPath = shapeOf(item).querySelector("path")!.getAttribute("d");
    expect(shapeOf(item).getAttribute("data-shape")).toBe("cross");
    editor.unmount();

    const Stub = createRoutesStub([
      {
        path: "/",
        Component: () => (
          <JumpsTable
            jumps={jumps}
            numbers={{ [jumps[0].sectionId]: 1 }}
            skill="club"
            sort={{ key: "order", dir: "asc", problem: null }}
            sortHref={(key, dir) => `/?sort=${key}&dir=${dir}`}
            jumpHref={(id) => `/jumps/${id}`}
          />
        ),
      },
    ]);
    render(<Stub initialEntries={["/"]} />);
    const row = (await screen.findByRole("table")).querySelector("tbody tr")!;
    const cell = within(row as HTMLElement)
      .getByText("Cannot clear")
      .closest("td")!;
    expect(shapeOf(cell).getAttribute("data-shape")).toBe("cross");
    expect(shapeOf(cell).querySelector("path")!.getAttribute("d")).toBe(editorPath);
    expect(cell.textContent).toContain("the approach is too short");

    const plan = render(
      <TrackDrawing
        overlay={overlay}
        site={{ trackWidth: 3, marshalPoints: [] }}
        numbers={{ [jumps[0].sectionId]: 1 }}
        names={{ [jumps[0].sectionId]: "Big double" }}
        jumpHref={(id) => `/jumps/${id}`}
        title="Test oval"
        classLabel="1/10 4WD buggy"
      />,
    );
    const link = plan.container.querySelector("a[aria-label^='J1 ']")!;
    expect(link.getAttribute("aria-label")).toBe("J1 Big double: Cannot clear: the approach is too short");
    expect(link.querySelector(`path[d="${editorPath}"]`)).not.toBeNull();
  });
});
