import { data, Link } from "react-router";
import type { Route } from "./+types/profile-new";
import { CAR_NUMBER_FIELDS, CAR_PRESET_IDS, carPreset } from "~/analysis";
import { requireUser } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { createProfile, presetProfile } from "~/cars/profiles.server";
import { formValues } from "~/clubs/form-values.server";
import { refusal } from "~/clubs/rule-error.server";
import { ProfileForm } from "~/components/cars/profile-form";
import { parseProfileForm, profileFormValues } from "~/lib/schemas/car-profiles";

export const meta: Route.MetaFunction = () => [{ title: "New car profile · Loftline" }];

const ALL_FIELDS = CAR_NUMBER_FIELDS.map((f) => f.name);

/** A new profile's form, filled with the class preset named by `?preset=` (every value an estimate). */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const asked = new URL(request.url).searchParams.get("preset") ?? CAR_PRESET_IDS[0];
  const presetId = carPreset(asked) ? asked : CAR_PRESET_IDS[0];
  const profile = presetProfile(presetId)!;
  return {
    presetId,
    presetLabel: carPreset(presetId)!.label,
    values: profileFormValues({ ...profile, label: `My ${profile.label}` }),
  };
}

/** Saves the profile for the signed-in member; a refused form comes back whole with the fields named (400). */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireUser(request);
  const formData = await request.formData();
  const presetId = String(formData.get("preset") ?? "");
  const parsed = parseProfileForm(formData);
  if (!parsed.ok) return data({ errors: parsed.errors, values: formValues(formData) }, { status: 400 });
  try {
    const { id } = await createProfile(user.id, presetId, parsed.profile);
    throw await redirectWithNotice(request, `/profiles/${id}`, `${parsed.profile.label} is saved.`);
  } catch (error) {
    if (error instanceof Response) throw error;
    return refusal(error, formValues(formData));
  }
}

export default function ProfileNew({ loaderData: d, actionData }: Route.ComponentProps) {
  return (
    <div className="max-w-4xl space-y-6">
      <header>
        <p className="text-sm">
          <Link to="/profiles" className="text-pine-700 hover:underline">
            Your cars
          </Link>
        </p>
        <h1 className="mt-1 text-2xl font-semibold">New car profile</h1>
        <p className="mt-1 max-w-prose text-ink-700">
          Filled in from the {d.presetLabel.toLowerCase()}: every value is an estimate until you put in your
          own measurement. Each field says how to measure it at home.
        </p>
      </header>
      <ProfileForm
        values={actionData?.values ?? d.values}
        errors={actionData?.errors}
        estimates={ALL_FIELDS}
        submitLabel="Save the profile"
        hidden={{ preset: d.presetId }}
      />
    </div>
  );
}
