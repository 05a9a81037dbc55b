import { data, Form, Link } from "react-router";
import type { Route } from "./+types/reset-password";
import { inspectResetToken, resetPassword, tokenProblem } from "~/auth/password-reset.server";
import { createUserSession } from "~/auth/session.server";
import { AuthCard } from "~/components/auth/auth-card";
import { Button } from "~/components/ui/button";
import { Field, FormMessage, type FieldErrors } from "~/components/ui/form";
import { parseForm } from "~/lib/forms";
import { PASSWORD_MIN_LENGTH, resetPasswordSchema } from "~/lib/schemas/auth";

export const meta: Route.MetaFunction = () => [{ title: "Choose a new password · Loftline" }];

// The token is in the address: keep it out of the Referer sent to any other site.
export const headers: Route.HeadersFunction = () => ({ "Referrer-Policy": "no-referrer" });

type PageData = { problem: string | null; errors?: FieldErrors };

export async function loader({ params }: Route.LoaderArgs) {
  const state = await inspectResetToken(params.token);
  if (state === "valid") return data<PageData>({ problem: null });
  const { status, message } = tokenProblem(state);
  return data<PageData>({ problem: message }, { status });
}

export async function action({ request, params }: Route.ActionArgs) {
  const state = await inspectResetToken(params.token);
  if (state !== "valid") {
    const { status, message } = tokenProblem(state);
    return data<PageData>({ problem: message }, { status });
  }
  const parsed = parseForm(resetPasswordSchema, await request.formData());
  if (!parsed.ok) return data<PageData>({ problem: null, errors: parsed.errors }, { status: 400 });
  const result = await resetPassword(params.token, parsed.data.password);
  if (!result.ok) {
    const { status, message } = tokenProblem(result.reason);
    return data<PageData>({ problem: message }, { status });
  }
  return createUserSession(
    request,
    result.userId,
    "/clubs",
    "Your password is changed and you are signed in.",
  );
}

export default function ResetPassword({ loaderData, actionData }: Route.ComponentProps) {
  const page = (actionData ?? loaderData) as PageData;
  if (page.problem) {
    return (
      <AuthCard title="This link cannot be used">
        <FormMessage>{page.problem}</FormMessage>
        <p className="mt-6 text-sm">
          <Link
            to="/forgot-password"
            className="font-medium text-pine-700 underline-offset-2 hover:underline"
          >
            Ask for a new link
          </Link>
        </p>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Choose a new password" intro="After this you will be signed in with the new password.">
      <Form method="post" className="space-y-4" noValidate>
        <Field
          label="New password"
          name="password"
          type="password"
          autoComplete="new-password"
          required
          minLength={PASSWORD_MIN_LENGTH}
          errors={page.errors?.password}
          hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        />
        <Field
          label="New password again"
          name="confirm"
          type="password"
          autoComplete="new-password"
          required
          errors={page.errors?.confirm}
        />
        <Button type="submit">Save the new password</Button>
      </Form>
    </AuthCard>
  );
}
