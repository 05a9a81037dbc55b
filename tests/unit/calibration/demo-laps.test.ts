/** The demo's invented lap file (docs/examples/summer-layout-laps.csv) reads and fits as the README says. */
import fs from "node:fs";
import { expect, it } from "vitest";
import { calibrationTrack, carPreset, dropSlowLaps, fitSpeedGrip } from "~/analysis";
import { readLapFile } from "~/calibration/lap-file.server";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";

it("reads the demo lap file, leaves out its crashed lap and separates top speed from grip", () => {
  const read = readLapFile(fs.readFileSync("docs/examples/summer-layout-laps.csv", "utf8"));
  if (!read.ok) throw new Error(JSON.stringify(read.issues));
  expect(read.file.sectorColumns).toEqual(["Sector 1", "Sector 2", "Sector 3"]);
  const { kept, dropped } = dropSlowLaps(read.file.laps);
  expect(dropped.map((l) => l.lap)).toEqual([9]);
  const measured = [0, 1, 2].map((k) => kept.reduce((s, l) => s + l.sectors![k], 0) / kept.length);
  const fit = fitSpeedGrip(
    [{ track: calibrationTrack(SUMMER_LAYOUT), measured }],
    carPreset("buggy-2wd-10")!,
  );
  expect(fit.separable).toBe(true);
  // The file was invented from top speed 14.2 m/s and grip 1.15 with about 1 % spread per sector.
  expect(fit.topSpeed).toBeGreaterThan(13);
  expect(fit.topSpeed).toBeLessThan(15.5);
  expect(fit.mu).toBeGreaterThan(1.05);
  expect(fit.mu).toBeLessThan(1.25);
});
