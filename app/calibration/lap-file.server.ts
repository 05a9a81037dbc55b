/**
 * Reading a file of measured laps (docs/decisions/0120): comma-separated, a header row naming the
 * columns, one lap a row. The lap and time columns are chosen by name or detected; optional sector
 * columns ("sector 1", "S2", ...) are equal parts of the lap by distance. Times are seconds
 * ("23.456") or minutes and seconds ("1:02.345"). Every problem is reported with its line (and
 * column); a file with any problem is refused whole.
 */
import { CsvError, parse } from "csv-parse/sync";
import { detectColumns, parseLapTime, type ColumnChoice, type LapFileIssue } from "./lap-columns";

export {
  detectColumns,
  parseLapTime,
  MAX_SECTORS,
  type ColumnChoice,
  type LapFileIssue,
} from "./lap-columns";

/** Largest lap file accepted, bytes. */
export const MAX_LAP_FILE_BYTES = 256 * 1024;
/** Most laps one file may hold. */
export const MAX_LAPS = 2000;
/** Fewest laps a calibration needs (after crashed laps are left out). */
export const MIN_LAPS = 3;
/** A lap time outside this range is a typing or export slip, s. */
export const LAP_TIME_RANGE = { min: 3, max: 600 } as const;
/** The sectors must add up to the lap time within this much (or 1 % of it), s. */
export const SECTOR_SUM_TOLERANCE = 0.05;
/** Most problems listed; the rest are counted. */
const MAX_ISSUES = 20;

export type LapRow = { lap: number; time: number; sectors: number[] | null; line: number };

export type LapFile = {
  lapColumn: string | null;
  timeColumn: string;
  sectorColumns: string[];
  laps: LapRow[];
  notes: string[];
};

export type LapFileReading = { ok: true; file: LapFile } | { ok: false; issues: LapFileIssue[] };

function csvProblem(err: CsvError & { lines?: number }): LapFileIssue {
  const line = typeof err.lines === "number" && err.lines > 0 ? err.lines : 1;
  if (err.code === "CSV_RECORD_INCONSISTENT_FIELDS_LENGTH") {
    const m = /expect (\d+), got (\d+)/.exec(err.message);
    return {
      line,
      message: m
        ? `This row has ${m[2]} columns where the header has ${m[1]}.`
        : "This row has a different number of columns from the header.",
    };
  }
  if (err.code === "CSV_QUOTE_NOT_CLOSED")
    return { line, message: 'A quote (") opened here is never closed.' };
  return { line, message: `The row cannot be read as comma-separated values (${err.code}).` };
}

/**
 * Reads and checks a lap file.
 * @returns the laps, or every problem found (line-numbered; nothing is kept from a file with problems).
 */
export function readLapFile(text: string, choice: ColumnChoice = {}): LapFileReading {
  const body = text.replace(/^\uFEFF/, "");
  if (body.trim() === "") return { ok: false, issues: [{ line: 1, message: "The file is empty." }] };
  const firstLine = body.split(/\r?\n/, 1)[0];
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(body, { info: true, skip_empty_lines: true, trim: true }) as unknown as typeof records;
  } catch (err) {
    if (err instanceof CsvError) {
      const single = !firstLine.includes(",");
      if (single) return { ok: false, issues: [delimiterIssue(firstLine) ?? csvProblem(err)] };
      return { ok: false, issues: [csvProblem(err)] };
    }
    throw err;
  }
  const [head, ...rows] = records;
  if (head.record.length < 2) {
    const wrong = delimiterIssue(firstLine);
    return {
      ok: false,
      issues: [
        wrong ?? {
          line: head.info.lines,
          message:
            "The header row names one column: a lap file needs at least a lap time and a lap number, separated by commas.",
        },
      ],
    };
  }
  if (head.record.every((cell) => !/[a-z]/i.test(cell)))
    return {
      ok: false,
      issues: [
        {
          line: head.info.lines,
          message: 'The first line is not a header row: it must name the columns, for example "lap,time".',
        },
      ],
    };
  const cols = detectColumns(head.record, choice);
  if (cols.issues.length || cols.time === null) return { ok: false, issues: cols.issues };
  const names = head.record.map((h) => h.trim());
  const issues: LapFileIssue[] = [];
  const laps: LapRow[] = [];
  const seen = new Map<number, number>();
  const timeName = names[cols.time];
  for (const [k, { record, info }] of rows.entries()) {
    const line = info.lines;
    if (k >= MAX_LAPS) {
      issues.push({ line, message: `The file holds more than ${MAX_LAPS} laps.` });
      break;
    }
    const lap = cols.lap === null ? k + 1 : Number(record[cols.lap]);
    if (cols.lap !== null && !(/^\d{1,5}$/.test(record[cols.lap]) && lap >= 1))
      issues.push({
        line,
        column: names[cols.lap],
        message: `"${clip(record[cols.lap])}" is not a lap number (a whole number from 1).`,
      });
    else if (seen.has(lap))
      issues.push({
        line,
        column: names[cols.lap!],
        message: `Lap ${lap} is listed twice (line ${seen.get(lap)} and here).`,
      });
    else seen.set(lap, line);
    const time = timeCell(record[cols.time], line, timeName, issues);
    const sectors = cols.sectors.map((i) =>
      timeCell(record[i], line, names[i], issues, { min: 0.2, max: LAP_TIME_RANGE.max }),
    );
    if (time !== null && sectors.length && sectors.every((s) => s !== null)) {
      const sum = (sectors as number[]).reduce((a, b) => a + b, 0);
      if (Math.abs(sum - time) > Math.max(SECTOR_SUM_TOLERANCE, 0.01 * time))
        issues.push({
          line,
          column: timeName,
          message: `The sectors add up to ${sum.toFixed(3)} s but the lap time is ${time.toFixed(3)} s.`,
        });
    }
    if (time !== null) laps.push({ lap, time, sectors: sectors.length ? (sectors as number[]) : null, line });
    if (issues.length > MAX_ISSUES) break;
  }
  if (issues.length) {
    const shown = issues.slice(0, MAX_ISSUES);
    if (issues.length > MAX_ISSUES)
      shown.push({ line: issues[MAX_ISSUES].line, message: "More problems follow; correct these first." });
    return { ok: false, issues: shown };
  }
  if (laps.length < MIN_LAPS)
    return {
      ok: false,
      issues: [
        {
          line: head.info.lines,
          message: `The file holds ${laps.length} lap(s): a calibration needs at least ${MIN_LAPS}.`,
        },
      ],
    };
  const notes =
    cols.lap === null ? ["No lap number column: the laps are numbered in the order of the file."] : [];
  return {
    ok: true,
    file: {
      lapColumn: cols.lap === null ? null : names[cols.lap],
      timeColumn: timeName,
      sectorColumns: cols.sectors.map((i) => names[i]),
      laps,
      notes,
    },
  };
}

const clip = (s: string) => (s.length > 20 ? `${s.slice(0, 20)}…` : s);

function timeCell(
  text: string,
  line: number,
  column: string,
  issues: LapFileIssue[],
  range: { min: number; max: number } = LAP_TIME_RANGE,
): number | null {
  const t = parseLapTime(text);
  if (t === null) {
    issues.push({
      line,
      column,
      message: `"${clip(text)}" is not a time: write seconds (23.456) or minutes and seconds (1:02.345).`,
    });
    return null;
  }
  if (t < range.min || t > range.max) {
    issues.push({ line, column, message: `${t} s is outside ${range.min} to ${range.max} s.` });
    return null;
  }
  return t;
}

function delimiterIssue(firstLine: string): LapFileIssue | null {
  for (const [ch, word] of [
    [";", "semicolons"],
    ["\t", "tabs"],
    ["|", "bars"],
  ] as const)
    if (firstLine.includes(ch))
      return {
        line: 1,
        message: `The columns are separated by ${word}: Loftline reads comma-separated files (export or save the file as CSV with commas).`,
      };
  return null;
}
