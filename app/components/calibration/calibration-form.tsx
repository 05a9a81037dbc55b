import { Form, useNavigation } from "react-router";
import { Button } from "~/components/ui/button";
import { Field, FieldError, SelectField } from "~/components/ui/form";

type Choice = { value: string; label: string };

export type CalibrationRefusalView = {
  field: string;
  message: string;
  issues: { line: number; column?: string; message: string }[];
};

/** The problems of a refused lap file, each with its line and column. */
export function LapFileIssues({ refusal }: { refusal: CalibrationRefusalView }) {
  if (refusal.issues.length === 0) return null;
  return (
    <div role="alert" className="rounded-md border border-danger-100 bg-danger-100/50 p-3 text-sm">
      <p className="font-medium text-danger-700">{refusal.message}</p>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {refusal.issues.map((issue, i) => (
          <li key={`${issue.line}-${i}`}>
            Line {issue.line}
            {issue.column ? `, column “${issue.column}”` : ""}: {issue.message}
          </li>
        ))}
      </ul>
    </div>
  );
}

/** The upload form: version, car, lap file, optional column names and a second layout's file. */
export function CalibrationForm({
  versions,
  cars,
  ownCars,
  others,
  maxKb,
  refusal,
  car,
}: {
  /** The car chosen at first: the address's or the member's last, else their first own car. */
  car?: string;
  versions: Choice[];
  cars: Choice[];
  ownCars: Choice[];
  others: Choice[];
  maxKb: number;
  refusal?: CalibrationRefusalView;
}) {
  const busy = useNavigation().state === "submitting";
  const errorsFor = (field: string) =>
    refusal && refusal.field === field && !refusal.issues.length ? [refusal.message] : undefined;
  return (
    <Form
      method="post"
      encType="multipart/form-data"
      className="space-y-4 rounded-lg border border-sand-200 bg-white p-4"
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Published version" name="version" errors={errorsFor("version")}>
          {versions.map((v) => (
            <option key={v.value} value={v.value}>
              {v.label}
            </option>
          ))}
        </SelectField>
        <SelectField label="Car" name="car" defaultValue={car ?? ownCars[0]?.value} errors={errorsFor("car")}>
          {ownCars.length ? (
            <optgroup label="Your cars">
              {ownCars.map((c) => (
                <option key={c.value} value={c.value}>
                  {c.label}
                </option>
              ))}
            </optgroup>
          ) : null}
          <optgroup label="Car classes">
            {cars.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </optgroup>
        </SelectField>
      </div>
      <Field
        label="Lap file (.csv)"
        name="file"
        type="file"
        accept=".csv,text/csv"
        errors={errorsFor("file")}
        hint={`Comma-separated, a header row, one lap a row, at most ${maxKb} KB. Times in seconds (41.27) or minutes and seconds (0:41.27); optional columns “sector 1”, “sector 2”, … for equal parts of the lap.`}
      />
      <details className="text-sm">
        <summary className="cursor-pointer text-pine-700">
          Columns (found by their names unless you name them)
        </summary>
        <div className="mt-2 grid gap-4 sm:grid-cols-2">
          <Field label="Lap number column" name="lapColumn" placeholder="lap" />
          <Field label="Lap time column" name="timeColumn" placeholder="time" />
        </div>
      </details>
      {others.length ? (
        <details className="text-sm" open={refusal?.field === "other" || refusal?.field === "file2"}>
          <summary className="cursor-pointer text-pine-700">
            Laps on a second layout (to tell top speed from grip)
          </summary>
          <div className="mt-2 grid gap-4 sm:grid-cols-2">
            <SelectField label="Second layout" name="other" errors={errorsFor("other")}>
              <option value="">None</option>
              {others.map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </SelectField>
            <Field
              label="Its lap file (.csv)"
              name="file2"
              type="file"
              accept=".csv,text/csv"
              errors={errorsFor("file2")}
            />
          </div>
        </details>
      ) : null}
      <FieldError
        errors={
          refusal && !["version", "car", "file", "other", "file2"].includes(refusal.field)
            ? [refusal.message]
            : undefined
        }
      />
      <Button type="submit" disabled={busy}>
        {busy ? "Comparing…" : "Compare with the model"}
      </Button>
    </Form>
  );
}
