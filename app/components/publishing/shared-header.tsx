import { raceDateText } from "~/lib/race-date";

/** The top of a share link's page: the layout, its club, the race date and the director's note. */
export function SharedHeader({
  layoutName,
  clubName,
  publication,
}: {
  layoutName: string;
  clubName: string;
  publication: { versionNumber: number; raceDate: string | null; note: string };
}) {
  return (
    <header className="space-y-2">
      <p className="text-sm text-ink-500">{clubName} · shared read-only</p>
      <h1 className="text-2xl font-semibold">{layoutName}</h1>
      <p className="text-sm text-ink-700">
        Version {publication.versionNumber}, published for race day {raceDateText(publication.raceDate)}. The
        numbers are model estimates, not measurements and not a safety certification.
      </p>
      {publication.note ? (
        <p className="whitespace-pre-line text-sm text-ink-700">{publication.note}</p>
      ) : null}
    </header>
  );
}
