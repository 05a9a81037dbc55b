/**
 * Which route of the built app an address reaches, so the server can apply that route's body rule
 * and headers before the framework runs. Uses the framework's own matcher on the build's route
 * list, so it always agrees with app/routes.ts.
 */
import { matchRoutes, type RouteObject, type ServerBuild } from "react-router";

export type MatchedRoute = {
  /** The route's id: its module path without the extension, e.g. "routes/sign-in". */
  id: string;
  /** A resource route (no page component): it answers JSON or files, never a page. */
  resource: boolean;
};

/** The route matcher of one build. `pathname` may be a data request's (`/sign-in.data`). */
export function routeMatcher(build: ServerBuild): (pathname: string) => MatchedRoute | null {
  const all = Object.values(build.routes).filter((r) => r !== undefined);
  const childrenOf = (parentId: string | undefined): RouteObject[] =>
    all
      .filter((r) => r.parentId === parentId)
      .map((r) =>
        r.index
          ? { id: r.id, path: r.path, index: true, caseSensitive: r.caseSensitive }
          : { id: r.id, path: r.path, caseSensitive: r.caseSensitive, children: childrenOf(r.id) },
      );
  const tree = childrenOf(undefined);
  return (pathname) => {
    const matches = matchRoutes(tree, pagePath(pathname));
    const leaf = matches?.at(-1)?.route;
    if (!leaf?.id) return null;
    return { id: leaf.id, resource: !build.routes[leaf.id]?.module.default };
  };
}

/** True for the framework's data requests (a form sent by the page's script, a loader refresh). */
export function isDataRequest(pathname: string): boolean {
  return pathname.endsWith(".data");
}

/** The page address a data request stands for: `/sign-in.data` → `/sign-in`, `/_root.data` → `/`. */
export function pagePath(pathname: string): string {
  if (pathname === "/_root.data") return "/";
  return pathname.endsWith(".data") ? pathname.slice(0, -".data".length) : pathname;
}
