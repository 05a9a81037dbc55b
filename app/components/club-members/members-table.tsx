import { Form, Link } from "react-router";
import { Button, buttonClass } from "~/components/ui/button";
import { Field, FieldError, SelectField, type FieldErrors } from "~/components/ui/form";
import { ROLES, type Role, ROLE_LABELS } from "~/lib/roles";
import type { MemberQuery, MemberSort } from "~/lib/schemas/clubs";

export type MemberView = {
  id: string;
  userId: string;
  name: string;
  email: string | null;
  role: Role;
  joinedAt: Date | string;
};

const joined = new Intl.DateTimeFormat("en-GB", {
  day: "numeric",
  month: "short",
  year: "numeric",
  timeZone: "UTC",
});

/** The query string for the table with some parameters changed; defaults are left out. */
export function memberQueryString(query: MemberQuery, change: Partial<MemberQuery> = {}): string {
  const next = { ...query, ...change };
  const params = new URLSearchParams();
  if (next.q) params.set("q", next.q);
  if (next.role !== "all") params.set("role", next.role);
  if (next.sort !== "name") params.set("sort", next.sort);
  if (next.dir !== "asc") params.set("dir", next.dir);
  const s = params.toString();
  return s ? `?${s}` : "?";
}

/** The search and role filter: a GET form, so it works without JavaScript and the URL can be shared. */
export function MemberFilters({
  query,
  errors,
  withEmail,
}: {
  query: MemberQuery;
  errors: FieldErrors;
  withEmail: boolean;
}) {
  return (
    <Form
      method="get"
      className="mt-3 flex flex-wrap items-end gap-3"
      role="search"
      aria-label="Filter members"
    >
      <div className="w-full sm:w-64">
        <Field
          label={withEmail ? "Search by name or e-mail" : "Search by name"}
          id="filter-q"
          name="q"
          type="search"
          defaultValue={query.q}
          errors={errors.q}
        />
      </div>
      <div className="w-44">
        <SelectField label="Role" id="filter-role" name="role" defaultValue={query.role} errors={errors.role}>
          <option value="all">All roles</option>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </SelectField>
      </div>
      {query.sort !== "name" ? <input type="hidden" name="sort" value={query.sort} /> : null}
      {query.dir !== "asc" ? <input type="hidden" name="dir" value={query.dir} /> : null}
      <Button type="submit" variant="secondary">
        Filter
      </Button>
      {query.q || query.role !== "all" ? (
        <Link
          to={memberQueryString(query, { q: "", role: "all" })}
          className="py-2 text-sm text-pine-700 hover:underline"
        >
          Show everyone
        </Link>
      ) : null}
      <FieldError errors={[...(errors.sort ?? []), ...(errors.dir ?? [])]} />
    </Form>
  );
}

function SortHeader({ label, sort, query }: { label: string; sort: MemberSort; query: MemberQuery }) {
  const active = query.sort === sort;
  const nextDir = active && query.dir === "asc" ? "desc" : "asc";
  const ariaSort = active ? (query.dir === "asc" ? "ascending" : "descending") : "none";
  return (
    <th scope="col" aria-sort={ariaSort} className="px-3 py-2 text-left font-medium">
      <Link
        to={memberQueryString(query, { sort, dir: nextDir })}
        className="inline-flex items-center gap-1 hover:underline"
      >
        {label}
        <span aria-hidden="true" className="text-ink-500">
          {active ? (query.dir === "asc" ? "▲" : "▼") : "↕"}
        </span>
        <span className="sr-only">{active ? `, sorted ${ariaSort}` : ", sort"}</span>
      </Link>
    </th>
  );
}

type TableProps = {
  clubId: string;
  members: MemberView[];
  query: MemberQuery;
  isDirector: boolean;
  me: string;
  rowError?: { memberId: string; errors?: FieldErrors };
};

/** The members table; directors get a role select and a remove button in each row. */
export function MembersTable({ members, query, isDirector, me, rowError }: TableProps) {
  if (members.length === 0) {
    return <p className="mt-4 text-ink-700">Nobody matches this filter.</p>;
  }
  return (
    <div className="mt-4 overflow-x-auto rounded-lg border border-sand-200 bg-white">
      <table className="min-w-full text-sm">
        <caption className="sr-only">Members of the club</caption>
        <thead className="bg-sand-100 text-ink-700">
          <tr>
            <SortHeader label="Name" sort="name" query={query} />
            {isDirector ? <SortHeader label="E-mail" sort="email" query={query} /> : null}
            <SortHeader label="Role" sort="role" query={query} />
            <SortHeader label="Joined" sort="joined" query={query} />
            {isDirector ? (
              <th scope="col" className="px-3 py-2 text-left font-medium">
                Change
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody className="divide-y divide-sand-200">
          {members.map((m) => {
            const errors = rowError?.memberId === m.id ? rowError.errors : undefined;
            return (
              <tr key={m.id} className="align-top">
                <td className="px-3 py-2 font-medium">
                  {m.name}
                  {m.userId === me ? <span className="ml-1 font-normal text-ink-500">(you)</span> : null}
                </td>
                {isDirector ? <td className="px-3 py-2 text-ink-700">{m.email}</td> : null}
                <td className="px-3 py-2">{ROLE_LABELS[m.role]}</td>
                <td className="px-3 py-2 whitespace-nowrap text-ink-700">
                  {joined.format(new Date(m.joinedAt))}
                </td>
                {isDirector ? (
                  <td className="px-3 py-2">
                    <RowActions member={m} isMe={m.userId === me} />
                    <FieldError
                      errors={
                        errors
                          ? [...(errors.role ?? []), ...(errors.memberId ?? []), ...(errors.form ?? [])]
                          : undefined
                      }
                    />
                  </td>
                ) : null}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

function RowActions({ member, isMe }: { member: MemberView; isMe: boolean }) {
  const selectId = `role-${member.id}`;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <Form method="post" className="flex items-center gap-1">
        <input type="hidden" name="memberId" value={member.id} />
        <label htmlFor={selectId} className="sr-only">
          Role of {member.name}
        </label>
        <select
          id={selectId}
          name="role"
          defaultValue={member.role}
          className="rounded-md border border-ink-300 bg-white px-2 py-1 text-sm"
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
        <button type="submit" name="intent" value="change-role" className={buttonClass("secondary")}>
          Set role
        </button>
      </Form>
      <details>
        <summary className="cursor-pointer text-sm text-danger-700">
          {isMe ? "Leave the club" : "Remove"}
        </summary>
        <Form method="post" className="mt-2 space-y-2">
          <input type="hidden" name="memberId" value={member.id} />
          <p className="text-xs text-ink-700">
            {isMe ? "You will lose access to this club." : `${member.name} will lose access to this club.`}
          </p>
          <Button type="submit" name="intent" value="remove" variant="danger">
            {isMe ? "Leave" : `Remove ${member.name}`}
          </Button>
        </Form>
      </details>
    </div>
  );
}
