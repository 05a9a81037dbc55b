import type { Route } from "./+types/api-health";

/**
 * A trivial JSON answer: shows the server is up, and is the baseline the analysis API is measured
 * against in `npm run bench:analysis-api`.
 */
export function loader(_: Route.LoaderArgs) {
  return Response.json({ ok: true, service: "loftline" }, { headers: { "Cache-Control": "no-store" } });
}
