import { data, Form, Link, redirect } from "react-router";
import type { Route } from "./+types/sign-up";
import { getUser } from "~/auth/permissions.server";
import { createUserSession, safeRedirect } from "~/auth/session.server";
import { createUser } from "~/auth/users.server";
import { AuthCard } from "~/components/auth/auth-card";
import { Button } from "~/components/ui/button";
import { Field, type FieldErrors } from "~/components/ui/form";
import { parseForm } from "~/lib/forms";
import { NAME_MAX_LENGTH, PASSWORD_MIN_LENGTH, signUpSchema } from "~/lib/schemas/auth";

export const meta: Route.MetaFunction = () => [{ title: "Create an account · Loftline" }];

/** Shown beside the e-mail field when the address is taken (see docs/decisions/0303). */
export const EMAIL_TAKEN_MESSAGE =
  "This e-mail address cannot be used for a new account. If it is yours, sign in or reset your password.";

export async function loader({ request }: Route.LoaderArgs) {
  const params = new URL(request.url).searchParams;
  const redirectTo = params.get("redirectTo") ?? undefined;
  if (await getUser(request)) throw redirect(safeRedirect(redirectTo));
  return {
    redirectTo: redirectTo ? safeRedirect(redirectTo) : undefined,
    // An invitation link passes the invited address so it need not be typed.
    email: (params.get("email") ?? "").slice(0, 254),
  };
}

type ActionData = { errors: FieldErrors; values: { name: string; email: string } };

export async function action({ request }: Route.ActionArgs) {
  const form = await request.formData();
  const values = {
    name: String(form.get("name") ?? "").slice(0, 200),
    email: String(form.get("email") ?? "").slice(0, 254),
  };
  const parsed = parseForm(signUpSchema, form);
  if (!parsed.ok) return data<ActionData>({ errors: parsed.errors, values }, { status: 400 });
  const { name, email, password, redirectTo } = parsed.data;
  const user = await createUser({ name, email, password });
  if (!user) return data<ActionData>({ errors: { email: [EMAIL_TAKEN_MESSAGE] }, values }, { status: 400 });
  return createUserSession(
    request,
    user.id,
    safeRedirect(redirectTo),
    `Welcome to Loftline, ${user.name}. Your account is ready.`,
  );
}

export default function SignUp({ loaderData, actionData }: Route.ComponentProps) {
  const { redirectTo, email } = loaderData;
  const result = actionData as ActionData | undefined;
  const signInHref = redirectTo ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}` : "/sign-in";
  return (
    <AuthCard
      title="Create your account"
      intro="One account for every club you race with. A race director can then invite you, or you can start a club of your own."
    >
      <Form method="post" className="space-y-4" noValidate>
        <Field
          label="Your name"
          name="name"
          autoComplete="name"
          required
          maxLength={NAME_MAX_LENGTH}
          defaultValue={result?.values.name}
          errors={result?.errors.name}
          hint="Shown to the other members of your clubs."
        />
        <Field
          label="E-mail address"
          name="email"
          type="email"
          autoComplete="email"
          required
          defaultValue={result?.values.email ?? email}
          errors={result?.errors.email}
        />
        <Field
          label="Password"
          name="password"
          type="password"
          autoComplete="new-password"
          required
          minLength={PASSWORD_MIN_LENGTH}
          errors={result?.errors.password}
          hint={`At least ${PASSWORD_MIN_LENGTH} characters. A few words strung together work well.`}
        />
        <Field
          label="Password again"
          name="confirm"
          type="password"
          autoComplete="new-password"
          required
          errors={result?.errors.confirm}
        />
        {redirectTo ? <input type="hidden" name="redirectTo" value={redirectTo} /> : null}
        <Button type="submit" className="w-full sm:w-auto">
          Create account
        </Button>
      </Form>
      <p className="mt-6 border-t border-sand-200 pt-4 text-sm text-ink-700">
        Already have an account?{" "}
        <Link to={signInHref} className="font-medium text-pine-700 underline-offset-2 hover:underline">
          Sign in
        </Link>
      </p>
    </AuthCard>
  );
}
