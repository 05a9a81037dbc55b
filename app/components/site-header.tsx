import { Form, Link, NavLink } from "react-router";
import { Wordmark } from "./ui/logo";

type Props = { user: { name: string; email: string } | null; showDevTools: boolean };

const navClass = ({ isActive }: { isActive: boolean }) =>
  `rounded-md px-2.5 py-1.5 text-sm ${isActive ? "bg-pine-50 text-pine-800 font-medium" : "text-ink-700 hover:bg-sand-100"}`;

/** The top bar: mark, main navigation for signed-in members, account actions. */
export function SiteHeader({ user, showDevTools }: Props) {
  return (
    <header className="no-print border-b border-sand-200 bg-white">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3 sm:px-6">
        <Link to={user ? "/clubs" : "/"} aria-label="Loftline home">
          <Wordmark />
        </Link>
        {user ? (
          <nav aria-label="Main" className="flex flex-wrap items-center gap-1">
            <NavLink to="/clubs" className={navClass}>
              Clubs and layouts
            </NavLink>
            <NavLink to="/profiles" className={navClass}>
              Your cars
            </NavLink>
          </nav>
        ) : null}
        <div className="ml-auto flex items-center gap-3 text-sm">
          {showDevTools ? (
            <NavLink to="/outbox" className={navClass}>
              Outbox
            </NavLink>
          ) : null}
          {user ? (
            <>
              <span className="hidden text-ink-500 sm:inline">{user.name}</span>
              <Form method="post" action="/sign-out">
                <button type="submit" className="text-pine-700 hover:underline">
                  Sign out
                </button>
              </Form>
            </>
          ) : (
            <>
              <Link to="/sign-in" className="text-pine-700 hover:underline">
                Sign in
              </Link>
              <Link
                to="/sign-up"
                className="rounded-md bg-pine-700 px-3 py-1.5 font-medium text-white hover:bg-pine-800"
              >
                Create an account
              </Link>
            </>
          )}
        </div>
      </div>
    </header>
  );
}
