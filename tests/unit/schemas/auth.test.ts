import { describe, expect, it } from "vitest";
import { forgotPasswordSchema, resetPasswordSchema, signInSchema, signUpSchema } from "~/lib/schemas/auth";
import { parseForm } from "~/lib/forms";

function form(fields: Record<string, string>) {
  const fd = new FormData();
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return fd;
}

const goodSignUp = {
  name: "  Dana Whitlock ",
  email: "  Dana@Kestrel.Example ",
  password: "kestrel-director",
  confirm: "kestrel-director",
};

describe("sign-up schema", () => {
  it("accepts a good form and normalises the name and e-mail address", () => {
    const r = parseForm(signUpSchema, form(goodSignUp));
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.data.email).toBe("dana@kestrel.example");
      expect(r.data.name).toBe("Dana Whitlock");
      expect(r.data.password).toBe("kestrel-director");
    }
  });

  it("names each missing field", () => {
    const r = parseForm(signUpSchema, form({}));
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors.name).toEqual(["Enter your name."]);
      expect(r.errors.email).toEqual(["Enter your e-mail address."]);
      expect(r.errors.password).toEqual(["Choose a password."]);
      expect(r.errors.confirm).toEqual(["Type the password again."]);
    }
  });

  it("refuses a password of 9 characters and accepts one of 10", () => {
    const short = parseForm(
      signUpSchema,
      form({ ...goodSignUp, password: "123456789", confirm: "123456789" }),
    );
    expect(short.ok).toBe(false);
    if (!short.ok) expect(short.errors.password?.[0]).toMatch(/at least 10 characters/);
    const ten = parseForm(
      signUpSchema,
      form({ ...goodSignUp, password: "1234567890", confirm: "1234567890" }),
    );
    expect(ten.ok).toBe(true);
  });

  it("refuses passwords longer than bcrypt reads (72 bytes), counting bytes not letters", () => {
    const ascii72 = "a".repeat(72);
    expect(parseForm(signUpSchema, form({ ...goodSignUp, password: ascii72, confirm: ascii72 })).ok).toBe(
      true,
    );
    const accented = "é".repeat(40); // 40 letters, 80 bytes in UTF-8
    const r = parseForm(signUpSchema, form({ ...goodSignUp, password: accented, confirm: accented }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.password?.[0]).toMatch(/too long/);
  });

  it("refuses a password of only spaces", () => {
    const spaces = " ".repeat(12);
    const r = parseForm(signUpSchema, form({ ...goodSignUp, password: spaces, confirm: spaces }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.password?.[0]).toMatch(/only spaces/);
  });

  it("puts a mismatch beside the confirmation field", () => {
    const r = parseForm(signUpSchema, form({ ...goodSignUp, confirm: "kestrel-directoR" }));
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors.confirm).toEqual(["The two passwords do not match."]);
      expect(r.errors.password).toBeUndefined();
    }
  });

  it("refuses a malformed e-mail address and a blank name", () => {
    const r = parseForm(signUpSchema, form({ ...goodSignUp, email: "dana at kestrel", name: "   " }));
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors.email?.[0]).toMatch(/valid e-mail address/);
      expect(r.errors.name).toEqual(["Enter your name."]);
    }
  });

  it("refuses a name longer than 80 characters", () => {
    const r = parseForm(signUpSchema, form({ ...goodSignUp, name: "x".repeat(81) }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.name?.[0]).toMatch(/too long/);
  });
});

describe("sign-in schema", () => {
  it("accepts any non-empty password (old accounts may predate the length rule)", () => {
    const r = parseForm(signInSchema, form({ email: "DEE@kestrel.example", password: "x" }));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.data.email).toBe("dee@kestrel.example");
  });

  it("names the e-mail and password fields when empty", () => {
    const r = parseForm(signInSchema, form({ email: "", password: "" }));
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors.email).toEqual(["Enter your e-mail address."]);
      expect(r.errors.password).toEqual(["Enter your password."]);
    }
  });

  it("keeps redirectTo as given (safeRedirect checks it later)", () => {
    const r = parseForm(signInSchema, form({ email: "a@b.org", password: "p", redirectTo: "/clubs/1" }));
    expect(r.ok && r.data.redirectTo).toBe("/clubs/1");
  });
});

describe("forgot and reset schemas", () => {
  it("forgot: needs a valid e-mail address", () => {
    expect(parseForm(forgotPasswordSchema, form({ email: "marco@kestrel.example" })).ok).toBe(true);
    const r = parseForm(forgotPasswordSchema, form({ email: "marco@" }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.email?.[0]).toMatch(/valid e-mail address/);
  });

  it("reset: applies the new-password rules and the match check", () => {
    expect(
      parseForm(resetPasswordSchema, form({ password: "a new password", confirm: "a new password" })).ok,
    ).toBe(true);
    const short = parseForm(resetPasswordSchema, form({ password: "short", confirm: "short" }));
    expect(!short.ok && short.errors.password?.[0]).toMatch(/at least 10/);
    const differ = parseForm(
      resetPasswordSchema,
      form({ password: "a new password", confirm: "another one!" }),
    );
    expect(!differ.ok && differ.errors.confirm?.[0]).toMatch(/do not match/);
  });
});
