import { describe, expect, it } from "vitest";
import {
  createClubSchema,
  invitationActionSchema,
  memberActionSchema,
  parseMemberQuery,
} from "~/lib/schemas/clubs";
import { parseForm } from "~/lib/forms";

const form = (fields: Record<string, string>) => {
  const fd = new FormData();
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return fd;
};

describe("createClubSchema", () => {
  it("trims the name and keeps it between 2 and 80 characters", () => {
    expect(createClubSchema.parse({ name: "  Kestrel Valley  " })).toEqual({ name: "Kestrel Valley" });
    expect(parseForm(createClubSchema, form({ name: "K" }))).toEqual({
      ok: false,
      errors: { name: ["Enter the club's name (at least 2 characters)."] },
    });
    expect(parseForm(createClubSchema, form({ name: "x".repeat(80) })).ok).toBe(true);
    expect(parseForm(createClubSchema, form({ name: "x".repeat(81) })).ok).toBe(false);
  });
});

describe("memberActionSchema", () => {
  it("reads an invitation with a lower-cased, trimmed address and a role", () => {
    const r = parseForm(
      memberActionSchema,
      form({ intent: "invite", email: "  Rae@Track.Example ", role: "marshal" }),
    );
    expect(r).toEqual({ ok: true, data: { intent: "invite", email: "rae@track.example", role: "marshal" } });
  });

  it("names each bad field: address, role, member id", () => {
    const invite = parseForm(memberActionSchema, form({ intent: "invite", email: "rae@", role: "owner" }));
    expect(invite).toEqual({
      ok: false,
      errors: {
        email: ["Enter a valid e-mail address, like name@example.org."],
        role: ["Choose a role: director, marshal or driver."],
      },
    });
    const change = parseForm(
      memberActionSchema,
      form({ intent: "change-role", memberId: " ", role: "driver" }),
    );
    expect(change).toEqual({ ok: false, errors: { memberId: ["Say which member this is about."] } });
    const missing = parseForm(memberActionSchema, form({ intent: "invite", role: "driver" }));
    expect(missing).toEqual({ ok: false, errors: { email: ["Enter the e-mail address to invite."] } });
  });

  it("refuses a form without a known intent, naming the field", () => {
    const r = parseForm(memberActionSchema, form({ intent: "promote", memberId: "m1" }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.intent?.[0]).toMatch(/invite, change-role, remove, resend or revoke/);
  });

  it("accepts each director action with its own field", () => {
    const actions: Record<string, string>[] = [
      { intent: "remove", memberId: "m1" },
      { intent: "resend", invitationId: "i1" },
      { intent: "revoke", invitationId: "i1" },
      { intent: "change-role", memberId: "m1", role: "director" },
    ];
    for (const fields of actions) {
      expect(parseForm(memberActionSchema, form(fields))).toEqual({ ok: true, data: fields });
    }
  });
});

describe("invitationActionSchema", () => {
  it("signs up with a name and a confirmed password of at least 10 characters", () => {
    const ok = parseForm(
      invitationActionSchema,
      form({ intent: "sign-up", name: " Ana ", password: "ten chars!", confirm: "ten chars!" }),
    );
    expect(ok).toEqual({
      ok: true,
      data: { intent: "sign-up", name: "Ana", password: "ten chars!", confirm: "ten chars!" },
    });
    const bad = parseForm(
      invitationActionSchema,
      form({ intent: "sign-up", name: "", password: "short", confirm: "short" }),
    );
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.errors.name).toEqual(["Enter your name."]);
      expect(bad.errors.password?.[0]).toMatch(/at least 10 characters/);
    }
    const mismatch = parseForm(
      invitationActionSchema,
      form({ intent: "sign-up", name: "Ana", password: "ten chars!", confirm: "ten chars?" }),
    );
    expect(mismatch).toEqual({ ok: false, errors: { confirm: ["The two passwords do not match."] } });
  });

  it("joins with nothing but the intent", () => {
    expect(parseForm(invitationActionSchema, form({ intent: "join" }))).toEqual({
      ok: true,
      data: { intent: "join" },
    });
  });
});

describe("parseMemberQuery", () => {
  it("takes defaults for absent or empty parameters", () => {
    expect(parseMemberQuery(new URLSearchParams("q=&role="))).toEqual({
      ok: true,
      query: { sort: "name", dir: "asc", role: "all", q: "" },
    });
  });

  it("reads every parameter and trims the search text", () => {
    expect(parseMemberQuery(new URLSearchParams("sort=joined&dir=desc&role=driver&q=%20sam%20"))).toEqual({
      ok: true,
      query: { sort: "joined", dir: "desc", role: "driver", q: "sam" },
    });
  });

  it("names each bad parameter and keeps the good ones", () => {
    const r = parseMemberQuery(new URLSearchParams("sort=age&dir=sideways&role=marshal&q=x"));
    expect(r).toEqual({
      ok: false,
      query: { sort: "name", dir: "asc", role: "marshal", q: "x" },
      errors: {
        sort: ["Sort by name, email, role or joined."],
        dir: ["Sort direction must be asc or desc."],
      },
    });
  });
});
