/**
 * The columns of a lap file (docs/decisions/0120): lap, time and sector columns found by their
 * names or chosen by the member, and the two ways a time is written.
 */

/** Most sectors read. */
export const MAX_SECTORS = 6;

export type LapFileIssue = { line: number; column?: string; message: string };

export type ColumnChoice = { lapColumn?: string; timeColumn?: string };

const norm = (s: string) => s.trim().toLowerCase().replace(/\s+/g, " ");
const LAP_NAMES = /^(lap|laps|lap ?(no\.?|nr\.?|number|#)|#|no\.?)$/;
const TIME_NAMES = /^(lap ?)?time( ?\((s|sec|seconds)\))?$/;
const SECTOR_NAME = /^(sector|sec|s|split) ?(\d)( ?\((s|sec|seconds)\))?$/;

/**
 * A time in seconds from "23.456", "23" or "1:02.345" (minutes and seconds), or null.
 * A decimal comma is not read (the comma separates the columns).
 */
export function parseLapTime(text: string): number | null {
  const t = text.trim();
  let m = /^(\d{1,4})(\.\d+)?$/.exec(t);
  if (m) return Number(t);
  m = /^(\d{1,3}):([0-5]\d)(\.\d+)?$/.exec(t);
  if (m) return Number(m[1]) * 60 + Number(`${m[2]}${m[3] ?? ""}`);
  return null;
}

/** The columns of a header row: the chosen ones, else the detected ones. */
export function detectColumns(
  header: readonly string[],
  choice: ColumnChoice = {},
): { lap: number | null; time: number | null; sectors: number[]; issues: LapFileIssue[] } {
  const names = header.map(norm);
  const issues: LapFileIssue[] = [];
  const listed = header.map((h) => `"${h.trim()}"`).join(", ");
  const chosen = (value: string | undefined, what: string) => {
    if (!value?.trim()) return undefined;
    const i = names.indexOf(norm(value));
    if (i < 0)
      issues.push({
        line: 1,
        message: `There is no ${what} column named "${value.trim()}": the columns are ${listed}.`,
      });
    return i < 0 ? null : i;
  };
  const lapChosen = chosen(choice.lapColumn, "lap");
  const timeChosen = chosen(choice.timeColumn, "time");
  const lap = lapChosen !== undefined ? lapChosen : indexOr(names.findIndex((n) => LAP_NAMES.test(n)));
  let time = timeChosen !== undefined ? timeChosen : indexOr(names.findIndex((n) => TIME_NAMES.test(n)));
  if (time === null && timeChosen === undefined) {
    const loose = names.findIndex(
      (n) => n.includes("time") && !/total|sector|split|gap|best|date|of day/.test(n),
    );
    time = indexOr(loose);
  }
  if (time === null && timeChosen === undefined)
    issues.push({
      line: 1,
      message: `No lap time column found among ${listed}: name it "time" (or "lap time"), or choose the column.`,
    });
  const numbered = names
    .map((n, i) => ({ i, m: SECTOR_NAME.exec(n) }))
    .filter((x) => x.m !== null && x.i !== time && x.i !== lap)
    .map((x) => ({ i: x.i, k: Number(x.m![2]) }))
    .sort((a, b) => a.k - b.k);
  let sectors: number[] = [];
  if (numbered.length > 0) {
    const inOrder = numbered.every((x, j) => x.k === j + 1);
    if (!inOrder || numbered.length < 2 || numbered.length > MAX_SECTORS)
      issues.push({
        line: 1,
        message: `Sector columns must be numbered 1, 2, ... without gaps, between 2 and ${MAX_SECTORS} of them (found ${numbered.map((x) => `"${header[x.i].trim()}"`).join(", ")}).`,
      });
    else sectors = numbered.map((x) => x.i);
  }
  return { lap, time, sectors, issues };
}

const indexOr = (i: number) => (i < 0 ? null : i);
