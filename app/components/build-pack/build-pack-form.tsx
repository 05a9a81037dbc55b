import { Form } from "react-router";
import { Button } from "~/components/ui/button";
import { Field, SelectField, type FieldErrors } from "~/components/ui/form";
import { DATUM_CHOICE_LABELS } from "~/lib/build-pack-words";
import { BUILD_LIMITS } from "~/lib/schemas/build-pack";

const FIELDS = [
  "version",
  "a",
  "ax",
  "ay",
  "b",
  "bx",
  "by",
  "spacing",
  "truck",
  "lat",
  "lon",
  "orient",
  "trueBearing",
];

type Props = {
  choices: { key: string; label: string; x: number; y: number }[];
  versions: { number: number; createdAt: string; note: string | null }[];
  values: Record<string, string>;
  errors: FieldErrors | null;
};

/**
 * The build pack's settings as a plain GET form: the sheets follow the address, so they work
 * without JavaScript and can be printed again exactly as they were.
 */
export function BuildPackForm({ choices, versions, values, errors }: Props) {
  const v = (name: string) => values[name] ?? "";
  const e = (name: string) => errors?.[name];
  // Problems with no field of their own here (an address with a setting this form does not have).
  const others = Object.entries(errors ?? {}).filter(([field]) => !FIELDS.includes(field));
  const datum = (name: "a" | "b") => (
    <fieldset className="space-y-3 rounded-md border border-sand-200 p-3">
      <legend className="px-1 text-sm font-semibold">Datum {name.toUpperCase()}</legend>
      <SelectField
        label={`Datum ${name.toUpperCase()} stake`}
        name={name}
        defaultValue={v(name)}
        errors={e(name)}
      >
        {choices.map((c) => (
          <option key={c.key} value={c.key}>
            {c.label} (x {c.x}, y {c.y})
          </option>
        ))}
        <option value="xy">{DATUM_CHOICE_LABELS.xy}</option>
      </SelectField>
      <div className="grid grid-cols-2 gap-3">
        <Field
          label={`${name.toUpperCase()} x (m)`}
          name={`${name}x`}
          inputMode="decimal"
          defaultValue={v(`${name}x`)}
          errors={e(`${name}x`)}
        />
        <Field
          label={`${name.toUpperCase()} y (m)`}
          name={`${name}y`}
          inputMode="decimal"
          defaultValue={v(`${name}y`)}
          errors={e(`${name}y`)}
        />
      </div>
      <p className="text-xs text-ink-500">x and y only count when the stake is set to plan coordinates.</p>
    </fieldset>
  );
  return (
    <Form
      method="get"
      className="space-y-4 rounded-lg border border-sand-200 bg-white p-4 no-print"
      noValidate
    >
      <h2 className="text-lg font-semibold">Settings</h2>
      {others.length ? (
        <div role="alert" className="text-sm text-danger-700">
          {others.map(([field, messages]) => (
            <p key={field}>
              {field === "form" ? "" : `${field}: `}
              {(messages ?? []).join(" ")}
            </p>
          ))}
        </div>
      ) : null}
      <SelectField label="Layout version" name="version" defaultValue={v("version")} errors={e("version")}>
        <option value="">The layout as it is now</option>
        {versions.map((x) => (
          <option key={x.number} value={x.number}>
            Version {x.number}, saved {x.createdAt.slice(0, 10)}
            {x.note ? `: ${x.note}` : ""}
          </option>
        ))}
      </SelectField>
      <div className="grid gap-4 md:grid-cols-2">
        {datum("a")}
        {datum("b")}
      </div>
      <div className="grid gap-4 md:grid-cols-2">
        <Field
          label="Station spacing (m)"
          name="spacing"
          inputMode="decimal"
          defaultValue={v("spacing")}
          errors={e("spacing")}
          hint={`Centre-line stakes at least this often (${BUILD_LIMITS.spacing.min} to ${BUILD_LIMITS.spacing.max} m), and at every section end.`}
        />
        <Field
          label="Truck load (m³)"
          name="truck"
          inputMode="decimal"
          defaultValue={v("truck")}
          errors={e("truck")}
          hint="What one load of earth holds; ask your supplier."
        />
      </div>
      <fieldset className="space-y-3 rounded-md border border-sand-200 p-3">
        <legend className="px-1 text-sm font-semibold">
          On the earth (optional: adds latitude and longitude)
        </legend>
        <div className="grid gap-4 md:grid-cols-2">
          <Field
            label="Latitude of datum A (°)"
            name="lat"
            inputMode="decimal"
            defaultValue={v("lat")}
            errors={e("lat")}
            hint="WGS84, north positive, e.g. 52.123456"
          />
          <Field
            label="Longitude of datum A (°)"
            name="lon"
            inputMode="decimal"
            defaultValue={v("lon")}
            errors={e("lon")}
            hint="WGS84, east positive, e.g. -1.234567"
          />
          <SelectField
            label="The true bearing below is of"
            name="orient"
            defaultValue={v("orient") || "grid"}
            errors={e("orient")}
          >
            <option value="grid">the plan's up direction (grid north)</option>
            <option value="ab">the line from A to B, measured on site</option>
          </SelectField>
          <Field
            label="True bearing (°)"
            name="trueBearing"
            inputMode="decimal"
            defaultValue={v("trueBearing")}
            errors={e("trueBearing")}
            hint="Clockwise from true north, 0 to 360. Leave empty when the plan's up is true north."
          />
        </div>
      </fieldset>
      <Button type="submit">Make the sheets</Button>
    </Form>
  );
}
