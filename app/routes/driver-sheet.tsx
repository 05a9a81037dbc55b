import { data } from "react-router";
import type { Route } from "./+types/driver-sheet";
import { DriverSheet } from "~/components/reader/driver-sheet";
import { readerPage } from "~/layouts/reader-page.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Driver's sheet · ${data?.layout.name ?? "Layout"} · Loftline` },
];

/**
 * The driver's one-page sheet of a layout: same permissions, version (`?version=n`) and car choice
 * (`car`, `skill`, remembered) as the layout page; a parameter not understood is named (400).
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { status, ...page } = await readerPage(request, params.layoutId);
  return data(page, { status });
}

export default function DriverSheetRoute({ loaderData }: Route.ComponentProps) {
  return <DriverSheet {...loaderData} />;
}
