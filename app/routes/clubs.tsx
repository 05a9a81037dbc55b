import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/clubs";
import { requireUser } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { createClub, listMyClubs } from "~/clubs/clubs.server";
import { Button } from "~/components/ui/button";
import { Field } from "~/components/ui/form";
import { formValues } from "~/clubs/form-values.server";
import { parseForm } from "~/lib/forms";
import { ROLE_LABELS } from "~/lib/roles";
import { createClubSchema } from "~/lib/schemas/clubs";

export const meta: Route.MetaFunction = () => [{ title: "Your clubs · Loftline" }];

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  return { clubs: await listMyClubs(user.id) };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireUser(request);
  const formData = await request.formData();
  const parsed = parseForm(createClubSchema, formData);
  if (!parsed.ok) return data({ errors: parsed.errors, values: formValues(formData) }, { status: 400 });
  const club = await createClub(user.id, parsed.data.name);
  throw await redirectWithNotice(
    request,
    `/clubs/${club.id}`,
    `${club.name} is set up, and you are its race director.`,
  );
}

export default function Clubs({ loaderData, actionData }: Route.ComponentProps) {
  const { clubs } = loaderData;
  const errors = actionData?.errors;
  const busy = useNavigation().state === "submitting";
  return (
    <div className="grid gap-8 lg:grid-cols-[1fr_20rem]">
      <section aria-labelledby="my-clubs">
        <h1 id="my-clubs" className="text-2xl font-semibold">
          Your clubs
        </h1>
        {clubs.length === 0 ? (
          <p className="mt-4 max-w-prose text-ink-700">
            You do not belong to a club yet. Create one for your track, or open the invitation e-mail a race
            director sent you.
          </p>
        ) : (
          <ul className="mt-4 divide-y divide-sand-200 rounded-lg border border-sand-200 bg-white">
            {clubs.map((club) => (
              <li key={club.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-3">
                <Link to={`/clubs/${club.id}`} className="font-medium text-pine-700 hover:underline">
                  {club.name}
                </Link>
                <span className="text-sm text-ink-500">
                  {ROLE_LABELS[club.role]} · {club.memberCount}{" "}
                  {club.memberCount === 1 ? "member" : "members"}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="new-club" className="rounded-lg border border-sand-200 bg-white p-4">
        <h2 id="new-club" className="text-lg font-semibold">
          Create a club
        </h2>
        <p className="mt-1 text-sm text-ink-500">You become its race director and can invite the others.</p>
        <Form method="post" className="mt-4 space-y-4" noValidate>
          <Field
            label="Club name"
            name="name"
            required
            maxLength={80}
            errors={errors?.name}
            defaultValue={actionData?.values.name}
            autoComplete="organization"
          />
          <Button type="submit" disabled={busy}>
            Create the club
          </Button>
        </Form>
      </section>
    </div>
  );
}
