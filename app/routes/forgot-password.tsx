import { data, Form, Link } from "react-router";
import type { Route } from "./+types/forgot-password";
import { requestPasswordReset } from "~/auth/password-reset.server";
import { AuthCard } from "~/components/auth/auth-card";
import { Button } from "~/components/ui/button";
import { Field, FormMessage, type FieldErrors } from "~/components/ui/form";
import { config } from "~/lib/config.server";
import { parseForm } from "~/lib/forms";
import { forgotPasswordSchema } from "~/lib/schemas/auth";

export const meta: Route.MetaFunction = () => [{ title: "Reset your password · Loftline" }];

export async function loader() {
  return { showDevTools: config.showDevTools };
}

type ActionData = { errors?: FieldErrors; email: string; sent: boolean };

export async function action({ request }: Route.ActionArgs) {
  const form = await request.formData();
  const parsed = parseForm(forgotPasswordSchema, form);
  if (!parsed.ok) {
    return data<ActionData>(
      { errors: parsed.errors, email: String(form.get("email") ?? "").slice(0, 254), sent: false },
      { status: 400 },
    );
  }
  // Not awaited: the answer must come as fast for an address without an account as for one with
  // (sending takes a while), and it is the same answer either way.
  requestPasswordReset(parsed.data.email).catch((err: Error) => {
    console.error("[loftline] password reset e-mail failed:", err.message);
  });
  return data<ActionData>({ email: parsed.data.email, sent: true });
}

export default function ForgotPassword({ loaderData, actionData }: Route.ComponentProps) {
  const result = actionData as ActionData | undefined;
  if (result?.sent) {
    return (
      <AuthCard title="Check your e-mail">
        <FormMessage tone="ok">
          If an account uses <strong>{result.email}</strong>, we have sent it a link to choose a new password.
        </FormMessage>
        <p className="mt-4 text-sm text-ink-700">
          The link works once, for one hour. If nothing arrives within a few minutes, look in the spam folder,
          check the address, or ask again.
        </p>
        {loaderData.showDevTools ? (
          <p className="mt-4 text-sm text-ink-500">
            In development the message lands in the{" "}
            <Link to="/outbox" className="text-pine-700 underline">
              outbox
            </Link>
            .
          </p>
        ) : null}
        <p className="mt-6 border-t border-sand-200 pt-4 text-sm">
          <Link to="/sign-in" className="font-medium text-pine-700 underline-offset-2 hover:underline">
            Back to sign in
          </Link>
        </p>
      </AuthCard>
    );
  }
  return (
    <AuthCard
      title="Reset your password"
      intro="Type the e-mail address of your account. We will send a link to choose a new password."
    >
      <Form method="post" className="space-y-4" noValidate>
        <Field
          label="E-mail address"
          name="email"
          type="email"
          autoComplete="email"
          required
          defaultValue={result?.email}
          errors={result?.errors?.email}
        />
        <Button type="submit">Send the link</Button>
      </Form>
      <p className="mt-6 border-t border-sand-200 pt-4 text-sm text-ink-700">
        Remembered it?{" "}
        <Link to="/sign-in" className="font-medium text-pine-700 underline-offset-2 hover:underline">
          Sign in
        </Link>
      </p>
    </AuthCard>
  );
}
