import { useMemo } from "react";
import { withUnpackedOverlay } from "~/lib/packed-line";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/layout-page";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { refusal } from "~/clubs/rule-error.server";
import { parseJumpSort } from "~/components/analysis/jump-sort";
import { BuildPackLink } from "~/components/build-pack/build-pack-link";
import { LayoutAnalysisSection } from "~/components/analysis/layout-analysis-section";
import { LayoutMeta, LayoutMetaFields, StatusBadge } from "~/components/layout-meta";
import { Button } from "~/components/ui/button";
import { FieldError, FormMessage, type FieldErrors } from "~/components/ui/form";
import type { LayoutStatus } from "~/lib/roles";
import { pageAnalysis } from "~/layouts/analysis-page.server";
import { readerChoice } from "~/cars/reader-choice.server";
import { readingFor, readingView } from "~/layouts/reading.server";
import { VersionBanner } from "~/components/publishing/version-banner";
import { RiskSheetLink } from "~/components/risk/risk-sheet-link";
import { changeLayoutStatus, deleteLayout, updateLayoutMeta } from "~/layouts/layouts.server";
import { parseForm } from "~/lib/forms";
import { formValues } from "~/clubs/form-values.server";
import { layoutActionSchema, LIST_FIELDS } from "~/lib/schemas/layouts";

/** The page is a pure function of its data: kept rendered (app/lib/html-cache.server.ts). */
export const handle = { htmlCache: true };

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${data?.layout.name ?? "Layout"} · Loftline` },
];

/**
 * Members see the race-day version of a published layout (or an earlier published one with
 * `?version=n`); only directors see drafts and archived ones (others get 404). The analysis
 * follows the query: `car` (a class id or `profile:<id>`; `class` from older links), `skill`, and
 * the jumps table's `sort` and `dir`; car and skill are remembered for the member. A parameter that
 * is not understood is named on the page (status 400) and the defaults are shown.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, club, role, user, guidance, creatorName } = await requireLayoutAccess(
    request,
    params.layoutId,
  );
  const query = new URL(request.url).searchParams;
  const isDirector = role === "director";
  const reading = await readingFor(layout, role, query);
  const choice = await readerChoice(user.id, query, reading.document.carClasses);
  const page = await pageAnalysis(layout, query, { reading, choice, guidance });
  const sort = parseJumpSort(query);
  const problems = sort.problem ? [...page.problems, sort.problem] : page.problems;
  const { driverStand, marshalPoints, siteBoundary, trackWidth } = page.document;
  const analysis = {
    layoutId: layout.id,
    clubId: club.id,
    isDirector,
    document: { driverStand, marshalPoints, siteBoundary, trackWidth },
    classId: page.classId,
    skill: page.skill,
    classes: page.classes,
    car: page.car,
    cars: page.cars,
    version: reading.query,
    problems,
    sort,
    result: page.result,
  };
  const createdByName = creatorName;
  const facts = {
    id: layout.id,
    name: layout.name,
    surface: layout.surface,
    trackWidth: layout.trackWidth,
    carClasses: page.document.carClasses,
    status: layout.status,
    // Marshals and drivers read a published version: its number and date, not the draft's.
    version: isDirector ? layout.version : (reading.number ?? layout.version),
    createdAt: layout.createdAt,
    updatedAt: isDirector ? layout.updatedAt : (reading.publication?.publishedAt ?? layout.updatedAt),
  };
  return data(
    { analysis, club, isDirector, layout: facts, createdByName, reading: readingView(reading) },
    { status: problems.length ? 400 : 200 },
  );
}

const DONE: Record<string, string> = {
  update: "Saved.",
  archive: "Archived.",
  unarchive: "Taken out of the archive as a draft.",
};

/** Director-only changes, each naming the version it started from. */
export async function action({ request, params }: Route.ActionArgs) {
  const { layout, club } = await requireLayoutAccess(request, params.layoutId, "director");
  const formData = await request.formData();
  const parsed = parseForm(layoutActionSchema, formData, LIST_FIELDS);
  const values = () => ({ ...formValues(formData), carClasses: formData.getAll("carClasses").map(String) });
  if (!parsed.ok) return data({ errors: parsed.errors, values: values() }, { status: 400 });
  const input = parsed.data;
  try {
    if (input.intent === "delete") {
      const { name } = await deleteLayout(layout.id);
      throw await redirectWithNotice(request, `/clubs/${club.id}`, `${name} is deleted.`);
    }
    if (input.intent === "update") {
      const { name, surface, trackWidth, carClasses } = input;
      await updateLayoutMeta(layout.id, input.version, { name, surface, trackWidth, carClasses });
    } else {
      await changeLayoutStatus(layout.id, input.version, input.intent);
    }
  } catch (error) {
    if (error instanceof Response) throw error;
    return refusal(error, values());
  }
  throw await redirectWithNotice(request, `/layouts/${layout.id}`, DONE[input.intent]);
}

export default function LayoutPage({ loaderData, actionData }: Route.ComponentProps) {
  const { club, layout, isDirector, createdByName, analysis, reading } = loaderData;
  // The racing line travels as one text (app/lib/packed-line.ts): unpacked once per data.
  const unpacked = useMemo(() => withUnpackedOverlay(analysis), [analysis]);
  const errors: FieldErrors | undefined = actionData?.errors;
  const values = actionData?.values;
  return (
    <article className="space-y-8">
      <header>
        <p className="text-sm">
          <Link to={`/clubs/${club.id}`} className="text-pine-700 hover:underline">
            {club.name}
          </Link>
        </p>
        <div className="mt-1 flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold">{layout.name}</h1>
          <StatusBadge status={layout.status} />
        </div>
      </header>
      <FormMessage>
        {[...(errors?.form ?? []), ...(errors?.version ?? []), ...(errors?.intent ?? [])].join(" ")}
      </FormMessage>
      <VersionBanner layoutId={layout.id} reading={reading} isDirector={isDirector} />
      <RiskSheetLink
        layoutId={layout.id}
        query={{
          ...analysis.version,
          class: layout.carClasses.includes(analysis.classId) ? analysis.classId : undefined,
        }}
      />
      <LayoutAnalysisSection data={unpacked} layoutName={layout.name} />
      <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
        <section
          aria-labelledby="about"
          className="self-start rounded-lg border border-sand-200 bg-white p-4"
        >
          <h2 id="about" className="mb-3 text-lg font-semibold">
            About this layout
          </h2>
          <LayoutMeta {...layout} clubName={club.name} createdByName={createdByName} />
        </section>
        {isDirector ? (
          <div className="space-y-6">
            <BuildPackLink layoutId={layout.id} />
            <DirectorTools layout={layout} errors={errors} values={values} />
          </div>
        ) : null}
      </div>
    </article>
  );
}

type Tools = {
  layout: {
    id: string;
    name: string;
    surface: string;
    trackWidth: number;
    carClasses: readonly string[];
    status: LayoutStatus;
    version: number;
  };
  errors?: FieldErrors;
  values?: Record<string, string | string[]>;
};

function DirectorTools({ layout, errors, values }: Tools) {
  const busy = useNavigation().state === "submitting";
  const version = <input type="hidden" name="version" value={layout.version} />;
  const statusButtons: Record<LayoutStatus, [string, string][]> = {
    draft: [["archive", "Archive"]],
    published: [["archive", "Archive"]],
    archived: [["unarchive", "Take out of the archive"]],
  };
  return (
    <div className="space-y-6">
      <section aria-labelledby="details" className="rounded-lg border border-sand-200 bg-white p-4">
        <h2 id="details" className="mb-3 text-lg font-semibold">
          Details
        </h2>
        <Form method="post" className="space-y-4" noValidate>
          {version}
          <LayoutMetaFields errors={errors} values={values ?? layout} />
          <Button type="submit" name="intent" value="update" disabled={busy}>
            Save details
          </Button>
        </Form>
      </section>
      <section aria-labelledby="status" className="rounded-lg border border-sand-200 bg-white p-4">
        <h2 id="status" className="text-lg font-semibold">
          Status
        </h2>
        <p className="mt-1 text-sm text-ink-500">
          Marshals and drivers see only published versions, never the draft.{" "}
          <Link to={`/layouts/${layout.id}/publishing`} className="text-pine-700 hover:underline">
            Publish for race day, withdraw or share
          </Link>
          . An archived layout is hidden from them.
        </p>
        <Form method="post" className="mt-3 flex flex-wrap gap-2">
          {version}
          {statusButtons[layout.status].map(([intent, label]) => (
            <Button
              key={intent}
              type="submit"
              name="intent"
              value={intent}
              variant="secondary"
              disabled={busy}
            >
              {label}
            </Button>
          ))}
        </Form>
      </section>
      <section aria-labelledby="delete" className="rounded-lg border border-danger-100 bg-white p-4">
        <h2 id="delete" className="text-lg font-semibold">
          Delete
        </h2>
        <Form method="post" className="mt-2 space-y-3">
          <input type="hidden" name="intent" value="delete" />
          <label className="flex items-start gap-2 text-sm">
            <input
              type="checkbox"
              name="confirm"
              value="yes"
              className="mt-1"
              aria-describedby={errors?.confirm ? "confirm-error" : undefined}
            />
            <span>Yes, delete {layout.name} and every saved version of it. This cannot be undone.</span>
          </label>
          <FieldError id="confirm-error" errors={errors?.confirm} />
          <Button type="submit" variant="danger" disabled={busy}>
            Delete the layout
          </Button>
        </Form>
      </section>
    </div>
  );
}
