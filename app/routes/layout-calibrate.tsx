import { data, Link } from "react-router";
import type { Route } from "./+types/layout-calibrate";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { readCalibrationForm } from "~/calibration/form.server";
import { MAX_LAP_FILE_BYTES } from "~/calibration/lap-file.server";
import { calibrationOptions } from "~/calibration/options.server";
import { runCalibration } from "~/calibration/run.server";
import { fittedFromForm, saveAsNewProfile, saveToProfile } from "~/calibration/save.server";
import { rememberedCar } from "~/cars/reader-choice.server";
import { refusal } from "~/clubs/rule-error.server";
import { formValues } from "~/clubs/form-values.server";
import { CalibrationForm, LapFileIssues } from "~/components/calibration/calibration-form";
import { CalibrationResultView } from "~/components/calibration/calibration-result";
import { FormMessage } from "~/components/ui/form";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Calibrate from your laps · ${data?.layout.name ?? "Layout"} · Loftline` },
];

/** Members of the layout's club: the form, with the layout's published versions and their cars. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { club, user, layout } = await requireLayoutAccess(request, params.layoutId);
  const [options, remembered] = await Promise.all([
    calibrationOptions(layout.id, club.id, user.id),
    rememberedCar(user.id),
  ]);
  // The car asked in the address, else the one the member last read layouts with, if offered here.
  const offered = [...options.ownCars, ...options.cars].map((c) => c.value);
  const asked = new URL(request.url).searchParams.get("car");
  const car = [asked, remembered].find((c) => c && offered.includes(c)) ?? options.ownCars[0]?.value;
  return {
    layout: { id: layout.id, name: layout.name },
    options: { ...options, car },
    maxKb: MAX_LAP_FILE_BYTES / 1024,
  };
}

/**
 * A multipart form runs a calibration (reads only); a plain form saves the fitted values to the
 * member's own profile (`intent=save`, 404 for anyone else's) or as a new one (`intent=save-new`).
 */
export async function action({ request, params }: Route.ActionArgs) {
  const { club, user, layout } = await requireLayoutAccess(request, params.layoutId);
  const type = request.headers.get("Content-Type") ?? "";
  if (type.startsWith("application/x-www-form-urlencoded")) {
    const form = await request.formData();
    try {
      const values = fittedFromForm(form);
      if (form.get("intent") === "save") {
        const profileId = String(form.get("profileId") ?? "");
        const label = await saveToProfile(user.id, profileId, values);
        throw await redirectWithNotice(
          request,
          `/profiles/${profileId}`,
          `${label} now has the fitted values.`,
        );
      }
      if (form.get("intent") === "save-new") {
        const label = String(form.get("label") ?? "");
        const id = await saveAsNewProfile(user.id, String(form.get("presetId") ?? ""), label, values);
        throw await redirectWithNotice(
          request,
          `/profiles/${id}`,
          `${label.trim()} is saved with the fitted values.`,
        );
      }
      return data(
        { errors: { intent: ["Choose where to save the values."] }, values: formValues(form) },
        { status: 400 },
      );
    } catch (error) {
      if (error instanceof Response) throw error;
      return refusal(error, formValues(form));
    }
  }
  const read = await readCalibrationForm(request);
  if (!read.ok) {
    const { status, field, message } = read;
    return data({ refusal: { field, message, issues: [] } }, { status });
  }
  const outcome = await runCalibration(club.id, layout.id, user.id, read.form);
  if (!outcome.ok) {
    const { status, ...view } = outcome.refusal;
    return data({ refusal: view }, { status });
  }
  return { result: outcome.result };
}

export default function LayoutCalibrate({ loaderData: d, actionData }: Route.ComponentProps) {
  const result = actionData && "result" in actionData ? actionData.result : undefined;
  const refused = actionData && "refusal" in actionData ? actionData.refusal : undefined;
  const saveErrors = actionData && "errors" in actionData ? actionData.errors : undefined;
  return (
    <div className="max-w-4xl space-y-6">
      <header>
        <p className="text-sm">
          <Link to={`/layouts/${d.layout.id}`} className="text-pine-700 hover:underline">
            {d.layout.name}
          </Link>
        </p>
        <h1 className="mt-1 text-2xl font-semibold">Calibrate from your laps</h1>
        <p className="mt-1 max-w-prose text-ink-700">
          Bring the lap times your timing system recorded on a published version of this layout. Loftline
          compares them with the lap the model gives your car and fits what the times can tell apart. Nothing
          is saved until you ask.
        </p>
      </header>
      {d.options.versions.length === 0 ? (
        <FormMessage>
          This layout has no published version yet: laps can only be compared with a published one.
        </FormMessage>
      ) : (
        <CalibrationForm {...d.options} maxKb={d.maxKb} refusal={refused} />
      )}
      {refused ? <LapFileIssues refusal={refused} /> : null}
      {saveErrors ? <FormMessage>{Object.values(saveErrors).flat().join(" ")}</FormMessage> : null}
      {result ? <CalibrationResultView r={result} /> : null}
    </div>
  );
}
