import { Link } from "react-router";
import { RiskSheetLink } from "~/components/risk/risk-sheet-link";
import type { Route } from "./+types/club-home";
import { requireClubRole } from "~/auth/permissions.server";
import { ImportForm } from "~/components/analysis/import-form";
import { StatusBadge, surfaceLabel } from "~/components/layout-meta";
import { buttonClass } from "~/components/ui/button";
import { listClubLayouts } from "~/layouts/layouts.server";
import { raceDayVersions } from "~/layouts/publications.server";
import { raceDateText } from "~/lib/race-date";

export const meta: Route.MetaFunction = () => [{ title: "Layouts · Loftline" }];

/** The club's layouts: directors see every one with its status, marshals and drivers the published ones. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { club, role } = await requireClubRole(request, params.clubId);
  const [layouts, raceDay] = await Promise.all([listClubLayouts(club.id, role), raceDayVersions(club.id)]);
  return { club, isDirector: role === "director", layouts, raceDay };
}

export default function ClubHome({ loaderData }: Route.ComponentProps) {
  const { club, isDirector, layouts, raceDay } = loaderData;
  return (
    <section aria-labelledby="layouts-heading">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="layouts-heading" className="text-lg font-semibold">
          {isDirector ? "Layouts" : "Published layouts"}
        </h2>
        {isDirector ? (
          <div className="flex flex-wrap items-center gap-3">
            <Link to={`/clubs/${club.id}/settings`} className="text-sm text-pine-700 hover:underline">
              Settings: classes and guidance
            </Link>
            <Link to={`/clubs/${club.id}/layouts/new`} className={buttonClass()}>
              New layout
            </Link>
          </div>
        ) : null}
      </div>
      {layouts.length === 0 ? (
        <p className="mt-4 max-w-prose text-ink-700">
          {isDirector
            ? "No layouts yet. Start one: give it a name, a surface and a track width, then draw it."
            : "No layout is published yet. Your race director publishes the layout for race day here."}
        </p>
      ) : (
        <ul className="mt-4 grid gap-3 sm:grid-cols-2">
          {layouts.map((layout) => (
            <li key={layout.id} className="rounded-lg border border-sand-200 bg-white p-4">
              <div className="flex items-start justify-between gap-2">
                <Link to={`/layouts/${layout.id}`} className="font-medium text-pine-700 hover:underline">
                  {layout.name}
                </Link>
                {isDirector ? <StatusBadge status={layout.status} /> : null}
              </div>
              <p className="mt-1 text-sm text-ink-500">
                {surfaceLabel(layout.surface)} · {layout.trackWidth} m wide
                {isDirector ? ` · draft version ${layout.version}` : ""}
              </p>
              {raceDay[layout.id] ? (
                <p className="mt-1 text-sm text-ink-700">
                  Race day {raceDateText(raceDay[layout.id].raceDate)} · version{" "}
                  {raceDay[layout.id].versionNumber}
                </p>
              ) : null}
              {raceDay[layout.id] ? <RiskSheetLink layoutId={layout.id} className="mt-1" /> : null}
            </li>
          ))}
        </ul>
      )}
      {isDirector ? (
        <details className="mt-6 max-w-2xl rounded-lg border border-sand-200 bg-white p-4">
          <summary className="cursor-pointer font-medium">Import a layout file</summary>
          <p className="mt-2 text-sm text-ink-700">
            A .json file exported from a Loftline layout page becomes a new draft here.
          </p>
          <ImportForm clubId={club.id} />
        </details>
      ) : null}
    </section>
  );
}
