/**
 * Calibration from measured laps through the route, on a real migrated SQLite file: upload, result,
 * saving to one's own profile, someone else's profile refused, bad files refused with their line
 * and column, nothing stored half-way.
 */
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { calibrationTrack, carPreset, modelTimes } from "~/analysis";
import { createProfile, presetProfile } from "~/cars/profiles.server";
import { SUMMER_LAYOUT, WET_WEATHER_LAYOUT } from "~/db/demo-layouts";
import { carProfiles } from "~/db/schema";
import { createLayoutFromDocument } from "~/layouts/documents.server";
import { publishDraft } from "~/layouts/publishing.server";
import type { CalibrationResult } from "~/calibration/run.server";
import { action, loader } from "~/routes/layout-calibrate";
import { loader as layoutLoader } from "~/routes/layout-page";
import { useTestDatabase } from "./helpers/db";
import { makeClubWithRoles } from "./helpers/factories";
import { args, formRequest, getRequest, run } from "./helpers/requests";

const { db } = useTestDatabase();

const truth = { ...carPreset("buggy-2wd-10")!, topSpeed: 13.5, mu: 1.25 };
const track = calibrationTrack(SUMMER_LAYOUT);

/** A lap file of `n` laps of the truth car, with small invented spreads; optional sector columns. */
function lapFile(n: number, sectors = false): string {
  const m = modelTimes(track, truth, 3);
  const wobble = (i: number) => 1 + 0.004 * Math.sin(i * 2.1);
  const head = sectors ? "lap,time,sector 1,sector 2,sector 3" : "Lap,Lap time";
  const rows = Array.from({ length: n }, (_, i) => {
    const parts = m.sectorTimes.map((t, k) => t * wobble(i + k));
    const lap = parts.reduce((a, b) => a + b, 0);
    return sectors
      ? [i + 1, lap.toFixed(3), ...parts.map((p) => p.toFixed(3))].join(",")
      : `${i + 1},${lap.toFixed(3)}`;
  });
  return [head, ...rows].join("\n") + "\n";
}

function upload(
  layoutId: string,
  cookie: string,
  fields: Record<string, string>,
  file: string | Uint8Array,
  file2?: string,
) {
  const body = new FormData();
  for (const [k, v] of Object.entries(fields)) body.set(k, v);
  body.set("file", new File([file as BlobPart], "laps.csv", { type: "text/csv" }));
  if (file2 !== undefined) body.set("file2", new File([file2], "laps-2.csv", { type: "text/csv" }));
  const request = new Request(`http://localhost/layouts/${layoutId}/calibrate`, {
    method: "POST",
    headers: { Cookie: cookie },
    body,
  });
  return run(() => action(args(request, { layoutId })));
}

async function setUp() {
  const { club, director, driver, marshal, outsider } = await makeClubWithRoles();
  const layout = await createLayoutFromDocument(club.id, SUMMER_LAYOUT, director.id);
  await publishDraft(layout.id, 1, { raceDate: "2030-06-01", note: "" }, director.id);
  const own = await createProfile(driver.id, "buggy-2wd-10", {
    ...presetProfile("buggy-2wd-10")!,
    label: "Dee's buggy",
  });
  const theirs = await createProfile(marshal.id, "buggy-2wd-10", {
    ...presetProfile("buggy-2wd-10")!,
    label: "Mo's buggy",
  });
  return { club, director, layout, driver, marshal, outsider, own: own.id, theirs: theirs.id };
}

const profileRow = async (id: string) =>
  (await (await db()).select().from(carProfiles).where(eq(carProfiles.id, id)))[0];

describe("calibration from measured laps", () => {
  it("offers the published versions and the member's cars; an outsider is refused", async () => {
    const s = await setUp();
    const page = await run(() =>
      loader(
        args(getRequest(`/layouts/${s.layout.id}/calibrate`, s.driver.cookie), { layoutId: s.layout.id }),
      ),
    );
    const options = (
      page.data as { options: { versions: { value: string }[]; ownCars: { value: string }[] } }
    ).options;
    expect(options.versions.map((v) => v.value)).toEqual(["1"]);
    expect(options.ownCars.map((c) => c.value)).toEqual([`profile:${s.own}`]);
    const outsider = await run(() =>
      loader(
        args(getRequest(`/layouts/${s.layout.id}/calibrate`, s.outsider.cookie), { layoutId: s.layout.id }),
      ),
    );
    expect(outsider.status).toBe(403);
  });

  it("opens with the car the member last read layouts with, or the one the address names", async () => {
    const s = await setUp();
    const carOf = async (query = "") => {
      const page = await run(() =>
        loader(
          args(getRequest(`/layouts/${s.layout.id}/calibrate${query}`, s.driver.cookie), {
            layoutId: s.layout.id,
          }),
        ),
      );
      return (page.data as { options: { car?: string } }).options.car;
    };
    expect(await carOf()).toBe(`profile:${s.own}`);
    // Reading the layout page with a class remembers it (the reader's choice), and calibration opens with it.
    await run(() =>
      layoutLoader(
        args(getRequest(`/layouts/${s.layout.id}?car=buggy-2wd-10`, s.driver.cookie), {
          layoutId: s.layout.id,
        }),
      ),
    );
    expect(await carOf()).toBe("buggy-2wd-10");
    expect(await carOf("?car=buggy-8")).toBe("buggy-8");
    // Someone else's profile in the address is not offered: the remembered car stays.
    expect(await carOf(`?car=profile:${s.theirs}`)).toBe("buggy-2wd-10");
  });

  it("uploads laps, shows the result, and saves the fitted values to the member's own profile", async () => {
    const s = await setUp();
    const r = await upload(
      s.layout.id,
      s.driver.cookie,
      { version: "1", car: `profile:${s.own}` },
      lapFile(12),
    );
    expect(r.status).toBe(200);
    const result = (r.data as { result: CalibrationResult }).result;
    expect(result.mode).toBe("pace");
    expect(result.runs[0].laps).toHaveLength(12);
    const expected = modelTimes(track, truth).lapTime / modelTimes(track, carPreset("buggy-2wd-10")!).lapTime;
    expect(Math.abs(result.paceFactor / expected - 1)).toBeLessThan(0.01);
    expect(Math.abs(result.runs[0].modelAfter / result.runs[0].measuredMean - 1)).toBeLessThan(0.01);

    const values = Object.fromEntries(Object.entries(result.fitted).map(([k, v]) => [k, String(v)]));
    const saved = await run(() =>
      action(
        args(
          formRequest(
            `/layouts/${s.layout.id}/calibrate`,
            { intent: "save", profileId: s.own, ...values },
            s.driver.cookie,
          ),
          { layoutId: s.layout.id },
        ),
      ),
    );
    expect(saved.status).toBe(302);
    expect(saved.location).toBe(`/profiles/${s.own}`);
    const stored = JSON.parse((await profileRow(s.own)).profile);
    expect(stored.topSpeed).toBeCloseTo(result.fitted.topSpeed, 9);
    expect(stored.mu).toBeCloseTo(result.fitted.mu, 9);
    expect(stored.label).toBe("Dee's buggy");
  });

  it("fits top speed and grip separately from sector times", async () => {
    const s = await setUp();
    const r = await upload(
      s.layout.id,
      s.driver.cookie,
      { version: "1", car: "buggy-2wd-10" },
      lapFile(10, true),
    );
    const result = (r.data as { result: CalibrationResult }).result;
    expect(result.mode).toBe("speed-grip");
    expect(Math.abs(result.fitted.topSpeed / truth.topSpeed - 1)).toBeLessThan(0.04);
    expect(Math.abs(result.fitted.mu / truth.mu - 1)).toBeLessThan(0.04);
    expect(result.runs[0].sectors?.measured).toHaveLength(3);
  });

  it("saves a class's fitted values as a new profile of the member's", async () => {
    const s = await setUp();
    const r = await upload(s.layout.id, s.driver.cookie, { version: "1", car: "sct-10" }, lapFile(6));
    const result = (r.data as { result: CalibrationResult }).result;
    expect(result.car.profileId).toBeNull();
    const values = Object.fromEntries(Object.entries(result.fitted).map(([k, v]) => [k, String(v)]));
    const saved = await run(() =>
      action(
        args(
          formRequest(
            `/layouts/${s.layout.id}/calibrate`,
            { intent: "save-new", presetId: "sct-10", label: "My truck", ...values },
            s.driver.cookie,
          ),
          { layoutId: s.layout.id },
        ),
      ),
    );
    expect(saved.status).toBe(302);
    const row = await profileRow(saved.location!.split("/").pop()!);
    expect([row.userId, row.presetId, JSON.parse(row.profile).label]).toEqual([
      s.driver.id,
      "sct-10",
      "My truck",
    ]);
  });

  it("refuses someone else's profile (404) for a calibration and for saving, and changes nothing", async () => {
    const s = await setUp();
    const before = await profileRow(s.theirs);
    const r = await upload(
      s.layout.id,
      s.driver.cookie,
      { version: "1", car: `profile:${s.theirs}` },
      lapFile(6),
    );
    expect(r.status).toBe(404);
    const saved = await run(() =>
      action(
        args(
          formRequest(
            `/layouts/${s.layout.id}/calibrate`,
            { intent: "save", profileId: s.theirs, topSpeed: "12", accel0: "8", brakeDecel: "8", mu: "1.1" },
            s.driver.cookie,
          ),
          { layoutId: s.layout.id },
        ),
      ),
    );
    expect(saved.status).toBe(404);
    expect(await profileRow(s.theirs)).toEqual(before);
  });

  it("refuses a bad file with 400 naming line and column, and stores nothing", async () => {
    const s = await setUp();
    const before = await profileRow(s.own);
    const bad = "lap,time\n1,41.2\n2,41.0\n3,crash\n4,41.1\n";
    const r = await upload(s.layout.id, s.driver.cookie, { version: "1", car: `profile:${s.own}` }, bad);
    expect(r.status).toBe(400);
    const refusal = (
      r.data as { refusal: { field: string; issues: { line: number; column?: string; message: string }[] } }
    ).refusal;
    expect(refusal.field).toBe("file");
    expect(refusal.issues).toEqual([expect.objectContaining({ line: 4, column: "time" })]);
    expect(await profileRow(s.own)).toEqual(before);
    const outOfBounds = await run(() =>
      action(
        args(
          formRequest(
            `/layouts/${s.layout.id}/calibrate`,
            { intent: "save", profileId: s.own, topSpeed: "400", accel0: "8", brakeDecel: "8", mu: "1.1" },
            s.driver.cookie,
          ),
          { layoutId: s.layout.id },
        ),
      ),
    );
    expect(outOfBounds.status).toBe(400);
    expect((outOfBounds.data as { errors: Record<string, string[]> }).errors.topSpeed[0]).toMatch(
      /Top speed/,
    );
    expect(await profileRow(s.own)).toEqual(before);
  });

  it("refuses a file over the limit with 413 and an unpublished version with 400", async () => {
    const s = await setUp();
    const big = new Uint8Array(300 * 1024).fill(0x31);
    expect((await upload(s.layout.id, s.driver.cookie, { version: "1", car: "sct-10" }, big)).status).toBe(
      413,
    );
    const r = await upload(s.layout.id, s.driver.cookie, { version: "2", car: "sct-10" }, lapFile(5));
    expect(r.status).toBe(400);
    expect((r.data as { refusal: { field: string } }).refusal.field).toBe("version");
  });

  it("takes a second file for another published layout, and says when the two cannot tell top speed from grip", async () => {
    const s = await setUp();
    const wet = await createLayoutFromDocument(s.club.id, WET_WEATHER_LAYOUT, s.director.id);
    await publishDraft(wet.id, 1, { raceDate: "2030-06-08", note: "" }, s.director.id);
    const wetTrack = calibrationTrack(WET_WEATHER_LAYOUT);
    const wetLap = modelTimes(wetTrack, truth).lapTime;
    const wetFile = [
      "lap,time",
      ...[1, 2, 3, 4].map((i) => `${i},${(wetLap * (1 + 0.002 * i)).toFixed(3)}`),
    ].join("\n");
    const r = await upload(
      s.layout.id,
      s.driver.cookie,
      { version: "1", car: "buggy-2wd-10", other: `${wet.id}:1` },
      lapFile(6),
      wetFile,
    );
    expect(r.status).toBe(200);
    const result = (r.data as { result: CalibrationResult }).result;
    expect(result.runs.map((x) => x.layoutName)).toEqual(["Summer layout", "Wet-weather layout"]);
    expect(result.mode).toBe("pace");
    expect(result.notSeparated).toMatch(/two layouts .* cannot be told apart/);
    const missing = await upload(
      s.layout.id,
      s.driver.cookie,
      { version: "1", car: "buggy-2wd-10" },
      lapFile(6),
      wetFile,
    );
    expect([missing.status, (missing.data as { refusal: { field: string } }).refusal.field]).toEqual([
      400,
      "other",
    ]);
  });
});
