import { data, Form, useNavigation } from "react-router";
import type { Route } from "./+types/club-settings";
import {
  checkRules,
  GUIDANCE_SET_IDS,
  GUIDANCE_SETS,
  RULES_NOTE,
  type GuidanceOverrides,
  type GuidanceSetId,
} from "~/analysis";
import { requireClubRole } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { formValues } from "~/clubs/form-values.server";
import { loadClubGuidance, saveClubGuidance } from "~/clubs/guidance.server";
import { Button } from "~/components/ui/button";
import { FieldError, FormMessage, type FieldErrors } from "~/components/ui/form";
import { parseForm } from "~/lib/forms";
import {
  clubCarClassesSchema,
  clubSettingsSchema,
  RULE_FIELDS,
  settingsFromForm,
  VERDICT_FIELDS,
} from "~/lib/schemas/club-settings";
import { LIST_FIELDS } from "~/lib/schemas/layouts";
import { loadClubCarClasses, saveClubCarClasses } from "~/clubs/car-classes.server";
import { DefaultClassesForm } from "~/components/car-class-picker";
import { loadClubMarshal, saveClubMarshal } from "~/clubs/marshal-settings.server";
import { MarshalSettingsForm } from "~/components/risk/marshal-settings-form";
import { clubMarshalSchema } from "~/lib/schemas/marshal-settings";

export const meta: Route.MetaFunction = () => [{ title: "Club settings · Loftline" }];

/** Where each rule's value comes from, as the rule checks state it (the engine is the one source). */
function ruleSources(set: GuidanceSetId, overrides: GuidanceOverrides): Record<string, string> {
  const report = checkRules(
    {
      trackWidth: 0,
      lapLength: 0,
      standDistance: null,
      startStraight: 0,
      hiddenLength: null,
      marshalGapRatio: null,
    },
    set,
    overrides,
  );
  return Object.fromEntries(report.checks.map((c) => [c.id, c.source]));
}

/** Directors only: the club's default car classes, its guidance set and its own values for any rule. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { club } = await requireClubRole(request, params.clubId, "director");
  const guidance = await loadClubGuidance(club.id);
  return {
    club,
    carClasses: await loadClubCarClasses(club.id),
    guidance,
    sets: GUIDANCE_SET_IDS.map((id) => ({
      id,
      label: GUIDANCE_SETS[id].label,
      values: GUIDANCE_SETS[id].values,
    })),
    sources: ruleSources(guidance.guidanceSet, guidance.overrides),
    marshal: await loadClubMarshal(club.id),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { club } = await requireClubRole(request, params.clubId, "director");
  const formData = await request.formData();
  if (formData.get("intent") === "default-classes") {
    const classes = parseForm(clubCarClassesSchema, formData, LIST_FIELDS);
    if (!classes.ok)
      return data(
        {
          errors: classes.errors,
          values: { intent: "default-classes", carClasses: formData.getAll("carClasses").map(String) },
        },
        { status: 400 },
      );
    await saveClubCarClasses(club.id, classes.data.carClasses);
    throw await redirectWithNotice(
      request,
      `/clubs/${club.id}/settings`,
      "Default car classes saved. New layouts start with them; existing layouts keep their own.",
    );
  }
  if (formData.get("intent") === "marshal-settings") {
    const marshal = parseForm(clubMarshalSchema, formData);
    if (!marshal.ok) return data({ errors: marshal.errors, values: formValues(formData) }, { status: 400 });
    await saveClubMarshal(club.id, { reach: marshal.data.reach, heatSize: marshal.data.heatSize });
    throw await redirectWithNotice(
      request,
      `/clubs/${club.id}/settings`,
      "Marshal settings saved. The editor's warnings, suggested points and the corner-risk sheet use them.",
    );
  }
  const parsed = parseForm(clubSettingsSchema, formData);
  if (!parsed.ok) return data({ errors: parsed.errors, values: formValues(formData) }, { status: 400 });
  await saveClubGuidance(club.id, settingsFromForm(parsed.data));
  throw await redirectWithNotice(
    request,
    `/clubs/${club.id}/settings`,
    "Track guidance saved. Every layout's rule checks and set-up verdicts now use it.",
  );
}

export default function ClubSettings({ loaderData, actionData }: Route.ComponentProps) {
  const { guidance, sets, sources } = loaderData;
  const classesSent = actionData?.values?.intent === "default-classes";
  const marshalSent = actionData?.values?.intent === "marshal-settings";
  const errors: FieldErrors | undefined = classesSent || marshalSent ? undefined : actionData?.errors;
  const values =
    classesSent || marshalSent ? undefined : (actionData?.values as Record<string, string> | undefined);
  const busy = useNavigation().state === "submitting";
  const chosen = (values?.guidanceSet as GuidanceSetId | undefined) ?? guidance.guidanceSet;
  const overrideText = (id: string) =>
    values ? (values[id] ?? "") : (guidance.overrides[id as keyof GuidanceOverrides]?.toString() ?? "");
  const verdictText = (id: string) =>
    values ? (values[id] ?? "") : (guidance.verdict?.[id as keyof typeof guidance.verdict]?.toString() ?? "");
  return (
    <div className="max-w-4xl space-y-10">
      <DefaultClassesForm
        checked={
          classesSent
            ? ((actionData?.values?.carClasses as string[] | undefined) ?? [])
            : loaderData.carClasses
        }
        errors={classesSent ? actionData?.errors?.carClasses : undefined}
        busy={busy}
      />
      <MarshalSettingsForm
        saved={loaderData.marshal}
        values={marshalSent ? (actionData?.values as Record<string, string>) : undefined}
        errors={marshalSent ? actionData?.errors : undefined}
        busy={busy}
      />
      <section aria-labelledby="guidance-heading" className="space-y-4">
        <div>
          <h2 id="guidance-heading" className="text-lg font-semibold">
            Track guidance for the rule checks
          </h2>
          <p className="mt-1 max-w-prose text-sm text-ink-700">
            Each layout's analysis checks the drawing against these values. Pick the set that matches the
            level your club races at, then set the club's own value for any rule your sanctioning body words
            differently. An empty field keeps the set's value.
          </p>
        </div>
        <p className="rounded-md border border-clay-500/40 bg-clay-100/60 px-3 py-2 text-sm" role="note">
          {RULES_NOTE}
        </p>
        <FormMessage>{errors?.form?.join(" ")}</FormMessage>
        <Form method="post" className="space-y-6" noValidate>
          <fieldset className="space-y-2">
            <legend className="text-sm font-medium text-ink-700">Guidance set</legend>
            {sets.map((set) => (
              <label key={set.id} className="flex items-center gap-2 text-sm">
                <input type="radio" name="guidanceSet" value={set.id} defaultChecked={chosen === set.id} />
                {set.label}
              </label>
            ))}
            <FieldError errors={errors?.guidanceSet} />
          </fieldset>
          <div className="overflow-x-auto rounded-lg border border-sand-200 bg-white">
            <table className="w-full min-w-[40rem] text-sm">
              <caption className="sr-only">
                Rules, the values of each guidance set, and the club's own values
              </caption>
              <thead className="bg-sand-100 text-left text-ink-700">
                <tr>
                  <th scope="col" className="px-3 py-2">
                    Rule
                  </th>
                  {sets.map((s) => (
                    <th key={s.id} scope="col" className="px-3 py-2">
                      {s.label}
                    </th>
                  ))}
                  <th scope="col" className="px-3 py-2">
                    Club's own value
                  </th>
                </tr>
              </thead>
              <tbody>
                {RULE_FIELDS.map((f) => {
                  const id = `rule-${f.id}`;
                  const fieldErrors = errors?.[f.id];
                  return (
                    <tr key={f.id} className="border-t border-sand-200 align-top">
                      <th scope="row" className="px-3 py-2 text-left font-medium">
                        {f.label}
                        <p className="mt-0.5 text-xs font-normal text-ink-500">{f.hint}</p>
                        <p className="mt-0.5 text-xs font-normal text-ink-500">Source: {sources[f.id]}</p>
                      </th>
                      {sets.map((s) => (
                        <td key={s.id} className="px-3 py-2 tabular-nums">
                          {s.values[f.id]} {f.unit}
                        </td>
                      ))}
                      <td className="px-3 py-2">
                        <label htmlFor={id} className="sr-only">
                          {f.label}, club's own value ({f.unit})
                        </label>
                        <input
                          id={id}
                          name={f.id}
                          inputMode="decimal"
                          defaultValue={overrideText(f.id)}
                          placeholder="set's value"
                          className="w-28 rounded-md border border-ink-300 px-2 py-1 aria-[invalid=true]:border-danger-700"
                          aria-invalid={fieldErrors ? true : undefined}
                          aria-describedby={fieldErrors ? `${id}-error` : undefined}
                        />{" "}
                        <span className="text-xs text-ink-500">{f.unit}</span>
                        <FieldError id={`${id}-error`} errors={fieldErrors} />
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
          <fieldset className="space-y-2">
            <legend className="text-sm font-medium text-ink-700">When a set-up in the air is worth it</legend>
            <p className="max-w-prose text-sm text-ink-700">
              The jump verdicts recommend a set-up only above both values; the defaults are estimates, not
              measurements. An empty field keeps the default.
            </p>
            {VERDICT_FIELDS.map((f) => {
              const id = `verdict-${f.id}`;
              const fieldErrors = errors?.[f.id];
              return (
                <div key={f.id} className="text-sm">
                  <label htmlFor={id} className="font-medium">
                    {f.label} ({f.unit})
                  </label>
                  <p className="text-xs text-ink-500">
                    {f.hint} Default {f.default} {f.unit} (an estimate).
                  </p>
                  <input
                    id={id}
                    name={f.id}
                    inputMode="decimal"
                    defaultValue={verdictText(f.id)}
                    placeholder={`${f.default}`}
                    className="mt-1 w-28 rounded-md border border-ink-300 px-2 py-1 aria-[invalid=true]:border-danger-700"
                    aria-invalid={fieldErrors ? true : undefined}
                    aria-describedby={fieldErrors ? `${id}-error` : undefined}
                  />
                  <FieldError id={`${id}-error`} errors={fieldErrors} />
                </div>
              );
            })}
          </fieldset>
          <Button type="submit" disabled={busy}>
            Save the track guidance
          </Button>
        </Form>
      </section>
    </div>
  );
}
