/**
 * Form schemas for clubs, members and invitations. Shared by the route actions (server) and the
 * forms (browser), so the messages a person sees beside a field come from one place.
 */
import { z } from "zod";
import { ROLES, type Role } from "~/lib/roles";
import { NAME_MAX_LENGTH, newPasswordField } from "./auth";

const ROLE_LIST = "director, marshal or driver";

/** A role picked from a select: one of the three club roles. */
export const roleField = z.enum(ROLES, { error: `Choose a role: ${ROLE_LIST}.` });

const idField = (what: string) =>
  z
    .string({ error: `Say which ${what} this is about.` })
    .trim()
    .min(1, { error: `Say which ${what} this is about.` })
    .max(64, { error: `That ${what} id is not valid.` });

export const clubNameField = z
  .string({ error: "Enter the club's name." })
  .trim()
  .min(2, { error: "Enter the club's name (at least 2 characters)." })
  .max(80, { error: "Keep the club's name to 80 characters or fewer." });

/** The address to invite, trimmed and lower-cased like account addresses. */
export const inviteEmailField = z
  .string({ error: "Enter the e-mail address to invite." })
  .trim()
  .toLowerCase()
  .min(1, { error: "Enter the e-mail address to invite." })
  .max(254, { error: "The e-mail address is too long (at most 254 characters)." })
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.org." }));

export const personNameField = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, { error: "Enter your name." })
  .max(NAME_MAX_LENGTH, { error: `The name is too long (at most ${NAME_MAX_LENGTH} characters).` });

/** Create a club: the creator becomes its first race director. */
export const createClubSchema = z.object({ name: clubNameField });

/** The members page's forms, told apart by their `intent` button. */
export const inviteSchema = z.object({
  intent: z.literal("invite"),
  email: inviteEmailField,
  role: roleField,
});
export const changeRoleSchema = z.object({
  intent: z.literal("change-role"),
  memberId: idField("member"),
  role: roleField,
});
export const removeMemberSchema = z.object({ intent: z.literal("remove"), memberId: idField("member") });
export const resendInvitationSchema = z.object({
  intent: z.literal("resend"),
  invitationId: idField("invitation"),
});
export const revokeInvitationSchema = z.object({
  intent: z.literal("revoke"),
  invitationId: idField("invitation"),
});

export const memberActionSchema = z.discriminatedUnion(
  "intent",
  [inviteSchema, changeRoleSchema, removeMemberSchema, resendInvitationSchema, revokeInvitationSchema],
  { error: "This form does not say what to do (intent): invite, change-role, remove, resend or revoke." },
);
export type MemberAction = z.infer<typeof memberActionSchema>;

/** Accept an invitation: a signed-in member joins; a signed-out visitor signs up with the invited address. */
export const acceptInvitationSchema = z.object({ intent: z.literal("join") });
export const acceptWithSignUpSchema = z
  .object({
    intent: z.literal("sign-up"),
    name: personNameField,
    password: newPasswordField,
    confirm: z.string({ error: "Type the password again." }).min(1, { error: "Type the password again." }),
  })
  .refine((v) => v.password === v.confirm, { error: "The two passwords do not match.", path: ["confirm"] });
export const invitationActionSchema = z.discriminatedUnion(
  "intent",
  [acceptInvitationSchema, acceptWithSignUpSchema],
  {
    error: "This form does not say what to do (intent): join or sign-up.",
  },
);

export const MEMBER_SORTS = ["name", "email", "role", "joined"] as const;
export type MemberSort = (typeof MEMBER_SORTS)[number];

/**
 * The members table's sort and filter, read from GET query parameters so the table works without
 * JavaScript. Empty parameters take their defaults.
 */
export const memberQuerySchema = z.object({
  sort: z.enum(MEMBER_SORTS, { error: "Sort by name, email, role or joined." }).default("name"),
  dir: z.enum(["asc", "desc"], { error: "Sort direction must be asc or desc." }).default("asc"),
  role: z.enum(["all", ...ROLES], { error: `Filter by role: all, ${ROLE_LIST}.` }).default("all"),
  q: z.string().trim().max(100, { error: "Keep the search text to 100 characters or fewer." }).default(""),
});
export type MemberQuery = z.infer<typeof memberQuerySchema>;
export const DEFAULT_MEMBER_QUERY: MemberQuery = { sort: "name", dir: "asc", role: "all", q: "" };

/** Reads the members table's query parameters; an empty value counts as absent. */
export function parseMemberQuery(
  params: URLSearchParams,
): { ok: true; query: MemberQuery } | { ok: false; query: MemberQuery; errors: Record<string, string[]> } {
  const raw: Record<string, string> = {};
  for (const key of ["sort", "dir", "role", "q"]) {
    const value = params.get(key);
    if (value !== null && value !== "") raw[key] = value;
  }
  const result = memberQuerySchema.safeParse(raw);
  if (result.success) return { ok: true, query: result.data };
  const errors: Record<string, string[]> = {};
  for (const issue of result.error.issues) (errors[String(issue.path[0])] ??= []).push(issue.message);
  // Keep the parts that were valid; only the wrong ones fall back to their defaults.
  const query = { ...DEFAULT_MEMBER_QUERY };
  for (const key of Object.keys(raw) as (keyof MemberQuery)[]) {
    if (errors[key]) continue;
    const one = memberQuerySchema.shape[key].safeParse(raw[key]);
    if (one.success) (query as Record<string, unknown>)[key] = one.data;
  }
  return { ok: false, query, errors };
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}
