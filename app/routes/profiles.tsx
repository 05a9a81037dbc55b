import { Form, Link } from "react-router";
import type { Route } from "./+types/profiles";
import { CAR_PRESET_IDS, CAR_PRESETS } from "~/analysis";
import { requireUser } from "~/auth/permissions.server";
import { listProfiles } from "~/cars/profiles.server";
import { buttonClass } from "~/components/ui/button";
import { dayText } from "~/lib/race-date";

export const meta: Route.MetaFunction = () => [{ title: "Your cars · Loftline" }];

/** The member's own car profiles (only the owner sees them). */
export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const presets = CAR_PRESET_IDS.map((id) => ({ id, label: CAR_PRESETS[id].label }));
  return { profiles: await listProfiles(user.id), presets };
}

export default function Profiles({ loaderData: { profiles, presets } }: Route.ComponentProps) {
  const presetLabel = (id: string) => presets.find((p) => p.id === id)?.label ?? id;
  return (
    <div className="max-w-3xl space-y-8">
      <header>
        <h1 className="text-2xl font-semibold">Your cars</h1>
        <p className="mt-1 max-w-prose text-ink-700">
          A profile holds the numbers of one of your cars. The layout, jump and plan pages can show every jump
          for it instead of a car class. Only you see your profiles.
        </p>
      </header>
      {profiles.length ? (
        <ul className="divide-y divide-sand-200 rounded-lg border border-sand-200 bg-white">
          {profiles.map((p) => (
            <li key={p.id} className="flex flex-wrap items-center justify-between gap-2 p-4">
              <Link to={`/profiles/${p.id}`} className="font-medium text-pine-700 hover:underline">
                {p.label}
              </Link>
              <span className="text-sm text-ink-500">
                from the {presetLabel(p.presetId).toLowerCase()} · changed {dayText(p.updatedAt)}
              </span>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-ink-700">No car profiles yet.</p>
      )}
      <section aria-labelledby="new-car" className="rounded-lg border border-sand-200 bg-white p-4">
        <h2 id="new-car" className="text-lg font-semibold">
          New car profile
        </h2>
        <p className="mt-1 text-sm text-ink-700">
          Start from the car class closest to yours: its values are estimates until you change them with your
          own measurements.
        </p>
        <Form method="get" action="/profiles/new" className="mt-3 flex flex-wrap items-end gap-3">
          <div className="space-y-1">
            <label htmlFor="new-preset" className="block text-sm font-medium text-ink-700">
              Start from
            </label>
            <select
              id="new-preset"
              name="preset"
              className="rounded-md border border-ink-300 bg-white px-3 py-2 text-sm"
            >
              {presets.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.label}
                </option>
              ))}
            </select>
          </div>
          <button type="submit" className={buttonClass()}>
            Start a profile
          </button>
        </Form>
      </section>
    </div>
  );
}
