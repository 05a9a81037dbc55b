import { data, Form } from "react-router";
import type { Route } from "./+types/outbox";
import { redirectWithNotice } from "~/auth/session.server";
import { LinkedText } from "~/components/auth/linked-text";
import { Button } from "~/components/ui/button";
import { config } from "~/lib/config.server";
import { clearOutbox, listOutbox } from "~/mail/outbox.server";

/** Newest messages shown; older ones stay on disk until the outbox is cleared. */
const SHOWN = 100;

export const meta: Route.MetaFunction = () => [{ title: "Outbox (development) · Loftline" }];

function requireDevTools() {
  if (!config.showDevTools) throw new Response("Not found", { status: 404, statusText: "Not found" });
}

export async function loader() {
  requireDevTools();
  const messages = await listOutbox({ limit: SHOWN });
  return {
    appOrigin: new URL(config.appUrl).origin,
    messages: messages.map((m) => ({
      id: m.id,
      to: m.to.join(", "),
      from: m.from,
      subject: m.subject,
      text: m.text,
      date: m.date,
      // Formatted here so the server and the browser show the same text.
      when: `${m.date.slice(0, 10)} ${m.date.slice(11, 19)} UTC`,
    })),
  };
}

export async function action({ request }: Route.ActionArgs) {
  requireDevTools();
  const intent = (await request.formData()).get("intent");
  if (intent !== "clear") return data({ error: 'The field "intent" must be "clear".' }, { status: 400 });
  const removed = await clearOutbox();
  return redirectWithNotice(
    request,
    "/outbox",
    `Outbox cleared (${removed} ${removed === 1 ? "message" : "messages"} removed).`,
  );
}

export default function Outbox({ loaderData }: Route.ComponentProps) {
  const { messages, appOrigin } = loaderData;
  return (
    <div className="mx-auto max-w-3xl space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Outbox</h1>
          <p className="mt-1 text-sm text-ink-700">
            In development and the demo, every e-mail Loftline sends lands here instead of a real inbox.
            Newest first.
          </p>
        </div>
        {messages.length ? (
          <Form method="post">
            <input type="hidden" name="intent" value="clear" />
            <Button type="submit" variant="secondary">
              Clear the outbox
            </Button>
          </Form>
        ) : null}
      </header>
      {messages.length === 0 ? (
        <p className="rounded-xl border border-dashed border-ink-300 bg-white p-8 text-center text-ink-500">
          No messages yet. Invitations and password reset links will appear here.
        </p>
      ) : (
        <ol className="space-y-4">
          {messages.map((m) => (
            <li key={m.id}>
              <article
                className="rounded-xl border border-sand-200 bg-white p-5 shadow-sm"
                aria-labelledby={`msg-${m.id}`}
              >
                <h2 id={`msg-${m.id}`} className="text-lg font-semibold">
                  {m.subject || "(no subject)"}
                </h2>
                <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
                  <dt className="text-ink-500">To</dt>
                  <dd className="break-all">{m.to}</dd>
                  <dt className="text-ink-500">From</dt>
                  <dd className="break-all">{m.from}</dd>
                  <dt className="text-ink-500">Received</dt>
                  <dd>
                    <time dateTime={m.date}>{m.when}</time>
                  </dd>
                </dl>
                <div className="mt-4 whitespace-pre-wrap border-t border-sand-200 pt-4 text-sm leading-relaxed">
                  <LinkedText text={m.text} appOrigin={appOrigin} />
                </div>
              </article>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
