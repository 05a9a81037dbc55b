import { afterEach, describe, expect, it } from "vitest";
import { useTestDatabase } from "./helpers/db";
import { extractLink, useFakeSmtp, waitForMail } from "./helpers/mail";
import { args, formRequest, run } from "./helpers/requests";
import { sendMail } from "~/mail/mail.server";
import { listOutbox } from "~/mail/outbox.server";
import * as outbox from "~/routes/outbox";

useTestDatabase();
useFakeSmtp();

type Listed = { messages: { to: string; subject: string; text: string; from: string }[] };
const saved = { node: process.env.NODE_ENV, demo: process.env.LOFTLINE_DEMO };

describe("the fake SMTP server and the outbox page", () => {
  afterEach(() => {
    process.env.NODE_ENV = saved.node;
    if (saved.demo === undefined) delete process.env.LOFTLINE_DEMO;
    else process.env.LOFTLINE_DEMO = saved.demo;
  });

  it("keeps each message sent over SMTP with its recipients, sender, text and HTML", async () => {
    await sendMail({
      to: "Marco@Kestrel.example",
      subject: "Marshal briefing for Sunday",
      text: "Points 1 to 4. Plan: http://localhost:3000/clubs/k/layouts",
      html: "<p>Points 1 to 4.</p>",
    });
    const m = await waitForMail("marco@kestrel.example", "Marshal briefing");
    expect(m.to).toEqual(["marco@kestrel.example"]);
    expect(m.from).toContain("no-reply@loftline.local");
    expect(m.html).toBe("<p>Points 1 to 4.</p>");
    expect(extractLink(m.text)).toBe("http://localhost:3000/clubs/k/layouts");
    expect(Number.isNaN(Date.parse(m.date))).toBe(false);
  });

  it("lists messages newest first", async () => {
    await sendMail({ to: "dee@kestrel.example", subject: "First", text: "one" });
    await waitForMail("dee@kestrel.example", "First");
    await sendMail({ to: "dee@kestrel.example", subject: "Second", text: "two" });
    await waitForMail("dee@kestrel.example", "Second");
    const r = await run(() => outbox.loader());
    expect(r.status).toBe(200);
    const subjects = (r.data as Listed).messages.map((m) => m.subject);
    expect(subjects.indexOf("Second")).toBe(0);
    expect(subjects.indexOf("First")).toBe(1);
    expect((r.data as Listed).messages[0].to).toBe("dee@kestrel.example");
  });

  it("clears every message on request, and refuses an unknown intent with 400", async () => {
    const bad = await run(() => outbox.action(args(formRequest("/outbox", { intent: "delete-everything" }))));
    expect(bad.status).toBe(400);
    expect((await listOutbox()).length).toBeGreaterThan(0);
    const r = await run(() => outbox.action(args(formRequest("/outbox", { intent: "clear" }))));
    expect(r.status).toBe(302);
    expect(r.location).toBe("/outbox");
    expect(await listOutbox()).toEqual([]);
  });

  it("does not exist in production (404 for the page and its action)", async () => {
    process.env.NODE_ENV = "production";
    delete process.env.LOFTLINE_DEMO;
    expect((await run(() => outbox.loader())).status).toBe(404);
    expect((await run(() => outbox.action(args(formRequest("/outbox", { intent: "clear" }))))).status).toBe(
      404,
    );
    process.env.LOFTLINE_DEMO = "1"; // the demo runs a production build with the development tools on
    expect((await run(() => outbox.loader())).status).toBe(200);
  });
});
