import { data } from "react-router";
import type { Route } from "./+types/club-members";
import { requireClubRole } from "~/auth/permissions.server";
import { redirectWithNotice } from "~/auth/session.server";
import { formValues } from "~/clubs/form-values.server";
import {
  listPendingInvitations,
  inviteMember,
  resendInvitation,
  revokeInvitation,
} from "~/clubs/invitations.server";
import { changeMemberRole, listMembers, removeMember, roleChangeNotice } from "~/clubs/members.server";
import { refusal } from "~/clubs/rule-error.server";
import { InviteForm, PendingInvitations } from "~/components/club-members/invitations";
import { MemberFilters, MembersTable } from "~/components/club-members/members-table";
import { FormMessage } from "~/components/ui/form";
import { parseForm } from "~/lib/forms";
import { memberActionSchema, parseMemberQuery } from "~/lib/schemas/clubs";

export const meta: Route.MetaFunction = () => [{ title: "Members · Loftline" }];

/**
 * The members table, sorted and filtered by GET parameters (works without JavaScript). Directors
 * also see e-mail addresses and the invitations waiting; a bad parameter is named with a 400.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const { club, role, user } = await requireClubRole(request, params.clubId);
  const isDirector = role === "director";
  const parsed = parseMemberQuery(new URL(request.url).searchParams);
  const [members, invitations] = await Promise.all([
    listMembers(club.id, parsed.query, { withEmail: isDirector }),
    isDirector ? listPendingInvitations(club.id) : Promise.resolve([]),
  ]);
  const body = {
    club,
    isDirector,
    me: user.id,
    query: parsed.query,
    members,
    invitations,
    queryErrors: parsed.ok ? {} : parsed.errors,
  };
  return data(body, { status: parsed.ok ? 200 : 400 });
}

/** Director-only: invite, change a role, remove a member, send an invitation again, withdraw it. */
export async function action({ request, params }: Route.ActionArgs) {
  const { club, user } = await requireClubRole(request, params.clubId, "director");
  const formData = await request.formData();
  const values = formValues(formData);
  const parsed = parseForm(memberActionSchema, formData);
  if (!parsed.ok) return data({ errors: parsed.errors, values }, { status: 400 });
  const input = parsed.data;
  const url = new URL(request.url);
  const back = `/clubs/${club.id}/members${url.search}`;
  const inviter = { id: user.id, name: user.name };
  let notice: string;
  try {
    switch (input.intent) {
      case "invite": {
        await inviteMember({ club, inviter, email: input.email, role: input.role });
        notice = `Invitation sent to ${input.email}.`;
        break;
      }
      case "change-role": {
        const changed = await changeMemberRole(club.id, input.memberId, input.role);
        notice = roleChangeNotice(changed.name, changed.role);
        break;
      }
      case "remove": {
        const removed = await removeMember(club.id, input.memberId);
        if (removed.userId === user.id) {
          throw await redirectWithNotice(request, "/clubs", `You have left ${club.name}.`);
        }
        notice = `${removed.name} is no longer a member of ${club.name}.`;
        break;
      }
      case "resend": {
        const sent = await resendInvitation({ club, inviter, invitationId: input.invitationId });
        notice = `Invitation sent again to ${sent.email}, with a new link.`;
        break;
      }
      case "revoke": {
        const revoked = await revokeInvitation(club.id, input.invitationId);
        notice = `The invitation to ${revoked.email} is withdrawn; its link no longer works.`;
        break;
      }
    }
  } catch (error) {
    if (error instanceof Response) throw error;
    return refusal(error, values);
  }
  throw await redirectWithNotice(request, back, notice);
}

export default function ClubMembers({ loaderData, actionData }: Route.ComponentProps) {
  const { club, isDirector, me, query, members, invitations, queryErrors } = loaderData;
  const errors = actionData?.errors;
  const values = actionData?.values;
  const inviteErrors = values?.intent === "invite" ? errors : undefined;
  // Errors that belong to no row and no field shown here (a form without its intent, say).
  const general =
    errors && !inviteErrors && !values?.memberId && !values?.invitationId ? Object.values(errors).flat() : [];
  return (
    <div className="space-y-8">
      <section aria-labelledby="members-heading">
        <h2 id="members-heading" className="text-lg font-semibold">
          Members
        </h2>
        <FormMessage>{general.join(" ")}</FormMessage>
        <MemberFilters query={query} errors={queryErrors} withEmail={isDirector} />
        <MembersTable
          clubId={club.id}
          members={members}
          query={query}
          isDirector={isDirector}
          me={me}
          rowError={values?.memberId ? { memberId: values.memberId, errors } : undefined}
        />
      </section>
      {isDirector ? (
        <>
          <InviteForm errors={inviteErrors} values={inviteErrors ? values : undefined} />
          <PendingInvitations
            invitations={invitations}
            rowError={values?.invitationId ? { invitationId: values.invitationId, errors } : undefined}
          />
        </>
      ) : null}
    </div>
  );
}
