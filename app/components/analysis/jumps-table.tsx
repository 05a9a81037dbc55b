import { Link } from "react-router";
import { JUMP_PRESET_LABELS, REASON_TEXT, verdictKind, type JumpAnalysis, type SkillLevel } from "~/analysis";
import { jumpName, metres, percent, seconds, signedSeconds, speedShort } from "./format";
import type { JumpSort, JumpSortKey } from "./jump-sort";
import { VerdictMark } from "./verdict-mark";

type Props = {
  jumps: JumpAnalysis[];
  /** Jump numbers in track order (J1, J2, ...), by section id, as on the plan. */
  numbers: Record<string, number>;
  skill: SkillLevel;
  sort: JumpSort;
  /**
   * The address of the page sorted by a column in a direction (keeps the other parameters);
   * without it the headings are plain (the driver's sheet).
   */
  sortHref?: (key: JumpSortKey, dir: "asc" | "desc") => string;
  jumpHref: (sectionId: string) => string;
};

/** The jumps table's columns, in order (the printed pages and their tests name every one). */
export const JUMP_COLUMNS: { key: JumpSortKey | null; label: string; numeric?: boolean }[] = [
  { key: "order", label: "No." },
  { key: "name", label: "Jump" },
  { key: "takeoff", label: "Takeoff m/s", numeric: true },
  { key: null, label: "Speed window m/s" },
  { key: "airtime", label: "Airtime", numeric: true },
  { key: "efh", label: "Landing (EFH)", numeric: true },
  { key: "turn", label: "Lands into" },
  { key: "verdict", label: "Verdict" },
  { key: "gain", label: "Expected gain", numeric: true },
];

/**
 * The jumps with their verdicts at the chosen skill level, sortable by following a column's link
 * (a GET request: no JavaScript needed); the sorted column carries aria-sort.
 */
export function JumpsTable({ jumps, numbers, skill, sort, sortHref, jumpHref }: Props) {
  return (
    <div className="overflow-x-auto rounded-lg border border-sand-200 bg-white">
      <table className="w-full min-w-[62rem] text-sm">
        <caption className="sr-only">Jumps, sortable by the linked column headings</caption>
        <thead className="bg-sand-100 text-left text-ink-700">
          <tr>
            {JUMP_COLUMNS.map((c) => {
              const active = c.key !== null && sort.key === c.key;
              const next = active && sort.dir === "asc" ? "desc" : "asc";
              return (
                <th
                  key={c.label}
                  scope="col"
                  className="px-3 py-2 font-medium whitespace-nowrap"
                  aria-sort={
                    !sortHref
                      ? undefined
                      : active
                        ? sort.dir === "asc"
                          ? "ascending"
                          : "descending"
                        : c.key
                          ? "none"
                          : undefined
                  }
                >
                  {c.key && sortHref ? (
                    <Link to={sortHref(c.key, next)} preventScrollReset className="hover:underline">
                      {c.label}
                      <span aria-hidden="true" className="ml-1 text-ink-500 print:hidden">
                        {active ? (sort.dir === "asc" ? "\u25b2" : "\u25bc") : "\u21c5"}
                      </span>
                    </Link>
                  ) : (
                    c.label
                  )}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {jumps.map((j) => (
            <JumpRow
              key={j.sectionId}
              jump={j}
              number={numbers[j.sectionId]}
              skill={skill}
              href={jumpHref(j.sectionId)}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
}

function JumpRow({
  jump: j,
  number,
  skill,
  href,
}: {
  jump: JumpAnalysis;
  number: number;
  skill: SkillLevel;
  href: string;
}) {
  const v = j.verdicts[skill];
  const kind = verdictKind(v);
  const flown = j.flownOverBy !== null;
  return (
    <tr className="border-t border-sand-200 align-top">
      <td className="px-3 py-2 font-semibold tabular-nums">J{number}</td>
      <th scope="row" className="px-3 py-2 text-left font-normal">
        <Link to={href} className="font-medium whitespace-nowrap text-pine-700 hover:underline">
          {jumpName(j)}
        </Link>
        {jumpName(j) !== JUMP_PRESET_LABELS[j.preset] ? (
          <span className="block text-xs text-ink-500">{JUMP_PRESET_LABELS[j.preset]}</span>
        ) : null}
      </th>
      <td className="px-3 py-2 tabular-nums">
        {flown ? REASON_TEXT["flown-over"] : speedShort(j.takeoffSpeed)}
      </td>
      <td className="px-3 py-2 tabular-nums whitespace-nowrap">
        {j.window
          ? `${speedShort(j.window.min)}\u2013${speedShort(j.window.max)}${j.window.maxIsSearchLimit ? "+" : ""}`
          : "none"}
      </td>
      <td className="px-3 py-2 tabular-nums">{flown ? "\u2013" : seconds(j.airtime)}</td>
      <td className="px-3 py-2 tabular-nums">{flown ? "\u2013" : metres(j.equivalentFallHeight)}</td>
      <td className="px-3 py-2">
        {j.turn ? (
          <>
            {j.turn.side} turn {Math.round(j.turn.angleDeg)}°{" "}
            <span className="text-xs text-ink-500">({metres(j.turn.distance)} after touchdown)</span>
          </>
        ) : (
          <span className="text-ink-500">
            no turn{j.nextTurnDistance !== null ? ` (next in ${metres(j.nextTurnDistance)})` : ""}
          </span>
        )}
      </td>
      <td className="px-3 py-2">
        <VerdictMark kind={kind} className="font-medium whitespace-nowrap" />
        <span className="block text-xs text-ink-500">{v.reasonText}</span>
      </td>
      <td className="px-3 py-2 tabular-nums whitespace-nowrap">
        {j.plan?.feasible ? (
          <>
            {signedSeconds(v.expectedGain)}
            <span className="block text-xs text-ink-500">{percent(v.successRate)} clean</span>
          </>
        ) : (
          "\u2013"
        )}
      </td>
    </tr>
  );
}
