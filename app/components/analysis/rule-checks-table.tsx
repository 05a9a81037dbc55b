import type { RuleReport, RuleStatus } from "~/analysis";

const STATUS: Record<RuleStatus, { word: string; mark: string; cls: string }> = {
  pass: { word: "Pass", mark: "\u2713", cls: "bg-ok-100 text-ok-700" },
  fail: { word: "Fail", mark: "\u2717", cls: "bg-danger-100 text-danger-700" },
  "not checked": { word: "Not checked", mark: "\u2013", cls: "bg-sand-100 text-ink-700" },
};

const fmt = (x: number) => (Math.abs(x) >= 10 ? x.toFixed(0) : x.toFixed(2).replace(/\.?0+$/, ""));

/**
 * The rule checks against the club's track guidance: each rule with its value, the measured
 * value, pass or fail (as a word and a mark, not colour alone) and where the value comes from,
 * always with the note that the sanctioning body's current rulebook decides.
 */
export function RuleChecksTable({ report, settingsHref }: { report: RuleReport; settingsHref?: string }) {
  return (
    <section aria-labelledby="rules-heading" className="space-y-2">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="rules-heading" className="text-lg font-semibold">
          Rule checks: {report.label}
        </h2>
        <p className="text-sm text-ink-700">
          {report.passed} pass, {report.failed} fail
          {report.notChecked ? `, ${report.notChecked} not checked` : ""}
          {settingsHref ? (
            <>
              {" · "}
              <a href={settingsHref} className="text-pine-700 hover:underline">
                Change the club's guidance
              </a>
            </>
          ) : null}
        </p>
      </div>
      <div className="overflow-x-auto rounded-lg border border-sand-200 bg-white">
        <table className="w-full min-w-[40rem] text-sm">
          <thead className="bg-sand-100 text-left text-ink-700">
            <tr>
              <th scope="col" className="px-3 py-2">
                Rule
              </th>
              <th scope="col" className="px-3 py-2">
                Required
              </th>
              <th scope="col" className="px-3 py-2">
                Measured
              </th>
              <th scope="col" className="px-3 py-2">
                Result
              </th>
              <th scope="col" className="px-3 py-2">
                Source
              </th>
            </tr>
          </thead>
          <tbody>
            {report.checks.map((c) => {
              const s = STATUS[c.status];
              return (
                <tr key={c.id} className="border-t border-sand-200 align-top">
                  <th scope="row" className="px-3 py-2 text-left font-medium">
                    {c.label}
                  </th>
                  <td className="px-3 py-2 tabular-nums">
                    {c.comparison} {fmt(c.value)} {c.unit}
                  </td>
                  <td className="px-3 py-2 tabular-nums">
                    {c.measured === null ? c.detail : `${fmt(c.measured)} ${c.unit}`}
                  </td>
                  <td className="px-3 py-2">
                    <span
                      className={`inline-flex items-center gap-1 rounded px-1.5 py-0.5 text-xs font-semibold ${s.cls}`}
                    >
                      <span aria-hidden="true">{s.mark}</span>
                      {s.word}
                    </span>
                  </td>
                  <td className="px-3 py-2 text-xs text-ink-500">{c.source}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="text-sm text-ink-700" role="note">
        {report.note}
      </p>
    </section>
  );
}
