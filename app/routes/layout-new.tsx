import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/layout-new";
import { requireClubRole } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { LayoutMetaFields } from "~/components/layout-meta";
import { Button } from "~/components/ui/button";
import { createLayout } from "~/layouts/layouts.server";
import { formValues } from "~/clubs/form-values.server";
import { parseForm } from "~/lib/forms";
import { createLayoutSchema, LIST_FIELDS } from "~/lib/schemas/layouts";
import { loadClubCarClasses } from "~/clubs/car-classes.server";

export const meta: Route.MetaFunction = () => [{ title: "New layout · Loftline" }];

export async function loader({ request, params }: Route.LoaderArgs) {
  const { club } = await requireClubRole(request, params.clubId, "director");
  return { club, carClasses: await loadClubCarClasses(club.id) };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { club, user } = await requireClubRole(request, params.clubId, "director");
  const formData = await request.formData();
  const parsed = parseForm(createLayoutSchema, formData, LIST_FIELDS);
  if (!parsed.ok) {
    const values = { ...formValues(formData), carClasses: formData.getAll("carClasses").map(String) };
    return data({ errors: parsed.errors, values }, { status: 400 });
  }
  const layout = await createLayout(club.id, user.id, parsed.data);
  throw await redirectWithNotice(
    request,
    `/layouts/${layout.id}`,
    `${parsed.data.name} is saved as a draft.`,
  );
}

export default function LayoutNew({ loaderData, actionData }: Route.ComponentProps) {
  const errors = actionData?.errors;
  const busy = useNavigation().state === "submitting";
  return (
    <section aria-labelledby="new-layout" className="max-w-md">
      <h2 id="new-layout" className="text-lg font-semibold">
        New layout
      </h2>
      <p className="mt-1 text-sm text-ink-500">
        It starts as a draft that only the club's race directors see. You draw the track afterwards. The car
        classes start as the club's default classes (club settings).
      </p>
      <Form method="post" className="mt-4 space-y-4" noValidate>
        <LayoutMetaFields
          errors={errors}
          values={actionData?.values ?? { carClasses: loaderData.carClasses }}
        />
        <div className="flex items-center gap-3">
          <Button type="submit" disabled={busy}>
            Create the layout
          </Button>
          <Link to={`/clubs/${loaderData.club.id}`} className="text-sm text-pine-700 hover:underline">
            Cancel
          </Link>
        </div>
      </Form>
    </section>
  );
}
