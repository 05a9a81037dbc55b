import {
  data,
  isRouteErrorResponse,
  Links,
  Meta,
  Outlet,
  Scripts,
  ScrollRestoration,
  useRouteLoaderData,
} from "react-router";
import type { Route } from "./+types/root";
import { SiteHeader } from "~/components/site-header";
import { getUser } from "~/auth/permissions.server";
import { getSession, sessionStorage } from "~/auth/session.server";
import { config } from "~/lib/config.server";
import { useNonce } from "~/lib/nonce";
import "./app.css";

export async function loader({ request }: Route.LoaderArgs) {
  const [user, session] = await Promise.all([getUser(request), getSession(request)]);
  const notice = session.get("notice") ?? null;
  return data(
    { user, notice, showDevTools: config.showDevTools },
    notice ? { headers: { "Set-Cookie": await sessionStorage().commitSession(session) } } : undefined,
  );
}

export const meta: Route.MetaFunction = () => [
  { title: "Loftline: plan the track, fly every jump" },
  {
    name: "description",
    content: "Track layouts, jump analysis and marshal planning for off-road RC clubs.",
  },
];

export function Layout({ children }: { children: React.ReactNode }) {
  const root = useRouteLoaderData<typeof loader>("root");
  const nonce = useNonce();
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <link rel="icon" href="/favicon.svg" type="image/svg+xml" />
        <Meta />
        <Links />
      </head>
      <body className="min-h-screen font-sans">
        <SiteHeader user={root?.user ?? null} showDevTools={root?.showDevTools ?? false} />
        {root?.notice ? (
          <div
            role="status"
            className="no-print border-b border-pine-100 bg-pine-50 px-4 py-2 text-center text-sm text-pine-800"
          >
            {root.notice}
          </div>
        ) : null}
        <main className="mx-auto w-full max-w-6xl px-4 py-6 sm:px-6">{children}</main>
        <ScrollRestoration nonce={nonce} />
        <Scripts nonce={nonce} />
      </body>
    </html>
  );
}

export default function App() {
  return <Outlet />;
}

const ERROR_TEXT: Record<number, { title: string; body: string }> = {
  400: {
    title: "That request was not right",
    body: "Something in it could not be read. Go back and check the form.",
  },
  401: { title: "Please sign in", body: "This page is for signed-in club members." },
  403: {
    title: "Not allowed",
    body: "Your role in this club does not allow this. Ask one of the club's race directors.",
  },
  404: { title: "Not found", body: "There is nothing here, or it is not shared with you." },
  409: { title: "Changed meanwhile", body: "Someone else saved a newer version. Reload to see it." },
  413: { title: "Too large", body: "That upload or form is larger than allowed." },
  415: { title: "Wrong kind of content", body: "The request was not sent as the form or file expected." },
  422: {
    title: "Cannot analyse this layout",
    body: "The saved drawing could not be analysed. Open it in the editor to fix it.",
  },
  429: { title: "Too many attempts", body: "Wait a few minutes and try again." },
};

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  let status = 500;
  let detail: string | undefined;
  if (isRouteErrorResponse(error)) {
    status = error.status;
    detail = typeof error.data === "string" ? error.data : (error.data?.error ?? error.statusText);
  } else if (import.meta.env.DEV && error instanceof Error) {
    detail = error.message;
  }
  const text = ERROR_TEXT[status] ?? {
    title: "Something went wrong",
    body: "The error has been logged. Try again in a moment.",
  };
  return (
    <section className="mx-auto max-w-lg py-16 text-center">
      <p className="text-sm font-semibold text-clay-700">Error {status}</p>
      <h1 className="mt-2 text-2xl font-semibold">{text.title}</h1>
      <p className="mt-3 text-ink-700">{text.body}</p>
      {detail && detail !== text.title ? <p className="mt-2 text-sm text-ink-500">{detail}</p> : null}
      <a href="/" className="mt-6 inline-block text-pine-700 underline">
        Back to the start page
      </a>
    </section>
  );
}
