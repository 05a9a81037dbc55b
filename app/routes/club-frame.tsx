import { NavLink, Outlet } from "react-router";
import type { Route } from "./+types/club-frame";
import { requireClubRole } from "~/auth/permissions.server";
import { ROLE_LABELS } from "~/lib/roles";

/** The club's frame: 404 for an unknown club, 403 for non-members; loads the reader's role. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { club, role } = await requireClubRole(request, params.clubId);
  return { club, role };
}

const tabClass = ({ isActive }: { isActive: boolean }) =>
  `border-b-2 px-1 pb-2 text-sm ${isActive ? "border-pine-700 font-medium text-pine-800" : "border-transparent text-ink-700 hover:border-sand-200"}`;

export default function ClubLayout({ loaderData }: Route.ComponentProps) {
  const { club, role } = loaderData;
  return (
    <div>
      <div className="mb-6 border-b border-sand-200">
        <p className="text-sm text-ink-500">
          Club · you are {role === "director" ? "a race director" : `a ${ROLE_LABELS[role].toLowerCase()}`}
        </p>
        <h1 className="mt-1 text-2xl font-semibold">{club.name}</h1>
        <nav aria-label="Club" className="mt-4 flex gap-5">
          <NavLink to={`/clubs/${club.id}`} end className={tabClass}>
            Layouts
          </NavLink>
          <NavLink to={`/clubs/${club.id}/members`} className={tabClass}>
            Members
          </NavLink>
          {role === "director" ? (
            <NavLink to={`/clubs/${club.id}/settings`} className={tabClass}>
              Settings: classes and guidance
            </NavLink>
          ) : null}
        </nav>
      </div>
      <Outlet />
    </div>
  );
}
