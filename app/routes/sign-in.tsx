import { data, Form, Link, redirect } from "react-router";
import type { Route } from "./+types/sign-in";
import { signInWithPassword } from "~/auth/authenticator.server";
import { getUser } from "~/auth/permissions.server";
import { createUserSession, safeRedirect } from "~/auth/session.server";
import { AuthCard } from "~/components/auth/auth-card";
import { DemoAccounts } from "~/components/auth/demo-accounts";
import { Button } from "~/components/ui/button";
import { Field, FormMessage, type FieldErrors } from "~/components/ui/form";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { config } from "~/lib/config.server";

export const meta: Route.MetaFunction = () => [{ title: "Sign in · Loftline" }];

// An action's headers reach the answer only through this: the throttle's Retry-After with its 429.
export const headers: Route.HeadersFunction = ({ actionHeaders }) => {
  const retryAfter = actionHeaders.get("Retry-After");
  return retryAfter ? { "Retry-After": retryAfter } : new Headers();
};

export async function loader({ request }: Route.LoaderArgs) {
  const redirectTo = new URL(request.url).searchParams.get("redirectTo") ?? undefined;
  if (await getUser(request)) throw redirect(safeRedirect(redirectTo));
  return {
    redirectTo: redirectTo ? safeRedirect(redirectTo) : undefined,
    demoAccounts: config.showDevTools ? DEMO_ACCOUNTS : [],
  };
}

type ActionData = { errors?: FieldErrors; formError?: string; email: string };

export async function action({ request, context }: Route.ActionArgs) {
  const result = await signInWithPassword(request, context?.clientAddress ?? null);
  switch (result.kind) {
    case "invalid":
      return data<ActionData>({ errors: result.errors, email: result.email }, { status: 400 });
    case "refused":
      return data<ActionData>({ formError: result.message, email: result.email }, { status: 401 });
    case "throttled":
      return data<ActionData>(
        { formError: result.message, email: result.email },
        { status: 429, headers: { "Retry-After": String(result.retryAfterSeconds) } },
      );
    case "ok":
      return createUserSession(
        request,
        result.user.id,
        safeRedirect(result.redirectTo),
        `Signed in as ${result.user.name}.`,
      );
  }
}

export default function SignIn({ loaderData, actionData }: Route.ComponentProps) {
  const { redirectTo, demoAccounts } = loaderData;
  const result = actionData as ActionData | undefined;
  const signUpHref = redirectTo ? `/sign-up?redirectTo=${encodeURIComponent(redirectTo)}` : "/sign-up";
  return (
    <AuthCard
      title="Sign in"
      intro="Sign in to see your club's layouts, jumps and marshal plan."
      aside={
        demoAccounts.length ? <DemoAccounts accounts={demoAccounts} redirectTo={redirectTo} /> : undefined
      }
    >
      <Form method="post" className="space-y-4" noValidate>
        {result?.formError ? <FormMessage>{result.formError}</FormMessage> : null}
        <Field
          label="E-mail address"
          name="email"
          type="email"
          autoComplete="email"
          required
          defaultValue={result?.email}
          errors={result?.errors?.email}
        />
        <Field
          label="Password"
          name="password"
          type="password"
          autoComplete="current-password"
          required
          errors={result?.errors?.password}
        />
        {redirectTo ? <input type="hidden" name="redirectTo" value={redirectTo} /> : null}
        <div className="flex flex-wrap items-center justify-between gap-3 pt-1">
          <Button type="submit">Sign in</Button>
          <Link to="/forgot-password" className="text-sm text-pine-700 underline-offset-2 hover:underline">
            Forgot your password?
          </Link>
        </div>
      </Form>
      <p className="mt-6 border-t border-sand-200 pt-4 text-sm text-ink-700">
        New to Loftline?{" "}
        <Link to={signUpHref} className="font-medium text-pine-700 underline-offset-2 hover:underline">
          Create an account
        </Link>
      </p>
    </AuthCard>
  );
}
