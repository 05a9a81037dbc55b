import { Form } from "react-router";
import { CAR_CLASS_COUNT } from "~/analysis";
import { Button } from "~/components/ui/button";
import { FieldError } from "~/components/ui/form";
import { CAR_CLASS_OPTIONS, carClassLabel } from "~/lib/car-classes";

/**
 * Tick boxes of the car classes (the class presets) a layout is analysed for, used by the
 * new-layout form, the layout's settings and the club's default classes. Classes already chosen
 * that are not presets (from an imported file) are shown too, so a save keeps them visible.
 */
export function CarClassPicker({
  checked,
  errors,
  legend = "Car classes",
  name = "carClasses",
}: {
  checked: readonly string[];
  errors?: string[];
  legend?: string;
  name?: string;
}) {
  const options = [
    ...CAR_CLASS_OPTIONS,
    ...checked
      .filter((id) => !CAR_CLASS_OPTIONS.some((o) => o.id === id))
      .map((id) => ({ id, label: carClassLabel(id) })),
  ];
  const errorId = `field-${name}-error`;
  return (
    <fieldset
      className="space-y-1.5"
      aria-describedby={errors?.length ? errorId : `field-${name}-hint`}
      aria-invalid={errors?.length ? true : undefined}
    >
      <legend className="text-sm font-medium text-ink-700">{legend}</legend>
      {options.map((o) => (
        <label key={o.id} className="flex items-center gap-2 text-sm">
          <input type="checkbox" name={name} value={o.id} defaultChecked={checked.includes(o.id)} />
          {o.label}
        </label>
      ))}
      <p id={`field-${name}-hint`} className="text-xs text-ink-500">
        {CAR_CLASS_COUNT.min} to {CAR_CLASS_COUNT.max} classes; the analysis is worked out for each (class
        presets, estimates). A member&apos;s own car is previewed by that member and is not a layout class.
      </p>
      <FieldError id={errorId} errors={errors} />
    </fieldset>
  );
}

/** The club's default car classes: what the new-layout form starts with. */
export function DefaultClassesForm({
  checked,
  errors,
  busy,
}: {
  checked: readonly string[];
  errors: string[] | undefined;
  busy: boolean;
}) {
  return (
    <section aria-labelledby="classes-heading" className="space-y-3">
      <div>
        <h2 id="classes-heading" className="text-lg font-semibold">
          Car classes of new layouts
        </h2>
        <p className="mt-1 max-w-prose text-sm text-ink-700">
          A new layout is analysed for these classes until its own settings say otherwise. Each layout keeps
          the classes it was given.
        </p>
      </div>
      <Form method="post" className="space-y-3" noValidate>
        <input type="hidden" name="intent" value="default-classes" />
        <CarClassPicker checked={checked} errors={errors} legend="Default car classes" />
        <Button type="submit" disabled={busy}>
          Save the default classes
        </Button>
      </Form>
    </section>
  );
}
