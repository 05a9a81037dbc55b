import { Link } from "react-router";
import { BUILD_PACK_TITLE } from "~/lib/build-pack-words";

/** The way to the build pack from the layout page (directors only: decision 0600). */
export function BuildPackLink({ layoutId }: { layoutId: string }) {
  return (
    <section aria-labelledby="build-pack" className="rounded-lg border border-sand-200 bg-white p-4">
      <h2 id="build-pack" className="text-lg font-semibold">
        {BUILD_PACK_TITLE}
      </h2>
      <p className="mt-1 text-sm text-ink-500">
        Stake positions from two datum stakes and the earth in each jump, to mark the layout out and build it.
      </p>
      <Link to={`/layouts/${layoutId}/build`} className="mt-2 inline-block text-pine-700 hover:underline">
        Open the build pack
      </Link>
    </section>
  );
}
