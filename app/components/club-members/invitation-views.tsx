import type { ReactNode } from "react";
import { Form, Link } from "react-router";
import { Button } from "~/components/ui/button";
import { Field, FormMessage, type FieldErrors } from "~/components/ui/form";
import { type Role, ROLE_LABELS } from "~/lib/roles";

type Shown = { email: string; role: Role; club: { id: string; name: string }; inviterName: string | null };

function roleWithArticle(role: Role): string {
  const word = ROLE_LABELS[role].toLowerCase();
  return `${/^[aeiou]/.test(word) ? "an" : "a"} ${word}`;
}

/** The invitation's facts (club, role, who invited, to which address) around the next step. */
export function InvitationCard({
  invitation,
  formError,
  children,
}: {
  invitation: Shown;
  formError?: string;
  children: ReactNode;
}) {
  return (
    <section
      aria-labelledby="invitation-heading"
      className="mx-auto max-w-md rounded-lg border border-sand-200 bg-white p-6"
    >
      <p className="text-sm text-ink-500">Invitation</p>
      <h1 id="invitation-heading" className="mt-1 text-2xl font-semibold">
        Join {invitation.club.name}
      </h1>
      <p className="mt-3 text-ink-700">
        {invitation.inviterName ?? "A race director"} invited{" "}
        <strong className="font-medium">{invitation.email}</strong> to join as{" "}
        {roleWithArticle(invitation.role)}.
      </p>
      <div className="mt-5 space-y-4">
        <FormMessage>{formError}</FormMessage>
        {children}
      </div>
    </section>
  );
}

export function JoinForm({ busy, clubName }: { busy: boolean; clubName: string }) {
  return (
    <Form method="post">
      <Button type="submit" name="intent" value="join" disabled={busy}>
        Join {clubName}
      </Button>
    </Form>
  );
}

type SignUpProps = {
  email: string;
  errors?: FieldErrors;
  values?: Record<string, string>;
  busy: boolean;
  signInHref: string;
};

/** A signed-out visitor creates the account right here; the address is the invited one and cannot change. */
export function SignUpToJoin({ email, errors, values, busy, signInHref }: SignUpProps) {
  return (
    <div className="space-y-4">
      <p className="text-sm text-ink-700">
        Already have a Loftline account for this address?{" "}
        <Link to={signInHref} className="text-pine-700 underline">
          Sign in to join
        </Link>
        . Otherwise create one:
      </p>
      <Form method="post" className="space-y-4" noValidate>
        <Field
          label="E-mail address"
          name="email-shown"
          value={email}
          readOnly
          disabled
          hint="The address the invitation was sent to."
        />
        <Field
          label="Your name"
          name="name"
          autoComplete="name"
          required
          defaultValue={values?.name}
          errors={errors?.name}
        />
        <Field
          label="Password"
          name="password"
          type="password"
          autoComplete="new-password"
          required
          errors={errors?.password}
          hint="At least 10 characters."
        />
        <Field
          label="Password again"
          name="confirm"
          type="password"
          autoComplete="new-password"
          required
          errors={errors?.confirm}
        />
        <Button type="submit" name="intent" value="sign-up" disabled={busy}>
          Create my account and join
        </Button>
      </Form>
    </div>
  );
}

/** A link that no longer works: say why and what to do. */
export function InvitationProblem({ message }: { message: string }) {
  return (
    <section className="mx-auto max-w-md rounded-lg border border-sand-200 bg-white p-6">
      <h1 className="text-2xl font-semibold">This invitation cannot be used</h1>
      <p role="alert" className="mt-3 text-ink-700">
        {message}
      </p>
      <p className="mt-4 text-sm">
        <Link to="/clubs" className="text-pine-700 underline">
          Go to your clubs
        </Link>
      </p>
    </section>
  );
}
