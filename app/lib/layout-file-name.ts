/**
 * The name of an exported layout file: the layout's name in lower case with dashes, its version,
 * and ".loftline.json", e.g. "summer-layout-v3.loftline.json". Only ASCII letters, digits and
 * dashes, so it is safe in a Content-Disposition header on every system.
 */
export function exportFileName(layoutName: string, version: number): string {
  return `${fileSlug(layoutName)}-v${version}.loftline.json`;
}

/** A layout's name as a file-name stem: ASCII lower-case letters, digits and dashes ("layout" if none). */
export function fileSlug(layoutName: string): string {
  const slug = layoutName
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/, "");
  return slug || "layout";
}
