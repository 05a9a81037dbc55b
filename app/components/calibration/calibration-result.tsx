import { lazy, Suspense } from "react";
import { Form } from "react-router";
import { CAR_NUMBER_FIELDS, SLOW_LAP_RATIO } from "~/analysis";
import { ClientOnly } from "~/components/editor/client-only";
import { Button } from "~/components/ui/button";
import { Field } from "~/components/ui/form";
import type { CalibrationResult } from "~/calibration/run.server";

const LapChart = lazy(() => import("./lap-chart"));

const s = (t: number) => t.toFixed(2);
const FIELDS = ["topSpeed", "accel0", "brakeDecel", "mu"] as const;
const fieldOf = (name: string) => CAR_NUMBER_FIELDS.find((f) => f.name === name)!;
const sixDigits = (v: number) => String(Number(v.toPrecision(6)));

function Summary({ r }: { r: CalibrationResult }) {
  const first = r.runs[0];
  const slower = Math.round((r.paceFactor - 1) * 100);
  return (
    <div className="space-y-2 text-ink-700">
      <p>
        Your laps on {first.layoutName} (version {first.version}) average{" "}
        <strong>{s(first.measuredMean)} s</strong>; the model gives {s(first.modelBefore)} s for {r.car.label}{" "}
        as entered: a pace factor of <strong>{r.paceFactor.toFixed(3)}</strong> (
        {slower >= 0 ? `${slower}% slower` : `${-slower}% faster`} than the model).
      </p>
      {r.paceAtBound ? (
        <p className="text-danger-700">
          The laps are far from the model (the factor is held at its bound): check the version, the car and
          the file.
        </p>
      ) : null}
      <p>
        {r.mode === "speed-grip"
          ? `Top speed and grip are fitted separately, from ${first.sectors ? "the sector times" : "the laps on two layouts"}.`
          : "Lap times on one layout cannot tell top speed from grip: the fitted values scale the car's speeds evenly (top speed by one factor; acceleration, braking and grip by its square)."}
      </p>
      {r.notSeparated ? <p>{r.notSeparated}</p> : null}
      {r.notes.map((n) => (
        <p key={n}>{n}</p>
      ))}
    </div>
  );
}

function LapsTable({ run }: { run: CalibrationResult["runs"][number] }) {
  return (
    <div className="space-y-2">
      <table className="w-full max-w-xl text-sm">
        <caption className="text-left font-medium">
          {run.layoutName}, version {run.version}: {run.laps.length} laps
        </caption>
        <thead>
          <tr className="border-b border-sand-200 text-left">
            <th className="py-1 pr-4">Lap</th>
            <th className="py-1 pr-4 text-right">Measured, s</th>
            <th className="py-1 pr-4 text-right">Model as entered, s</th>
            <th className="py-1 text-right">Model fitted, s</th>
          </tr>
        </thead>
        <tbody>
          {run.laps.map((l) => (
            <tr key={l.lap} className="border-b border-sand-100">
              <td className="py-1 pr-4">{l.lap}</td>
              <td className="py-1 pr-4 text-right tabular-nums">{s(l.time)}</td>
              <td className="py-1 pr-4 text-right tabular-nums">{s(run.modelBefore)}</td>
              <td className="py-1 text-right tabular-nums">{s(run.modelAfter)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {run.dropped.length ? (
        <p className="text-sm text-ink-700">
          Left out as crashed or stopped (slower than {s(run.limit)} s, {SLOW_LAP_RATIO} × the median lap):{" "}
          {run.dropped.map((d) => `lap ${d.lap} (${s(d.time)} s, line ${d.line})`).join(", ")}.
        </p>
      ) : null}
      {run.sectors ? (
        <table className="w-full max-w-xl text-sm">
          <caption className="text-left font-medium">
            Mean sector times (equal parts of the lap by distance)
          </caption>
          <thead>
            <tr className="border-b border-sand-200 text-left">
              <th className="py-1 pr-4">Sector</th>
              <th className="py-1 pr-4 text-right">Measured, s</th>
              <th className="py-1 pr-4 text-right">Model as entered, s</th>
              <th className="py-1 text-right">Model fitted, s</th>
            </tr>
          </thead>
          <tbody>
            {run.sectors.measured.map((m, i) => (
              <tr key={i} className="border-b border-sand-100">
                <td className="py-1 pr-4">{i + 1}</td>
                <td className="py-1 pr-4 text-right tabular-nums">{s(m)}</td>
                <td className="py-1 pr-4 text-right tabular-nums">{s(run.sectors!.before[i])}</td>
                <td className="py-1 text-right tabular-nums">{s(run.sectors!.after[i])}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </div>
  );
}

function SaveForm({ r }: { r: CalibrationResult }) {
  const hidden = FIELDS.map((name) => (
    <input key={name} type="hidden" name={name} value={sixDigits(r.fitted[name])} />
  ));
  if (r.car.profileId)
    return (
      <Form method="post" className="flex flex-wrap items-end gap-3">
        <input type="hidden" name="intent" value="save" />
        <input type="hidden" name="profileId" value={r.car.profileId} />
        {hidden}
        <Button type="submit">Save the fitted values to {r.car.label}</Button>
      </Form>
    );
  return (
    <Form method="post" className="flex flex-wrap items-end gap-3">
      <input type="hidden" name="intent" value="save-new" />
      <input type="hidden" name="presetId" value={r.car.presetId} />
      {hidden}
      <div className="w-72">
        <Field
          label="Name of the new profile"
          name="label"
          defaultValue={`${r.car.label}, calibrated`}
          required
        />
      </div>
      <Button type="submit">Save as a new profile</Button>
      <p className="basis-full text-sm text-ink-500">
        A car class cannot be changed: the values go into a new car profile of yours.
      </p>
    </Form>
  );
}

/** The result: what was fitted, the laps side by side (chart and table), and the save form. */
export function CalibrationResultView({ r }: { r: CalibrationResult }) {
  const first = r.runs[0];
  const chart = first.laps.map((l) => ({
    lap: l.lap,
    measured: l.time,
    before: first.modelBefore,
    after: first.modelAfter,
  }));
  return (
    <section
      aria-labelledby="result-heading"
      className="space-y-4 rounded-lg border border-sand-200 bg-white p-4"
    >
      <h2 id="result-heading" className="text-lg font-semibold">
        Measured and modelled laps
      </h2>
      <Summary r={r} />
      <div className="print:hidden" aria-hidden="true">
        <ClientOnly fallback={null}>
          {() => (
            <Suspense fallback={null}>
              <LapChart data={chart} />
            </Suspense>
          )}
        </ClientOnly>
      </div>
      {r.runs.map((run) => (
        <LapsTable key={`${run.layoutName}-${run.version}`} run={run} />
      ))}
      <table className="w-full max-w-xl text-sm">
        <caption className="text-left font-medium">The car's values</caption>
        <thead>
          <tr className="border-b border-sand-200 text-left">
            <th className="py-1 pr-4">Value</th>
            <th className="py-1 pr-4 text-right">As entered</th>
            <th className="py-1 text-right">Fitted</th>
          </tr>
        </thead>
        <tbody>
          {FIELDS.map((name) => (
            <tr key={name} className="border-b border-sand-100">
              <td className="py-1 pr-4">{fieldOf(name).label}</td>
              <td className="py-1 pr-4 text-right tabular-nums">
                {r.current[name].toFixed(2)} {fieldOf(name).unit}
              </td>
              <td className="py-1 text-right tabular-nums">
                {r.fitted[name].toFixed(2)} {fieldOf(name).unit}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <SaveForm r={r} />
    </section>
  );
}
