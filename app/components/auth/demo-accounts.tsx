import { Form } from "react-router";
import type { DemoAccount } from "~/db/demo-accounts";
import { ROLE_LABELS } from "~/lib/roles";

/**
 * The demo accounts with their passwords and a one-press sign-in for each. Shown only in
 * development and the demo (the loader sends the list only then).
 */
export function DemoAccounts({
  accounts,
  redirectTo,
}: {
  accounts: readonly DemoAccount[];
  redirectTo?: string;
}) {
  return (
    <section aria-labelledby="demo-accounts-title" className="rounded-xl border border-clay-100 bg-white p-5">
      <h2 id="demo-accounts-title" className="text-base font-semibold">
        Demo accounts
      </h2>
      <p className="mt-1 text-sm text-ink-500">
        For trying Loftline with the invented Kestrel Valley club. Shown in development and the demo only.
      </p>
      <ul className="mt-4 divide-y divide-sand-200">
        {accounts.map((a) => (
          <li key={a.email} className="flex flex-wrap items-center justify-between gap-3 py-3">
            <div className="min-w-0 text-sm">
              <p className="font-medium">
                {a.name} <span className="font-normal text-ink-500">· {ROLE_LABELS[a.role]}</span>
              </p>
              <p className="break-all text-ink-700">
                <span className="sr-only">E-mail address: </span>
                {a.email}
              </p>
              <p className="text-ink-500">
                Password: <code className="rounded bg-sand-100 px-1">{a.password}</code>
              </p>
            </div>
            <Form method="post" action="/sign-in">
              <input type="hidden" name="email" value={a.email} />
              <input type="hidden" name="password" value={a.password} />
              {redirectTo ? <input type="hidden" name="redirectTo" value={redirectTo} /> : null}
              <button
                type="submit"
                className="rounded-md border border-pine-700 px-3 py-1.5 text-sm font-medium text-pine-700 hover:bg-pine-50"
              >
                Sign in as {a.name.split(" ")[0]}
              </button>
            </Form>
          </li>
        ))}
      </ul>
    </section>
  );
}
