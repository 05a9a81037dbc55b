import { Form, useNavigation } from "react-router";
import {
  CAR_FIELD_GROUPS,
  CAR_LABEL_MAX,
  CAR_NUMBER_FIELDS,
  DRIVE_LABELS,
  type CarFieldGroup,
} from "~/analysis";
import { Button } from "~/components/ui/button";
import { Field, FieldError, FormMessage, SelectField, type FieldErrors } from "~/components/ui/form";

/**
 * A car profile's fields, grouped, each with its unit, bounds and how to measure it at home. Fields
 * still at the class preset's value are marked "estimate". Works without JavaScript (a plain post);
 * a refused form comes back with everything typed and each problem beside its field.
 */
export function ProfileForm({
  values,
  errors,
  estimates,
  submitLabel,
  hidden = {},
}: {
  values: Record<string, string>;
  errors?: FieldErrors;
  /** Field names still at the preset's value. */
  estimates: readonly string[];
  submitLabel: string;
  hidden?: Record<string, string>;
}) {
  const busy = useNavigation().state === "submitting";
  const groups = Object.keys(CAR_FIELD_GROUPS) as CarFieldGroup[];
  const count = errors ? Object.keys(errors).length : 0;
  return (
    <Form method="post" className="space-y-6" noValidate>
      {Object.entries(hidden).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      {count ? (
        <FormMessage>
          {count === 1 ? "One field needs a look" : `${count} fields need a look`}: see the message beside{" "}
          {count === 1 ? "it" : "each"}. Nothing was saved; everything you typed is still here.
        </FormMessage>
      ) : null}
      <FormMessage>{errors?.form?.join(" ")}</FormMessage>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label="Name"
          name="label"
          defaultValue={values.label}
          maxLength={CAR_LABEL_MAX}
          errors={errors?.label}
          hint="What you call this car, e.g. “Club racer, summer tyres”."
        />
        <SelectField label="Drive" name="drive" defaultValue={values.drive} errors={errors?.drive}>
          {Object.entries(DRIVE_LABELS).map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
        </SelectField>
      </div>
      {groups.map((group) => (
        <fieldset key={group} className="space-y-3 rounded-lg border border-sand-200 bg-white p-4">
          <legend className="px-1 font-semibold">{CAR_FIELD_GROUPS[group]}</legend>
          <div className="grid gap-4 sm:grid-cols-2">
            {CAR_NUMBER_FIELDS.filter((f) => f.group === group).map((f) => {
              const estimate = estimates.includes(f.name);
              const id = `car-${f.name.replace(/\./g, "-")}`;
              return (
                <div key={f.name} className="space-y-1">
                  <label
                    htmlFor={id}
                    className="flex flex-wrap items-baseline gap-x-2 text-sm font-medium text-ink-700"
                  >
                    {f.label}
                    {f.unit ? <span className="font-normal text-ink-500">({f.unit})</span> : null}
                    {estimate ? (
                      <span className="rounded-full border border-clay-500 px-1.5 text-xs font-normal text-clay-700">
                        estimate
                      </span>
                    ) : null}
                  </label>
                  <input
                    id={id}
                    name={f.name}
                    inputMode="decimal"
                    defaultValue={values[f.name] ?? ""}
                    aria-invalid={errors?.[f.name]?.length ? true : undefined}
                    aria-describedby={`${id}-help${errors?.[f.name]?.length ? ` ${id}-error` : ""}`}
                    className="block w-full rounded-md border border-ink-300 bg-white px-3 py-2 text-sm shadow-sm focus:border-pine-600 aria-[invalid=true]:border-danger-700"
                  />
                  <p id={`${id}-help`} className="text-xs text-ink-500">
                    {f.min} to {f.max}
                    {f.unit ? ` ${f.unit}` : ""}. {f.help}
                  </p>
                  <FieldError id={`${id}-error`} errors={errors?.[f.name]} />
                </div>
              );
            })}
          </div>
        </fieldset>
      ))}
      <Button type="submit" name="intent" value="save" disabled={busy}>
        {submitLabel}
      </Button>
    </Form>
  );
}
