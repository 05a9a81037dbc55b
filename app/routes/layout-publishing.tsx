import { data, Link } from "react-router";
import type { Route } from "./+types/layout-publishing";
import { requireLayoutAccess } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { formValues } from "~/clubs/form-values.server";
import { refusal } from "~/clubs/rule-error.server";
import { PublishForm, PublicationsTable } from "~/components/publishing/publishing-panels";
import { ShareLinksTable } from "~/components/publishing/share-links-table";
import { FormMessage, type FieldErrors } from "~/components/ui/form";
import { mailPublication } from "~/layouts/publish-mail.server";
import { draftFacts, listPublications } from "~/layouts/publications.server";
import { publishDraft, withdrawPublication } from "~/layouts/publishing.server";
import { createShareLink, listShareLinks, revokeShareLink } from "~/layouts/share-links.server";
import { config } from "~/lib/config.server";
import { parseForm } from "~/lib/forms";
import { raceDateText } from "~/lib/race-date";
import { publishingActionSchema } from "~/lib/schemas/publishing";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Publishing · ${data?.layout.name ?? "Layout"} · Loftline` },
];

/** Directors only (403 for other members): the draft, the published versions and the share links. */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { layout, club } = await requireLayoutAccess(request, params.layoutId, "director");
  const [facts, publications, links] = await Promise.all([
    draftFacts(layout.id, club.id),
    listPublications(layout.id),
    listShareLinks(layout.id),
  ]);
  return {
    club,
    layout: { id: layout.id, name: layout.name, status: layout.status, version: layout.version },
    ...facts,
    publications,
    links,
  };
}

/**
 * Director-only: publish the draft for race day (and e-mail every member), withdraw a published
 * version with a reason, create a share link (its address is shown once, here) or revoke one.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const { layout, club, user } = await requireLayoutAccess(request, params.layoutId, "director");
  const formData = await request.formData();
  const parsed = parseForm(publishingActionSchema, formData);
  if (!parsed.ok) return data({ errors: parsed.errors, values: formValues(formData) }, { status: 400 });
  const input = parsed.data;
  const back = `/layouts/${layout.id}/publishing`;
  try {
    if (input.intent === "publish") {
      const { versionNumber } = await publishDraft(layout.id, input.version, input, user.id);
      const mail = await mailPublication({
        clubId: club.id,
        clubName: club.name,
        layoutId: layout.id,
        layoutName: layout.name,
        versionNumber,
        raceDate: input.raceDate,
        note: input.note,
      });
      const failed = mail.failed ? ` ${mail.failed} could not be sent: check the mail settings.` : "";
      throw await redirectWithNotice(
        request,
        back,
        `Version ${versionNumber} is published for race day ${raceDateText(input.raceDate)}. E-mailed ${mail.sent} member(s).${failed}`,
      );
    }
    if (input.intent === "withdraw") {
      const { versionNumber, stillPublished } = await withdrawPublication(
        layout.id,
        input.publication,
        input.reason,
        user.id,
      );
      const after = stillPublished
        ? "Members now see the newest version still published."
        : "No version is published now: marshals and drivers see nothing of this layout.";
      throw await redirectWithNotice(request, back, `Version ${versionNumber} is withdrawn. ${after}`);
    }
    if (input.intent === "share") {
      const link = await createShareLink(layout.id, input.publication, user.id);
      const url = new URL(`/shared/${link.token}`, config.appUrl).toString();
      return data({ shared: { url, versionNumber: link.versionNumber } });
    }
    await revokeShareLink(layout.id, input.link);
    throw await redirectWithNotice(request, back, "The link is revoked: it no longer opens anything.");
  } catch (error) {
    if (error instanceof Response) throw error;
    return refusal(error, formValues(formData));
  }
}

export default function LayoutPublishing({ loaderData: d, actionData }: Route.ComponentProps) {
  const errors: FieldErrors | undefined =
    actionData && "errors" in actionData ? actionData.errors : undefined;
  const values = actionData && "values" in actionData ? actionData.values : undefined;
  const shared = actionData && "shared" in actionData ? actionData.shared : undefined;
  return (
    <article className="max-w-4xl space-y-8">
      <header>
        <p className="text-sm">
          <Link to={`/clubs/${d.club.id}`} className="text-pine-700 hover:underline">
            {d.club.name}
          </Link>
          {" / "}
          <Link to={`/layouts/${d.layout.id}`} className="text-pine-700 hover:underline">
            {d.layout.name}
          </Link>
        </p>
        <h1 className="mt-1 text-2xl font-semibold">Publishing and sharing</h1>
        <p className="mt-1 max-w-prose text-sm text-ink-700">
          Marshals and drivers see the newest published version, never the working draft. Saves in the editor
          stay in the draft until you publish again; every published version keeps its own address.
        </p>
      </header>
      <FormMessage>
        {[
          ...(errors?.form ?? []),
          ...(errors?.intent ?? []),
          ...(errors?.publication ?? []),
          ...(errors?.link ?? []),
        ].join(" ")}
      </FormMessage>
      {shared ? (
        <section aria-labelledby="new-link" className="rounded-lg border border-pine-600 bg-pine-50 p-4">
          <h2 id="new-link" className="font-semibold">
            Share link to version {shared.versionNumber}
          </h2>
          <p className="mt-1 text-sm text-ink-700">
            Copy it now: it is shown only once. Anyone with it sees the published plan, the jumps and their
            verdicts, signed out, until you revoke it. It shows nothing about the club&apos;s members.
          </p>
          <label htmlFor="share-url" className="mt-2 block text-sm font-medium">
            Address to share
          </label>
          <input
            id="share-url"
            readOnly
            value={shared.url}
            className="mt-1 block w-full rounded-md border border-ink-300 bg-white px-3 py-2 font-mono text-sm"
            onFocus={(e) => e.currentTarget.select()}
          />
        </section>
      ) : null}
      <PublishForm
        layout={d.layout}
        saved={d.saved}
        current={d.publications.find((p) => p.withdrawnAt === null) ?? null}
        memberCount={d.memberCount}
        errors={errors}
        values={values}
      />
      <PublicationsTable
        layoutId={d.layout.id}
        publications={d.publications}
        errors={errors}
        values={values}
      />
      <ShareLinksTable links={d.links} />
    </article>
  );
}
