import { BUILDING_CAUTIONS } from "~/lib/build-pack-words";

/** The build pack's cautions (building work, earth volumes), beside the standard track-side ones. */
export function BuildingCautions() {
  return (
    <aside
      aria-labelledby="building-cautions"
      className="rounded-lg border border-clay-500/40 bg-clay-100/60 p-5"
    >
      <h2 id="building-cautions" className="text-lg font-semibold">
        Building safely
      </h2>
      <ul className="mt-2 list-disc space-y-1 pl-5 text-ink-700">
        {BUILDING_CAUTIONS.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </aside>
  );
}
