import { Link } from "react-router";
import { dayText, raceDateText } from "~/lib/race-date";

type PublicationView = {
  id: string;
  versionNumber: number;
  raceDate: string | null;
  note: string;
  publishedAt: Date | string;
  withdrawnAt: Date | string | null;
  withdrawnReason: string | null;
};

export type VersionBannerReading = {
  kind: "draft" | "published" | "saved";
  number: number | null;
  publication: PublicationView | null;
  current: PublicationView | null;
  publications: PublicationView[];
};

const linkClass = "text-pine-700 hover:underline";

/**
 * Which version of the layout the page shows: the race-day version, an earlier published one (with
 * its withdrawal, if any), a saved version, or the directors' working draft; with the list of
 * published versions, each at its own address, and the way to compare them.
 */
export function VersionBanner({
  layoutId,
  reading: r,
  isDirector,
}: {
  layoutId: string;
  reading: VersionBannerReading;
  isDirector: boolean;
}) {
  const at = (n: number) => `/layouts/${layoutId}?version=${n}`;
  const p = r.publication;
  const isCurrent = p !== null && r.current !== null && p.id === r.current.id;
  return (
    <section
      aria-label="Version shown"
      className="space-y-2 rounded-lg border border-sand-200 bg-white p-4 text-sm"
      data-testid="version-banner"
    >
      {r.kind === "draft" ? (
        <p>
          <strong>Working draft</strong>
          {r.number !== null ? ` (saved version ${r.number})` : " (nothing saved yet)"}: only race directors
          see it.{" "}
          {r.current ? (
            <>
              Marshals and drivers see{" "}
              <Link to={at(r.current.versionNumber)} className={linkClass}>
                version {r.current.versionNumber}
              </Link>
              , for race day {raceDateText(r.current.raceDate)}.
            </>
          ) : (
            "Nothing is published: marshals and drivers see no version of this layout."
          )}
        </p>
      ) : p ? (
        <p>
          <strong>
            {isCurrent ? "Race-day version" : "Published version"} {p.versionNumber}
          </strong>{" "}
          · race day {raceDateText(p.raceDate)} · published {dayText(p.publishedAt)}
          {!isCurrent && r.current ? (
            <>
              {" "}
              · the race-day version is now{" "}
              <Link to={at(r.current.versionNumber)} className={linkClass}>
                version {r.current.versionNumber}
              </Link>
            </>
          ) : null}
        </p>
      ) : (
        <p>
          <strong>Saved version {r.number}</strong>, not published: only race directors see it.
        </p>
      )}
      {p?.note ? <p className="whitespace-pre-line text-ink-700">{p.note}</p> : null}
      {p?.withdrawnAt ? (
        <p role="alert" className="rounded-md bg-danger-100 px-3 py-2 text-danger-700">
          Withdrawn on {dayText(p.withdrawnAt)}: {p.withdrawnReason}
        </p>
      ) : null}
      <nav aria-label="Versions" className="flex flex-wrap gap-x-4 gap-y-1">
        {isDirector && r.kind !== "draft" ? (
          <Link to={`/layouts/${layoutId}`} className={linkClass}>
            Back to the working draft
          </Link>
        ) : null}
        {r.publications.length > 1 || (isDirector && r.publications.length > 0) ? (
          <Link to={`/layouts/${layoutId}/compare`} className={linkClass}>
            Compare versions
          </Link>
        ) : null}
        {r.current ? (
          <Link to={`/layouts/${layoutId}/calibrate`} className={linkClass}>
            Calibrate a car from your laps
          </Link>
        ) : null}
        {isDirector ? (
          <Link to={`/layouts/${layoutId}/publishing`} className={linkClass}>
            Publishing and sharing
          </Link>
        ) : null}
      </nav>
      {r.publications.length > 1 ? (
        <details>
          <summary className="cursor-pointer text-ink-700">
            Published versions ({r.publications.length})
          </summary>
          <ul className="mt-2 space-y-1">
            {r.publications.map((v) => (
              <li key={v.id}>
                <Link to={at(v.versionNumber)} className={linkClass}>
                  Version {v.versionNumber}
                </Link>{" "}
                · race day {raceDateText(v.raceDate)}
                {v.withdrawnAt ? " · withdrawn" : v.id === r.current?.id ? " · race-day version" : ""}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </section>
  );
}
