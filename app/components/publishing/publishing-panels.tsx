import { Form, Link, useNavigation } from "react-router";
import { Button } from "~/components/ui/button";
import { Field, FieldError, type FieldErrors } from "~/components/ui/form";
import { dayText, raceDateText } from "~/lib/race-date";
import { NOTE_MAX, REASON_MAX } from "~/lib/schemas/publishing";

type Publication = {
  id: string;
  versionNumber: number;
  raceDate: string | null;
  note: string;
  publishedAt: Date | string;
  publishedByName: string | null;
  withdrawnAt: Date | string | null;
  withdrawnReason: string | null;
};

const panel = "rounded-lg border border-sand-200 bg-white p-4";
const linkClass = "text-pine-700 hover:underline";

/** Publish the working draft for race day: date, note, and who gets the e-mail. */
export function PublishForm({
  layout,
  saved,
  current,
  memberCount,
  errors,
  values,
}: {
  layout: { id: string; status: string; version: number };
  saved: { number: number; savedAt: Date | string } | null;
  current: Publication | null;
  memberCount: number;
  errors?: FieldErrors;
  values?: Record<string, string>;
}) {
  const busy = useNavigation().state === "submitting";
  const mine = values?.intent === "publish" ? values : undefined;
  const unchanged = current !== null && saved !== null && current.versionNumber === saved.number;
  return (
    <section aria-labelledby="publish-heading" className={panel}>
      <h2 id="publish-heading" className="text-lg font-semibold">
        Publish the draft for race day
      </h2>
      <p className="mt-1 text-sm text-ink-700">
        {saved
          ? `The working draft is saved version ${saved.number} (${dayText(saved.savedAt)}). `
          : "Nothing is drawn yet: the starter loop would be published. "}
        {current
          ? unchanged
            ? `It is the race-day version already.`
            : `The race-day version is ${current.versionNumber}; `
          : "Nothing is published yet. "}
        {current && !unchanged ? (
          <Link
            to={`/layouts/${layout.id}/compare?from=${current.versionNumber}&to=draft`}
            className={linkClass}
          >
            see what changed since
          </Link>
        ) : null}
      </p>
      {layout.status === "archived" ? (
        <p className="mt-2 text-sm text-ink-700">
          This layout is archived: take it out of the archive first.
        </p>
      ) : (
        <Form key={current?.id ?? "none"} method="post" className="mt-3 space-y-4" noValidate>
          <input type="hidden" name="intent" value="publish" />
          <input type="hidden" name="version" value={layout.version} />
          <FieldError errors={errors?.version} />
          <Field
            label="Race date"
            name="raceDate"
            type="date"
            required
            defaultValue={mine?.raceDate ?? ""}
            errors={mine ? errors?.raceDate : undefined}
          />
          <div className="space-y-1">
            <label htmlFor="publish-note" className="block text-sm font-medium text-ink-700">
              Note for the members (optional)
            </label>
            <textarea
              id="publish-note"
              name="note"
              rows={3}
              maxLength={NOTE_MAX}
              defaultValue={mine?.note ?? ""}
              aria-invalid={mine && errors?.note ? true : undefined}
              aria-describedby={mine && errors?.note ? "publish-note-error" : undefined}
              className="block w-full rounded-md border border-ink-300 bg-white px-3 py-2 text-sm"
            />
            <FieldError id="publish-note-error" errors={mine ? errors?.note : undefined} />
          </div>
          <p className="text-sm text-ink-500">
            Every member of the club ({memberCount}) gets an e-mail with the date, the note and a link.
          </p>
          <Button type="submit" disabled={busy || unchanged}>
            Publish {saved && !unchanged ? `version ${saved.number}` : "the draft"} for race day
          </Button>
        </Form>
      )}
    </section>
  );
}

/** The published versions, each with its address, a share button and a withdraw form. */
export function PublicationsTable({
  layoutId,
  publications,
  errors,
  values,
}: {
  layoutId: string;
  publications: Publication[];
  errors?: FieldErrors;
  values?: Record<string, string>;
}) {
  const busy = useNavigation().state === "submitting";
  const current = publications.find((p) => p.withdrawnAt === null);
  return (
    <section aria-labelledby="published-heading" className={panel}>
      <h2 id="published-heading" className="text-lg font-semibold">
        Published versions ({publications.length})
      </h2>
      {publications.length === 0 ? (
        <p className="mt-2 text-sm text-ink-700">None yet.</p>
      ) : (
        <ul className="mt-3 divide-y divide-sand-200">
          {publications.map((p) => {
            const withdrawing = values?.intent === "withdraw" && values.publication === p.id;
            return (
              <li
                key={p.id}
                className="space-y-2 py-3 text-sm"
                data-testid={`publication-${p.versionNumber}`}
              >
                <p>
                  <Link
                    to={`/layouts/${layoutId}?version=${p.versionNumber}`}
                    className={`font-medium ${linkClass}`}
                  >
                    Version {p.versionNumber}
                  </Link>{" "}
                  · race day {raceDateText(p.raceDate)} · published {dayText(p.publishedAt)}
                  {p.publishedByName ? ` by ${p.publishedByName}` : ""} ·{" "}
                  <strong>
                    {p.withdrawnAt
                      ? "withdrawn"
                      : p.id === current?.id
                        ? "race-day version"
                        : "earlier version"}
                  </strong>
                </p>
                {p.note ? <p className="whitespace-pre-line text-ink-700">{p.note}</p> : null}
                {p.withdrawnAt ? (
                  <p className="text-ink-700">
                    Withdrawn {dayText(p.withdrawnAt)}: {p.withdrawnReason}
                  </p>
                ) : (
                  <div className="flex flex-wrap items-start gap-4">
                    <Form method="post">
                      <input type="hidden" name="intent" value="share" />
                      <input type="hidden" name="publication" value={p.id} />
                      <Button type="submit" variant="secondary" disabled={busy}>
                        Create a share link
                      </Button>
                    </Form>
                    <Form method="post" className="flex flex-wrap items-end gap-2" noValidate>
                      <input type="hidden" name="intent" value="withdraw" />
                      <input type="hidden" name="publication" value={p.id} />
                      <Field
                        id={`reason-${p.id}`}
                        label={`Reason to withdraw version ${p.versionNumber}`}
                        name="reason"
                        maxLength={REASON_MAX}
                        defaultValue={withdrawing ? values?.reason : ""}
                        errors={withdrawing ? errors?.reason : undefined}
                      />
                      <Button type="submit" variant="danger" disabled={busy}>
                        Withdraw
                      </Button>
                    </Form>
                  </div>
                )}
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
