/**
 * The layout page's jumps table as a reader uses it: following a column heading's link sorts the
 * rows (a GET address, so it works without JavaScript), a second click turns the order round, and
 * the sorted column says so to screen readers. The rows come from a real analysis of the demo
 * club's wet-weather layout; the page's wiring (parseJumpSort, sortJumps) is the same as the
 * layout page's.
 */
import { fireEvent, render, screen, within } from "@testing-library/react";
import { createRoutesStub, useSearchParams } from "react-router";
import { beforeAll, describe, expect, it } from "vitest";
import { analyseLayout, type JumpAnalysis } from "~/analysis";
import { jumpName } from "~/components/analysis/format";
import { parseJumpSort, sortJumps } from "~/components/analysis/jump-sort";
import { JumpsTable } from "~/components/analysis/jumps-table";
import { WET_WEATHER_LAYOUT } from "~/db/demo-layouts";

let jumps: JumpAnalysis[];
let numbers: Record<string, number>;

beforeAll(() => {
  const analysis = analyseLayout(WET_WEATHER_LAYOUT, { classIds: [WET_WEATHER_LAYOUT.carClasses[0]] });
  jumps = analysis.classes[0].jumps;
  numbers = Object.fromEntries(jumps.map((j, i) => [j.sectionId, i + 1]));
});

function TablePage() {
  const [params] = useSearchParams();
  const sort = parseJumpSort(params);
  return (
    <JumpsTable
      jumps={sortJumps(jumps, sort, "club")}
      numbers={numbers}
      skill="club"
      sort={sort}
      sortHref={(key, dir) => `/layout?${new URLSearchParams({ sort: key, dir })}`}
      jumpHref={(id) => `/layout/jumps/${id}`}
    />
  );
}

function showTable(address = "/layout") {
  const Stub = createRoutesStub([{ path: "/layout", Component: TablePage }]);
  render(<Stub initialEntries={[address]} />);
}

/** The jump numbers down the table, as a reader sees them. */
function rowNumbers(): string[] {
  const body = screen.getByRole("table").querySelector("tbody")!;
  return within(body)
    .getAllByRole("row")
    .map((r) => r.querySelector("td")!.textContent!);
}

const heading = (name: RegExp) => screen.getByRole("columnheader", { name });
const numbered = (list: JumpAnalysis[]) => list.map((j) => `J${numbers[j.sectionId]}`);

describe("jumps table sorting", () => {
  it("starts in track order with every jump once", async () => {
    showTable();
    await screen.findByRole("table");
    expect(jumps.length).toBe(4);
    expect(rowNumbers()).toEqual(["J1", "J2", "J3", "J4"]);
    expect(heading(/^No\./).getAttribute("aria-sort")).toBe("ascending");
  });

  it("sorts by airtime when its heading is followed, and turns the order round on a second click", async () => {
    showTable();
    await screen.findByRole("table");
    const shortestFirst = numbered([...jumps].sort((a, b) => a.airtime - b.airtime));
    expect(shortestFirst).not.toEqual(["J1", "J2", "J3", "J4"]); // the test means something only if the order changes

    fireEvent.click(within(heading(/^Airtime/)).getByRole("link"));
    await screen.findByRole("columnheader", { name: /^Airtime/ });
    await expect.poll(rowNumbers).toEqual(shortestFirst);
    expect(heading(/^Airtime/).getAttribute("aria-sort")).toBe("ascending");
    expect(heading(/^No\./).getAttribute("aria-sort")).toBe("none");

    fireEvent.click(within(heading(/^Airtime/)).getByRole("link"));
    await expect.poll(rowNumbers).toEqual([...shortestFirst].reverse());
    expect(heading(/^Airtime/).getAttribute("aria-sort")).toBe("descending");
  });

  it("sorts by the jump's name from its address", async () => {
    showTable("/layout?sort=name&dir=asc");
    await screen.findByRole("table");
    const byName = numbered([...jumps].sort((a, b) => jumpName(a).localeCompare(jumpName(b))));
    expect(rowNumbers()).toEqual(byName);
    expect(heading(/^Jump/).getAttribute("aria-sort")).toBe("ascending");
  });

  it("falls back to track order for a column it does not know", async () => {
    showTable("/layout?sort=colour&dir=asc");
    await screen.findByRole("table");
    expect(rowNumbers()).toEqual(["J1", "J2", "J3", "J4"]);
  });
});
