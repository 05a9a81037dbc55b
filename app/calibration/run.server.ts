/**
 * A calibration: the member's lap file(s) against the lap model for a published version and a car
 * (a class or the member's own profile), fitted as the data allows (docs/decisions/0120-0122).
 * Reads only; saving the fitted values is save.server.ts.
 */
import {
  calibrationTrack,
  carPreset,
  dropSlowLaps,
  fitPace,
  fitSpeedGrip,
  modelTimes,
  type CarParams,
  type FittedValues,
  type TimedTrack,
} from "~/analysis";
import { getOwnProfile, ownCar } from "~/cars/profiles.server";
import { PROFILE_PREFIX } from "~/cars/reader-choice.server";
import { loadVersionDocument } from "~/layouts/documents.server";
import type { CalibrationForm } from "./form.server";
import { MIN_LAPS, readLapFile, type LapFileIssue, type LapRow } from "./lap-file.server";
import { livePublications } from "./options.server";

export type CalibrationRefusal = {
  status: 400 | 404;
  field: string;
  message: string;
  issues: LapFileIssue[];
};

export type CalibratedRun = {
  layoutName: string;
  version: number;
  laps: { lap: number; time: number; line: number }[];
  dropped: { lap: number; time: number; line: number }[];
  /** Laps slower than this were left out, s. */
  limit: number;
  measuredMean: number;
  modelBefore: number;
  modelAfter: number;
  /** Mean measured and modelled sector times, s; null without sector columns. */
  sectors: { measured: number[]; before: number[]; after: number[] } | null;
};

export type CalibrationResult = {
  car: { value: string; label: string; profileId: string | null; presetId: string };
  /** "pace": one factor; "speed-grip": top speed and grip separately. */
  mode: "pace" | "speed-grip";
  paceFactor: number;
  paceAtBound: boolean;
  /** Why top speed and grip were not separated, when the data had a chance to. */
  notSeparated: string | null;
  runs: CalibratedRun[];
  current: FittedValues;
  fitted: FittedValues;
  notes: string[];
};

const refuse = (status: 400 | 404, field: string, message: string, issues: LapFileIssue[] = []) => ({
  ok: false as const,
  refusal: { status, field, message, issues },
});

const mean = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

async function carFor(userId: string, value: string) {
  if (value.startsWith(PROFILE_PREFIX)) {
    const id = value.slice(PROFILE_PREFIX.length);
    const stored = /^[0-9a-f-]{36}$/.test(id) ? await getOwnProfile(userId, id) : null;
    if (!stored) return null;
    return { car: ownCar(stored).car, profileId: id, presetId: stored.presetId, label: stored.profile.label };
  }
  const preset = carPreset(value);
  return preset ? { car: preset, profileId: null, presetId: value, label: preset.label } : null;
}

function lapsOf(rows: readonly LapRow[], field: string) {
  const { kept, dropped, limit } = dropSlowLaps(rows);
  if (kept.length < MIN_LAPS)
    return {
      error: refuse(400, field, `Fewer than ${MIN_LAPS} laps are left once crashed laps are left out.`),
    };
  return { kept, dropped, limit };
}

const pickValues = (c: CarParams): FittedValues => ({
  topSpeed: c.topSpeed,
  accel0: c.accel0,
  brakeDecel: c.brakeDecel,
  mu: c.mu,
});

/**
 * Runs a calibration from the form.
 * @returns the result, or the refusal (400 naming the field, with line-numbered issues for a file;
 *   404 for a car profile that is not the member's).
 */
export async function runCalibration(
  clubId: string,
  layoutId: string,
  userId: string,
  form: CalibrationForm,
): Promise<{ ok: true; result: CalibrationResult } | ReturnType<typeof refuse>> {
  const live = await livePublications(clubId);
  const first = live.find((p) => p.layoutId === layoutId && String(p.versionNumber) === form.version);
  if (!first) return refuse(400, "version", "Choose one of the layout's published versions.");
  const chosen = await carFor(userId, form.car);
  if (!chosen)
    return form.car.startsWith(PROFILE_PREFIX)
      ? refuse(404, "car", "No such car profile of yours.")
      : refuse(400, "car", "Choose a car class or one of your car profiles.");
  const second = form.other ? live.find((p) => `${p.layoutId}:${p.versionNumber}` === form.other) : null;
  if (form.other && (!second || second.layoutId === layoutId))
    return refuse(400, "other", "Choose another published layout of this club for the second file.");
  if (!form.file) return refuse(400, "file", "Choose a lap file (.csv).");
  if (second && !form.file2) return refuse(400, "file2", "Choose the lap file for the second layout.");
  if (!second && form.file2) return refuse(400, "other", "Choose the layout the second file was timed on.");
  const choice = { lapColumn: form.lapColumn, timeColumn: form.timeColumn };
  const readA = readLapFile(form.file, choice);
  if (!readA.ok) return refuse(400, "file", "The lap file has problems; nothing was saved.", readA.issues);
  const readB = second && form.file2 ? readLapFile(form.file2, choice) : null;
  if (readB && !readB.ok)
    return refuse(400, "file2", "The second lap file has problems; nothing was saved.", readB.issues);
  const a = lapsOf(readA.file.laps, "file");
  if (a.error) return a.error;
  const b = readB?.ok ? lapsOf(readB.file.laps, "file2") : null;
  if (b?.error) return b.error;

  const docA = await loadVersionDocument(layoutId, first.versionNumber);
  const docB = second ? await loadVersionDocument(second.layoutId, second.versionNumber) : null;
  if (!docA || (second && !docB)) return refuse(400, "version", "That published version cannot be read.");
  const { car } = chosen;
  const trackA = calibrationTrack(docA);
  const trackB = docB ? calibrationTrack(docB) : null;
  const meanA = mean(a.kept!.map((l) => l.time));
  const pace = fitPace(trackA, car, meanA);
  const sectorCount = readA.file.sectorColumns.length;
  const sectorMeans =
    sectorCount > 0
      ? a
          .kept!.map((l) => l.sectors!)
          .reduce(
            (s, r) => s.map((x, i) => x + r[i] / a.kept!.length),
            new Array<number>(sectorCount).fill(0),
          )
      : null;
  const timed: TimedTrack[] = [{ track: trackA, measured: sectorMeans ?? [meanA] }];
  if (trackB && b) timed.push({ track: trackB, measured: [mean(b.kept!.map((l) => l.time))] });
  const grip = timed.reduce((n, t) => n + t.measured.length, 0) >= 2 ? fitSpeedGrip(timed, car) : null;
  const separated = grip?.separable === true;
  const fitted = separated ? grip.fitted : pace.fitted;
  const fittedCar = { ...car, ...fitted };
  const run = (
    doc: typeof docA,
    version: number,
    track: typeof trackA,
    l: typeof a,
    sectors: number[] | null,
  ): CalibratedRun => {
    const n = sectors?.length ?? 1;
    const before = modelTimes(track, car, n);
    const after = modelTimes(track, fittedCar, n);
    return {
      layoutName: doc.name,
      version,
      laps: l.kept!.map(({ lap, time, line }) => ({ lap, time, line })),
      dropped: l.dropped!.map(({ lap, time, line }) => ({ lap, time, line })),
      limit: l.limit!,
      measuredMean: mean(l.kept!.map((x) => x.time)),
      modelBefore: before.lapTime,
      modelAfter: after.lapTime,
      sectors: sectors ? { measured: sectors, before: before.sectorTimes, after: after.sectorTimes } : null,
    };
  };
  const runs = [run(docA, first.versionNumber, trackA, a, sectorMeans)];
  if (docB && trackB && b && second) runs.push(run(docB, second.versionNumber, trackB, b, null));
  return {
    ok: true,
    result: {
      car: { value: form.car, label: chosen.label, profileId: chosen.profileId, presetId: chosen.presetId },
      mode: separated ? "speed-grip" : "pace",
      paceFactor: pace.paceFactor,
      paceAtBound: pace.atBound,
      notSeparated:
        grip && !separated
          ? sectorCount > 0
            ? "The sectors respond to top speed and grip in nearly the same proportions, so they cannot be told apart: one pace factor is fitted."
            : "The two layouts respond to top speed and grip in nearly the same proportions, so they cannot be told apart: one pace factor is fitted."
          : null,
      runs,
      current: pickValues(car),
      fitted,
      notes: [...readA.file.notes, ...(readB?.ok ? readB.file.notes : [])],
    },
  };
}
