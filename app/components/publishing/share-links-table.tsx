import { Form, useNavigation } from "react-router";
import { Button } from "~/components/ui/button";
import { dayText } from "~/lib/race-date";

type ShareLinkRow = {
  id: string;
  versionNumber: number;
  createdAt: Date | string;
  createdByName: string | null;
  revokedAt: Date | string | null;
  live: boolean;
};

/** The share links: which version, made when and by whom, and whether they still open. */
export function ShareLinksTable({ links }: { links: ShareLinkRow[] }) {
  const busy = useNavigation().state === "submitting";
  return (
    <section aria-labelledby="links-heading" className="rounded-lg border border-sand-200 bg-white p-4">
      <h2 id="links-heading" className="text-lg font-semibold">
        Share links ({links.length})
      </h2>
      <p className="mt-1 text-sm text-ink-700">
        A share link opens one published version read-only, signed out. Its address is shown once, when it is
        made; revoke a link that went further than it should.
      </p>
      {links.length ? (
        <ul className="mt-3 divide-y divide-sand-200 text-sm">
          {links.map((l) => (
            <li key={l.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span>
                Version {l.versionNumber} · made {dayText(l.createdAt)}
                {l.createdByName ? ` by ${l.createdByName}` : ""} ·{" "}
                <strong>{l.live ? "opens" : l.revokedAt ? "revoked" : "stopped: version withdrawn"}</strong>
              </span>
              {l.live ? (
                <Form method="post">
                  <input type="hidden" name="intent" value="revoke-share" />
                  <input type="hidden" name="link" value={l.id} />
                  <Button type="submit" variant="secondary" disabled={busy}>
                    Revoke
                  </Button>
                </Form>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
