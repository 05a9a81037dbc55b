import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/invitation";
import { getUser, requireUser } from "~/auth/permissions.server";
import { createUserSession, redirectWithNotice } from "~/auth/session.server";
import {
  acceptInvitation,
  acceptWithSignUp,
  emailMismatchMessage,
  findInvitation,
} from "~/clubs/invitation-accept.server";
import { formValues } from "~/clubs/form-values.server";
import { isRuleError, refusal } from "~/clubs/rule-error.server";
import {
  InvitationCard,
  InvitationProblem,
  JoinForm,
  SignUpToJoin,
} from "~/components/club-members/invitation-views";
import { isMember } from "~/clubs/members.server";
import { parseForm } from "~/lib/forms";
import { invitationActionSchema } from "~/lib/schemas/clubs";

export const meta: Route.MetaFunction = () => [
  { title: "Invitation · Loftline" },
  { name: "robots", content: "noindex" },
];

/**
 * What an invitation link shows: the club, role and inviter, then one of: join (signed in with
 * the invited address), sign up (signed out), a 403 (signed in as someone else), or a 404/410
 * for links that were withdrawn, replaced, used or have expired (docs/decisions/0352).
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  let invitation;
  try {
    invitation = await findInvitation(params.token);
  } catch (error) {
    if (!isRuleError(error)) throw error;
    return data({ state: "invalid" as const, message: error.message }, { status: error.status });
  }
  const { id: _id, ...shown } = invitation;
  const user = await getUser(request);
  if (!user) return { state: "signed-out" as const, invitation: shown };
  if (user.email !== invitation.email) {
    return data(
      {
        state: "other-account" as const,
        invitation: shown,
        message: emailMismatchMessage(invitation.email, user.email),
      },
      { status: 403 },
    );
  }
  const member = await isMember(invitation.club.id, user.id);
  return { state: member ? ("member" as const) : ("join" as const), invitation: shown };
}

export async function action({ request, params }: Route.ActionArgs) {
  const formData = await request.formData();
  const values = formValues(formData);
  const parsed = parseForm(invitationActionSchema, formData);
  if (!parsed.ok) return data({ errors: parsed.errors, values }, { status: 400 });
  try {
    if (parsed.data.intent === "join") {
      const user = await requireUser(request);
      const invitation = await acceptInvitation(params.token, user);
      throw await redirectWithNotice(
        request,
        `/clubs/${invitation.club.id}`,
        `Welcome to ${invitation.club.name}.`,
      );
    }
    const signedIn = await getUser(request);
    if (signedIn) {
      return data(
        {
          errors: {
            form: [
              `You are already signed in as ${signedIn.email}. Sign out first to create another account.`,
            ],
          },
          values,
        },
        { status: 409 },
      );
    }
    const { invitation, userId } = await acceptWithSignUp(params.token, parsed.data);
    return await createUserSession(
      request,
      userId,
      `/clubs/${invitation.club.id}`,
      `Welcome to ${invitation.club.name}. Your account is ready.`,
    );
  } catch (error) {
    if (error instanceof Response) throw error;
    return refusal(error, values);
  }
}

export default function Invitation({ loaderData, actionData, params }: Route.ComponentProps) {
  const busy = useNavigation().state === "submitting";
  const errors = actionData?.errors;
  if (loaderData.state === "invalid") return <InvitationProblem message={loaderData.message} />;
  const { invitation } = loaderData;
  const signInHref = `/sign-in?redirectTo=${encodeURIComponent(`/invitations/${params.token}`)}`;
  return (
    <InvitationCard invitation={invitation} formError={errors?.form?.join(" ")}>
      {loaderData.state === "join" ? <JoinForm busy={busy} clubName={invitation.club.name} /> : null}
      {loaderData.state === "member" ? (
        <p className="text-sm">
          You are already a member.{" "}
          <Link to={`/clubs/${invitation.club.id}`} className="text-pine-700 underline">
            Go to {invitation.club.name}
          </Link>
        </p>
      ) : null}
      {loaderData.state === "other-account" ? (
        <div className="space-y-3 text-sm">
          <p role="alert" className="text-danger-700">
            {loaderData.message}
          </p>
          <Form method="post" action={`/sign-out`}>
            <button type="submit" className="text-pine-700 underline">
              Sign out
            </button>
          </Form>
        </div>
      ) : null}
      {loaderData.state === "signed-out" ? (
        <SignUpToJoin
          email={invitation.email}
          errors={errors}
          values={actionData?.values}
          busy={busy}
          signInHref={signInHref}
        />
      ) : null}
    </InvitationCard>
  );
}
