import { Link } from "react-router";
import type { Route } from "./+types/home";
import { getUser } from "~/auth/permissions.server";
import { Cautions } from "~/components/cautions";
import { JumpIllustration } from "~/components/landing/jump-illustration";
import { buttonClass } from "~/components/ui/button";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await getUser(request);
  return { signedIn: user !== null, name: user?.name ?? null };
}

export const meta: Route.MetaFunction = () => [
  { title: "Loftline: plan your club's track and fly every jump" },
  {
    name: "description",
    content:
      "For off-road RC racing clubs: draw the layout to scale, fly every jump for each class of car, and see which landings lead into turns.",
  },
];

const ROLES = [
  {
    title: "For the race director",
    points: [
      "Draw the layout from straights, turns and jumps, to scale, over a photo of the site.",
      "See the lap length, the lap time for each class and a verdict on every jump before the volunteers start digging.",
      "Publish a version for race day with its date and a note: every member gets an e-mail, and later edits stay in your draft until you publish again.",
      "Share a read-only link to a published version, and compare two versions section by section.",
    ],
  },
  {
    title: "For the drivers",
    points: [
      "Read the race-day version before practice and know which jumps lead into turns.",
      "For each jump, for a class of car or your own car's measured numbers: takeoff speed, time in the air and where you land.",
      "Whether to take it straight, or how to set the car up in the air for the turn, and how much timing slack you have.",
      "On a phone: the jumps in lap order as cards, each opening its side view and the steering steps in plain words; on paper: a one-page driver's sheet.",
    ],
  },
  {
    title: "For the marshals",
    points: [
      "The plan with every jump, the driver stand and the numbered marshal points; each jump's side view shows the overshoot zone.",
      "Which stretches the driver stand cannot see, and where lanes pass close together.",
      "A corner-risk sheet for each race-day version and class, on screen, printed or as PDF: the overshoot and run-off zones, the hotspots, and for each marshal point what to watch.",
    ],
  },
] as const;

const STEPS = [
  {
    title: "Draw it to scale",
    text: "Chain straights, turns and jumps (tabletops, doubles, step-ups, whoops) into a loop with the real track width. Loftline tells you if the loop does not close.",
  },
  {
    title: "Fly every jump",
    text: "For each class of car, Loftline works out the speed along the lap, how far each jump carries, how hard it lands, and the speed window between casing it and overshooting.",
  },
  {
    title: "See the landings into turns",
    text: "Where a landing runs straight into a turn, it shows whether setting the car up in the air is worth the risk, or whether taking it straight is the better call.",
  },
  {
    title: "Share it for race day",
    text: "Publish a version with its race date and every member gets an e-mail with a link; a read-only link can go to anyone else. Everyone sees the same fixed version, each with what their role needs.",
  },
] as const;

export default function Home({ loaderData }: Route.ComponentProps) {
  return (
    <div className="space-y-16 pb-8">
      <section className="grid items-center gap-8 pt-4 lg:grid-cols-[1fr_1.1fr]">
        <div>
          <p className="text-sm font-semibold tracking-wide text-clay-700 uppercase">
            For off-road RC racing clubs
          </p>
          <h1 className="mt-2 text-3xl leading-tight font-bold text-ink-900 sm:text-4xl">
            Plan the track and fly every jump before a shovel moves.
          </h1>
          <p className="mt-4 text-lg text-ink-700">
            Loftline lets a club&apos;s race director draw a layout to scale, flies each jump for each class
            of car, and tells the director, the drivers and the marshals where a jump lands into a turn,
            whether setting the car up in the air is worth it, and where cars will crash.
          </p>
          <div className="mt-6 flex flex-wrap gap-3">
            {loaderData.signedIn ? (
              <Link to="/clubs" className={buttonClass("primary")}>
                Go to your clubs
              </Link>
            ) : (
              <>
                <Link to="/sign-up" className={buttonClass("primary")}>
                  Create an account
                </Link>
                <Link to="/sign-in" className={buttonClass("secondary")}>
                  Sign in
                </Link>
              </>
            )}
          </div>
          {loaderData.signedIn ? (
            <p className="mt-3 text-sm text-ink-500">Signed in as {loaderData.name}.</p>
          ) : (
            <p className="mt-3 text-sm text-ink-500">
              Joining a club? Use the link in your invitation e-mail to create your account.
            </p>
          )}
        </div>
        <figure className="rounded-xl border border-sand-200 bg-white p-3 shadow-sm sm:p-5">
          <JumpIllustration className="h-auto w-full" />
          <figcaption className="mt-2 text-center text-xs text-ink-500">
            A tabletop seen from the side (heights exaggerated): the flight path from the lip, the landing,
            and the overshoot zone a marshal keeps out of.
          </figcaption>
        </figure>
      </section>

      <section aria-labelledby="roles-title">
        <h2 id="roles-title" className="text-2xl font-semibold">
          One layout, three jobs
        </h2>
        <p className="mt-2 max-w-3xl text-ink-700">
          Every member has a role in each club they belong to. The race director plans and publishes; marshals
          and drivers read the published layout, each with what their job needs.
        </p>
        <div className="mt-6 grid gap-4 md:grid-cols-3">
          {ROLES.map((role) => (
            <article key={role.title} className="rounded-lg border border-sand-200 bg-white p-5">
              <h3 className="font-semibold text-pine-800">{role.title}</h3>
              <ul className="mt-3 list-disc space-y-2 pl-5 text-sm text-ink-700">
                {role.points.map((point) => (
                  <li key={point}>{point}</li>
                ))}
              </ul>
            </article>
          ))}
        </div>
      </section>

      <section aria-labelledby="steps-title">
        <h2 id="steps-title" className="text-2xl font-semibold">
          How it works
        </h2>
        <ol className="mt-6 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          {STEPS.map((step, i) => (
            <li key={step.title} className="rounded-lg bg-pine-50 p-5">
              <span
                aria-hidden="true"
                className="flex h-8 w-8 items-center justify-center rounded-full bg-pine-700 text-sm font-semibold text-white"
              >
                {i + 1}
              </span>
              <h3 className="mt-3 font-semibold">{step.title}</h3>
              <p className="mt-1 text-sm text-ink-700">{step.text}</p>
            </li>
          ))}
        </ol>
        <p className="mt-4 max-w-3xl text-sm text-ink-500">
          Signed-out visitors see only this page and the layouts a director chose to share by link. Everything
          else belongs to the club.
        </p>
      </section>

      <Cautions />
    </div>
  );
}
