import { data, Form, Link } from "react-router";
import type { Route } from "./+types/profile-edit";
import { carPreset } from "~/analysis";
import { requireUser } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { deleteProfile, estimatedFields, getOwnProfile, updateProfile } from "~/cars/profiles.server";
import { formValues } from "~/clubs/form-values.server";
import { refusal } from "~/clubs/rule-error.server";
import { ProfileForm } from "~/components/cars/profile-form";
import { Button } from "~/components/ui/button";
import { parseProfileForm, profileFormValues } from "~/lib/schemas/car-profiles";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${data?.label ?? "Car profile"} · Loftline` },
];

const notFound = () =>
  new Response("No such car profile of yours.", { status: 404, statusText: "Not found" });

/** The owner's profile; anyone else's (or an unknown id) is 404. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const stored = await getOwnProfile(user.id, params.profileId);
  if (!stored) throw notFound();
  return {
    id: stored.id,
    label: stored.profile.label,
    presetLabel: carPreset(stored.presetId)?.label ?? stored.presetId,
    values: profileFormValues(stored.profile),
    estimates: estimatedFields(stored.presetId, stored.profile),
  };
}

/** Save (`intent=save`) or delete (`intent=delete`) the owner's profile; 404 for anyone else's. */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireUser(request);
  const formData = await request.formData();
  try {
    if (formData.get("intent") === "delete") {
      const label = await deleteProfile(user.id, params.profileId);
      throw await redirectWithNotice(request, "/profiles", `${label} is deleted.`);
    }
    if (!(await getOwnProfile(user.id, params.profileId))) throw notFound();
    const parsed = parseProfileForm(formData);
    if (!parsed.ok) return data({ errors: parsed.errors, values: formValues(formData) }, { status: 400 });
    await updateProfile(user.id, params.profileId, parsed.profile);
    throw await redirectWithNotice(
      request,
      `/profiles/${params.profileId}`,
      `${parsed.profile.label} is saved.`,
    );
  } catch (error) {
    if (error instanceof Response) throw error;
    return refusal(error, formValues(formData));
  }
}

export default function ProfileEdit({ loaderData: d, actionData }: Route.ComponentProps) {
  return (
    <div className="max-w-4xl space-y-6">
      <header>
        <p className="text-sm">
          <Link to="/profiles" className="text-pine-700 hover:underline">
            Your cars
          </Link>
        </p>
        <h1 className="mt-1 text-2xl font-semibold">{d.label}</h1>
        <p className="mt-1 max-w-prose text-ink-700">
          Started from the {d.presetLabel.toLowerCase()}.{" "}
          {d.estimates.length
            ? `${d.estimates.length} value(s) are still its estimates, marked below.`
            : "Every value is your own."}{" "}
          <a href={`/profiles/${d.id}/export`} download className="text-pine-700 hover:underline">
            Download as a file
          </a>{" "}
          (for <code>loftline analyse FILE --car CAR_FILE</code>).
        </p>
        <p className="mt-1 max-w-prose text-sm text-ink-700">
          Timed laps of this car? Open a published layout from{" "}
          <Link to="/clubs" className="text-pine-700 hover:underline">
            your clubs
          </Link>{" "}
          and choose “Calibrate a car from your laps” to fit its top speed and grip to them.
        </p>
      </header>
      <ProfileForm
        values={actionData?.values ?? d.values}
        errors={actionData?.errors}
        estimates={d.estimates}
        submitLabel="Save changes"
      />
      <section aria-labelledby="delete-car" className="rounded-lg border border-danger-100 bg-white p-4">
        <h2 id="delete-car" className="text-lg font-semibold">
          Delete
        </h2>
        <Form method="post" className="mt-2">
          <input type="hidden" name="intent" value="delete" />
          <Button type="submit" variant="danger">
            Delete {d.label}
          </Button>
        </Form>
      </section>
    </div>
  );
}
