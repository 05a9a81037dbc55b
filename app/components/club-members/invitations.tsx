import { Form } from "react-router";
import { Button } from "~/components/ui/button";
import { Field, FieldError, SelectField, type FieldErrors } from "~/components/ui/form";
import { ROLES, type Role, ROLE_LABELS } from "~/lib/roles";

export type InvitationView = {
  id: string;
  email: string;
  role: Role;
  invitedByName: string | null;
  expiresAt: Date | string;
  expired: boolean;
};

const day = new Intl.DateTimeFormat("en-GB", {
  day: "numeric",
  month: "short",
  year: "numeric",
  timeZone: "UTC",
});

/** Invite by e-mail with a role; the e-mail's link signs the person up or lets them join. */
export function InviteForm({ errors, values }: { errors?: FieldErrors; values?: Record<string, string> }) {
  return (
    <section
      aria-labelledby="invite-heading"
      className="max-w-xl rounded-lg border border-sand-200 bg-white p-4"
    >
      <h2 id="invite-heading" className="text-lg font-semibold">
        Invite someone
      </h2>
      <p className="mt-1 text-sm text-ink-500">
        They get an e-mail with a link that works for 7 days. Marshals and drivers see published layouts; race
        directors can change everything, members included.
      </p>
      <Form method="post" className="mt-4 grid gap-4 sm:grid-cols-[1fr_12rem]" noValidate>
        <Field
          label="E-mail address"
          id="invite-email"
          name="email"
          type="email"
          autoComplete="off"
          required
          defaultValue={values?.email}
          errors={errors?.email}
        />
        <SelectField
          label="Role"
          id="invite-role"
          name="role"
          defaultValue={values?.role ?? "driver"}
          errors={errors?.role}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </SelectField>
        <div className="sm:col-span-2">
          <FieldError errors={errors?.form} />
          <Button type="submit" name="intent" value="invite">
            Send the invitation
          </Button>
        </div>
      </Form>
    </section>
  );
}

type ListProps = {
  invitations: InvitationView[];
  rowError?: { invitationId: string; errors?: FieldErrors };
};

/** Invitations not yet accepted, each with "Send again" (new link, new 7 days) and "Withdraw". */
export function PendingInvitations({ invitations, rowError }: ListProps) {
  return (
    <section aria-labelledby="pending-heading">
      <h2 id="pending-heading" className="text-lg font-semibold">
        Invitations waiting
      </h2>
      {invitations.length === 0 ? (
        <p className="mt-2 text-sm text-ink-700">None: everyone invited has joined.</p>
      ) : (
        <ul className="mt-3 divide-y divide-sand-200 rounded-lg border border-sand-200 bg-white">
          {invitations.map((inv) => {
            const errors = rowError?.invitationId === inv.id ? rowError.errors : undefined;
            return (
              <li
                key={inv.id}
                className="flex flex-wrap items-center justify-between gap-3 px-4 py-3 text-sm"
              >
                <div>
                  <p className="font-medium">{inv.email}</p>
                  <p className="text-ink-500">
                    {ROLE_LABELS[inv.role]}
                    {inv.invitedByName ? ` · invited by ${inv.invitedByName}` : ""} ·{" "}
                    {inv.expired ? (
                      <strong className="font-medium text-danger-700">
                        expired {day.format(new Date(inv.expiresAt))}
                      </strong>
                    ) : (
                      `link works until ${day.format(new Date(inv.expiresAt))}`
                    )}
                  </p>
                  <FieldError
                    errors={errors ? [...(errors.invitationId ?? []), ...(errors.form ?? [])] : undefined}
                  />
                </div>
                <Form method="post" className="flex gap-2">
                  <input type="hidden" name="invitationId" value={inv.id} />
                  <Button type="submit" name="intent" value="resend" variant="secondary">
                    Send again
                  </Button>
                  <Button type="submit" name="intent" value="revoke" variant="secondary">
                    Withdraw
                  </Button>
                </Form>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
