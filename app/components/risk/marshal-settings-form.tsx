import { Form } from "react-router";
import { Button } from "~/components/ui/button";
import { Field, FormMessage, type FieldErrors } from "~/components/ui/form";
import {
  CLUB_MARSHAL_FIELDS,
  marshalFieldInfo,
  type ClubMarshalValues,
} from "~/lib/schemas/marshal-settings";

type Props = {
  saved: ClubMarshalValues;
  /** The values sent when the form came back with errors. */
  values?: Record<string, string>;
  errors?: FieldErrors;
  busy: boolean;
};

/** The club's marshal settings (directors only): reach from the track edge and the largest heat. */
export function MarshalSettingsForm({ saved, values, errors, busy }: Props) {
  return (
    <section aria-labelledby="marshal-settings-heading" className="space-y-3">
      <div>
        <h2 id="marshal-settings-heading" className="text-lg font-semibold">
          Marshal points
        </h2>
        <p className="mt-1 max-w-prose text-sm text-ink-700">
          The editor warns about a marshal point farther from the track edge than the reach, and suggests as
          many points as the largest heat. The corner-risk sheet uses both.
        </p>
      </div>
      <FormMessage>{errors?.form?.join(" ")}</FormMessage>
      <Form method="post" className="space-y-4" noValidate>
        <input type="hidden" name="intent" value="marshal-settings" />
        {CLUB_MARSHAL_FIELDS.map((id) => {
          const info = marshalFieldInfo(id);
          return (
            <div key={id} className="max-w-md">
              <Field
                label={`${info.label} (${info.unit})`}
                name={id}
                inputMode={info.integer ? "numeric" : "decimal"}
                defaultValue={values ? (values[id] ?? "") : String(saved[id])}
                errors={errors?.[id]}
                hint={`Between ${info.min} and ${info.max}. Default ${info.default} ${info.unit}. ${info.source}.`}
              />
            </div>
          );
        })}
        <Button type="submit" disabled={busy}>
          Save the marshal settings
        </Button>
      </Form>
    </section>
  );
}
