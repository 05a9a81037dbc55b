import { data, Link } from "react-router";
import type { Route } from "./+types/build-pack";
import { BuildPackForm } from "~/components/build-pack/build-pack-form";
import { BuildPackSheets } from "~/components/build-pack/build-pack-sheets";
import { Button, buttonClass } from "~/components/ui/button";
import { loadBuildPack, settingsQuery, versionLabel } from "~/layouts/build-pack.server";
import { buildSheet } from "~/layouts/build-pack-sheet.server";
import { BUILD_PACK_TITLE } from "~/lib/build-pack-words";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${BUILD_PACK_TITLE}: ${data?.layout.name ?? "layout"} · Loftline` },
];

/**
 * The build pack (directors only, decision 0600): the settings form and both sheets, printable.
 * Settings come from the address; a setting that is wrong is named beside its field (400), an
 * unknown version gives 404, and no sheet is shown until the settings are right.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const load = await loadBuildPack(request, params.layoutId);
  const base = {
    club: load.club,
    layout: load.layout,
    versions: load.versions,
    choices: load.choices,
    versionLabel: versionLabel(load),
  };
  if (!load.result.ok) {
    return data(
      { ...base, values: load.values, errors: load.result.errors, sheet: null, query: "" },
      { status: load.result.status },
    );
  }
  const query = settingsQuery(load.result.settings);
  const sheet = buildSheet(load.document, load.result.settings, base.versionLabel);
  return { ...base, values: Object.fromEntries(new URLSearchParams(query)), errors: null, sheet, query };
}

export default function BuildPackPage({ loaderData }: Route.ComponentProps) {
  const { club, layout, versions, choices, values, errors, sheet, query } = loaderData;
  const base = `/layouts/${layout.id}/build`;
  return (
    <article className="space-y-8 print:space-y-4">
      <header>
        <p className="text-sm no-print">
          <Link to={`/clubs/${club.id}`} className="text-pine-700 hover:underline">
            {club.name}
          </Link>{" "}
          /{" "}
          <Link to={`/layouts/${layout.id}`} className="text-pine-700 hover:underline">
            {layout.name}
          </Link>
        </p>
        <h1 className="mt-1 text-2xl font-semibold">
          {BUILD_PACK_TITLE}: {layout.name}
        </h1>
        <p className="text-sm text-ink-500">
          {club.name} · {loaderData.versionLabel} · for marking the layout out on the ground and moving the
          earth.
        </p>
      </header>
      {sheet ? (
        <nav aria-label="Downloads" className="flex flex-wrap gap-2 no-print">
          <Button type="button" onClick={() => window.print()}>
            Print the sheets
          </Button>
          <a className={buttonClass("secondary")} href={`${base}/marking.pdf?${query}`} download>
            Marking-out sheet (PDF)
          </a>
          <a className={buttonClass("secondary")} href={`${base}/marking.csv?${query}`} download>
            Stake points (CSV)
          </a>
          <a className={buttonClass("secondary")} href={`${base}/earthworks.pdf?${query}`} download>
            Earthworks sheet (PDF)
          </a>
        </nav>
      ) : null}
      <BuildPackForm choices={choices} versions={versions} values={values} errors={errors} />
      {sheet ? (
        <BuildPackSheets sheet={sheet} />
      ) : (
        <p role="alert" className="text-danger-700">
          Put the settings right to see the sheets.
        </p>
      )}
    </article>
  );
}
