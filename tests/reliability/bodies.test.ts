/**
 * Every route of app/routes.ts (new routes are covered without listing them here) gets bodies
 * just over its limit, sent whole and in chunks, and malformed bodies: the answer is the right
 * 4xx with a message, never a 500. Sent as the demo club's director, so that routes which check
 * the user first still reach their body.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { bodyRuleFor, type BodyRule } from "../../server/body-rules";
import { appRoutes, demoIds, fillPath, send, signIn, type Answer } from "./client";

const director = DEMO_ACCOUNTS.find((a) => a.role === "director")!;
let cookie = "";
let ids: Record<string, string> = {};

beforeAll(async () => {
  cookie = await signIn(director.email, director.password);
  ids = await demoIds();
});

/** A content type the rule accepts, and how such a body begins, for the over-the-limit bodies. */
function acceptedType(rule: BodyRule): { type: string; prefix: string } {
  if (rule.accepts.includes("urlencoded"))
    return { type: "application/x-www-form-urlencoded", prefix: "name=" };
  if (rule.accepts.includes("json")) return { type: "application/json", prefix: '{"document":"' };
  return {
    type: "multipart/form-data; boundary=----loftline",
    prefix:
      '------loftline\r\nContent-Disposition: form-data; name="photo"; filename="big.png"\r\n' +
      "Content-Type: image/png\r\n\r\n",
  };
}

const routes = appRoutes();

it("finds the routes of app/routes.ts", () => {
  expect(routes.length).toBeGreaterThan(20);
  expect(routes.map((r) => r.id)).toContain("routes/layout-photo");
});

describe.each(routes)("$id ($path)", (route) => {
  const rule = bodyRuleFor(route.id);

  it.each(["page", "data"] as const)(
    "%s request: over the limit and malformed bodies get 4xx",
    async (kind) => {
      const base = fillPath(route.path, ids);
      const target = kind === "page" ? base : base === "/" ? "/_root.data" : `${base}.data`;
      const as = (headers: Record<string, string>) => ({ Cookie: cookie, ...headers });
      const check = (what: string, answer: Answer, expected: number[]) => {
        expect(answer.status, `${what} → ${answer.status} ${answer.text.slice(0, 200)}`).toBeOneOf(expected);
        expect(answer.text.length, `${what} gives a message`).toBeGreaterThan(0);
      };
      const { type, prefix } = acceptedType(rule);
      const over = rule.maxBytes + 1;
      const whole = Buffer.alloc(over, 0x61);
      whole.write(prefix);

      check(
        "whole body one byte over",
        await send(target, { headers: as({ "Content-Type": type }), body: whole }),
        [413],
      );
      check(
        "chunked body one byte over",
        await send(target, {
          headers: as({ "Content-Type": type }),
          prefix,
          chunkedBytes: over - prefix.length,
        }),
        [413],
      );
      check(
        "plain text",
        await send(target, { headers: as({ "Content-Type": "text/plain" }), body: "hello" }),
        [415],
      );
      check("no Content-Type", await send(target, { headers: as({}), body: "a=1" }), [415]);
      check(
        "gzip-encoded form",
        await send(target, {
          headers: as({ "Content-Type": type, "Content-Encoding": "gzip" }),
          body: "a=1",
        }),
        [415],
      );

      const json = rule.accepts.includes("json");
      check(
        "broken JSON",
        await send(target, { headers: as({ "Content-Type": "application/json" }), body: '{"document": ' }),
        json ? [400] : [415],
      );
      const multipart = rule.accepts.includes("multipart");
      check(
        "multipart without boundary",
        await send(target, { headers: as({ "Content-Type": "multipart/form-data" }), body: "a=1" }),
        multipart ? [400] : [415],
      );
      check(
        "multipart that is not",
        await send(target, {
          headers: as({ "Content-Type": "multipart/form-data; boundary=zz" }),
          body: "no parts here",
        }),
        multipart ? [400] : [415],
      );

      // Odd but well-formed: reaches the route itself (signed out, from an address of its own so
      // nothing here counts against the others); it may refuse, never fail.
      const odd = await send(target, {
        headers: { "Content-Type": "application/x-www-form-urlencoded" },
        body: "email=%zz&password=%&intent=%E2%82&&=",
        from: "127.0.0.9",
      });
      expect(odd.status, `odd form → ${odd.status} ${odd.text.slice(0, 200)}`).toBeLessThan(500);
    },
  );
});
