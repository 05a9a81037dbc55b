import { BuildingCautions } from "./building-cautions";
import { SheetTable } from "./sheet-table";
import { StakePlan } from "./stake-plan";
import { Cautions } from "~/components/cautions";
import { bearingDeg, metres } from "~/lib/build-pack-format";
import {
  datumLines,
  earthCells,
  earthColumns,
  earthSettingsLine,
  earthTotalLine,
  stakeCells,
  stakeColumns,
  turnCells,
  turnColumns,
  type EarthRow,
  type EarthTotals,
  type StakeRow,
  type TurnRow,
} from "~/lib/build-pack-rows";
import {
  BEARING_CONVENTION,
  closureWarning,
  EARTH_CAPTION,
  EARTH_MODEL,
  EARTHWORKS_TITLE,
  HEIGHT_CONVENTION,
  JUMPS_CAPTION,
  LOADS_NOTE,
  MARKING_TITLE,
  OFFSET_CONVENTION,
  markingMethod,
  stationsCaption,
  TURNS_CAPTION,
} from "~/lib/build-pack-words";

type Pt = [number, number];

/** The sheet data as the loader sends it (build-pack-sheet.server.ts). */
export type SheetData = {
  layoutName: string;
  versionLabel: string;
  closureGap: number;
  settings: { spacing: number; geo: unknown };
  baseline: { length: number; bearing: number; trueBearing: number | null };
  gridTrueBearing: number | null;
  datums: StakeRow[];
  turns: TurnRow[];
  jumps: { number: number; name: string; kindLabel: string; points: StakeRow[] }[];
  stations: StakeRow[];
  earth: EarthTotals & { rows: EarthRow[]; width: number; sideSlope: number };
  plan: { centre: Pt[]; left: Pt[]; right: Pt[]; boundary: Pt[] | null };
};

/** The marking-out and earthworks sheets as printable HTML, with the cautions. */
export function BuildPackSheets({ sheet }: { sheet: SheetData }) {
  const geo = sheet.settings.geo !== null;
  const cols = stakeColumns(geo);
  const { earth } = sheet;
  return (
    <>
      <section aria-labelledby="marking" className="space-y-4">
        <h2 id="marking" className="text-xl font-semibold">
          {MARKING_TITLE}
        </h2>
        <div className="space-y-1 text-sm">
          {datumLines(sheet).map((line) => (
            <p key={line}>{line}</p>
          ))}
        </div>
        <ul className="list-disc space-y-1 pl-5 text-sm">
          {markingMethod(bearingDeg(sheet.baseline.bearing), metres(sheet.baseline.length)).map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
        <div className="space-y-1 text-sm text-ink-500">
          <p>{BEARING_CONVENTION}</p>
          <p>{OFFSET_CONVENTION}</p>
          <p>{HEIGHT_CONVENTION}</p>
        </div>
        {sheet.closureGap > 0.01 ? (
          <p
            role="alert"
            className="rounded-md border border-danger-700 bg-danger-100 p-3 text-sm font-semibold"
          >
            {closureWarning(metres(sheet.closureGap))}
          </p>
        ) : null}
        <StakePlan data={sheet} title={`${MARKING_TITLE} of ${sheet.layoutName}`} />
        <SheetTable caption={TURNS_CAPTION} columns={turnColumns} rows={sheet.turns.map(turnCells)} />
        <SheetTable
          caption={JUMPS_CAPTION}
          columns={cols}
          rows={sheet.jumps.flatMap((j) => j.points.map((p) => stakeCells(p, geo)))}
        />
        <SheetTable
          caption={stationsCaption(String(sheet.settings.spacing))}
          columns={cols}
          rows={sheet.stations.map((p) => stakeCells(p, geo))}
        />
      </section>
      <section aria-labelledby="earthworks" className="space-y-4 print:break-before-page">
        <h2 id="earthworks" className="text-xl font-semibold">
          {EARTHWORKS_TITLE}
        </h2>
        <p className="text-sm">{earthSettingsLine(earth)}</p>
        <p className="text-sm text-ink-500">{EARTH_MODEL}</p>
        <SheetTable caption={EARTH_CAPTION} columns={earthColumns} rows={earthCells(earth.rows, earth)} />
        <p className="font-semibold">{earthTotalLine(earth)}</p>
        <p className="text-sm text-ink-500">{LOADS_NOTE}</p>
      </section>
      <BuildingCautions />
      <Cautions />
    </>
  );
}
