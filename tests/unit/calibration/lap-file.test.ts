import { describe, expect, it } from "vitest";
import { detectColumns, parseLapTime, readLapFile, type LapFileIssue } from "~/calibration/lap-file.server";

const issuesOf = (text: string, choice = {}): LapFileIssue[] => {
  const r = readLapFile(text, choice);
  if (r.ok) throw new Error("expected the file to be refused");
  return r.issues;
};

describe("lap times", () => {
  it("reads seconds and minutes:seconds", () => {
    expect(parseLapTime("23.456")).toBe(23.456);
    expect(parseLapTime(" 41 ")).toBe(41);
    expect(parseLapTime("1:02.345")).toBeCloseTo(62.345, 9);
    expect(parseLapTime("0:59.9")).toBeCloseTo(59.9, 9);
    expect(parseLapTime("1:75.0")).toBeNull();
    expect(parseLapTime("DNF")).toBeNull();
    expect(parseLapTime("23,4")).toBeNull();
  });

  it("reads a file of both forms", () => {
    const r = readLapFile("Lap,Lap Time\n1,41.20\n2,0:40.85\n\n3,1:01.5\n");
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.file.laps.map((l) => [l.lap, l.time, l.line])).toEqual([
      [1, 41.2, 2],
      [2, 40.85, 3],
      [3, 61.5, 5],
    ]);
    expect(r.file.timeColumn).toBe("Lap Time");
  });
});

describe("column detection", () => {
  it("finds lap, time and numbered sector columns by their names", () => {
    const c = detectColumns(["Driver", "Lap No", "Time (s)", "S1", "S2", "S3"]);
    expect([c.lap, c.time, c.sectors, c.issues]).toEqual([1, 2, [3, 4, 5], []]);
    expect(detectColumns(["#", "lap time"]).time).toBe(1);
    expect(detectColumns(["#", "lap time"]).lap).toBe(0);
    expect(detectColumns(["lap", "time of day", "best time", "Lap time"]).time).toBe(3);
  });

  it("takes the columns a member chose, and names the columns when a choice is not there", () => {
    const c = detectColumns(["Round", "Result", "Kart"], { lapColumn: "round", timeColumn: "Result" });
    expect([c.lap, c.time, c.issues]).toEqual([0, 1, []]);
    const wrong = detectColumns(["Round", "Result"], { timeColumn: "Laptime" });
    expect(wrong.issues[0].message).toContain('no time column named "Laptime"');
    expect(wrong.issues[0].message).toContain('"Round", "Result"');
  });

  it("numbers laps in file order when there is no lap column", () => {
    const r = readLapFile("driver,time\nAnna,40.1\nAnna,40.3\nAnna,40.2\n");
    expect(r.ok && r.file.laps.map((l) => l.lap)).toEqual([1, 2, 3]);
    expect(r.ok && r.file.notes[0]).toMatch(/numbered in the order/);
  });

  it("reads sector times that add up to the lap", () => {
    const r = readLapFile(
      "lap,time,sector 1,sector 2,sector 3\n1,40.0,13.0,14.0,13.0\n2,40.3,13.1,14.1,13.1\n3,40.1,13,14,13.1\n",
    );
    expect(r.ok && r.file.sectorColumns).toEqual(["sector 1", "sector 2", "sector 3"]);
    expect(r.ok && r.file.laps[1].sectors).toEqual([13.1, 14.1, 13.1]);
  });
});

describe("files with problems are refused with their line", () => {
  it("wrong delimiter", () => {
    const [issue] = issuesOf("lap;time\n1;40.1\n2;40.3\n3;40.2\n");
    expect(issue.line).toBe(1);
    expect(issue.message).toMatch(/separated by semicolons/);
    expect(issuesOf("lap\ttime\n1\t40.1\n")[0].message).toMatch(/tabs/);
  });

  it("a row with another delimiter than the header", () => {
    const [issue] = issuesOf("lap,time\n1,40.1\n2;40.3\n3,40.2\n");
    expect(issue).toMatchObject({ line: 3 });
    expect(issue.message).toMatch(/1 columns where the header has 2/);
  });

  it("missing header", () => {
    const [issue] = issuesOf("1,40.1\n2,40.3\n3,40.2\n");
    expect(issue.line).toBe(1);
    expect(issue.message).toMatch(/not a header row/);
  });

  it("times out of range", () => {
    const issues = issuesOf("lap,time\n1,40.1\n2,0.9\n3,40.2\n4,12:00.0\n");
    expect(issues).toEqual([
      { line: 3, column: "time", message: "0.9 s is outside 3 to 600 s." },
      { line: 5, column: "time", message: "720 s is outside 3 to 600 s." },
    ]);
  });

  it("text in the time column, a bad lap number, a lap twice", () => {
    const issues = issuesOf("lap,time\n1,40.1\n2,DNF\nthree,40.2\n1,40.4\n");
    expect(issues.map((i) => [i.line, i.column])).toEqual([
      [3, "time"],
      [4, "lap"],
      [5, "lap"],
    ]);
    expect(issues[0].message).toBe(
      '"DNF" is not a time: write seconds (23.456) or minutes and seconds (1:02.345).',
    );
    expect(issues[2].message).toMatch(/Lap 1 is listed twice \(line 2 and here\)/);
  });

  it("sectors that do not add up, too few laps, an empty file, no time column", () => {
    expect(issuesOf("lap,time,s1,s2\n1,40,20,25\n2,40,20,20\n3,40,20,20\n")[0]).toMatchObject({
      line: 2,
      column: "time",
    });
    expect(issuesOf("lap,time\n1,40\n2,41\n")[0].message).toMatch(/at least 3/);
    expect(issuesOf("")[0]).toMatchObject({ line: 1, message: "The file is empty." });
    expect(issuesOf("lap,driver\n1,Anna\n")[0].message).toMatch(/No lap time column/);
  });
});
