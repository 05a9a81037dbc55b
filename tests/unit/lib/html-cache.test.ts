import { randomBytes } from "node:crypto";
import { gunzipSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import {
  keepPage,
  markUnchanging,
  NONCE_SLOT,
  pageGzip,
  pageHtml,
  pageKey,
  pageResponse,
  recallPage,
} from "~/lib/html-cache.server";

const nonce = () => randomBytes(16).toString("base64");

/** A page as the server entry renders it: the placeholder nonce on each inline script. */
function rendered(rows: number): Buffer {
  const body = Array.from(
    { length: rows },
    (_, i) => `<tr><td>Jump ${i}</td><td>${(i * 0.37).toFixed(2)} s</td></tr>`,
  );
  return Buffer.from(
    `<!DOCTYPE html><html><head><script nonce="${NONCE_SLOT}">window.a=1</script></head>` +
      `<body><table>${body.join("")}</table><script nonce="${NONCE_SLOT}">window.b=2</script>` +
      `<script type="module" nonce="${NONCE_SLOT}">import("/x.js")</script></body></html>`,
  );
}

describe("the rendered-page cache", () => {
  it("gives every answer its own nonce, plain and gzip-compressed, from one rendering", () => {
    const html = rendered(3000);
    const page = keepPage("k-nonce", html);
    const [a, b] = [nonce(), nonce()];
    const plainA = pageHtml(page, a).toString("utf8");
    expect(plainA).toBe(html.toString("utf8").split(NONCE_SLOT).join(a));
    expect(plainA).not.toContain(NONCE_SLOT);
    expect(plainA.split(a)).toHaveLength(4);
    const zipped = pageGzip(page, b);
    expect(gunzipSync(zipped).toString("utf8")).toBe(html.toString("utf8").split(NONCE_SLOT).join(b));
    // Compressed once, not stored: far smaller than the page.
    expect(zipped.byteLength).toBeLessThan(html.byteLength / 4);
    expect(recallPage("k-nonce")).toBe(page);
  });

  it("answers gzip only to a client that accepts it, never with another answer's nonce", async () => {
    const page = keepPage("k-answer", rendered(10));
    const one = nonce();
    const zipped = pageResponse(
      new Request("http://x/", { headers: { "Accept-Encoding": "gzip, br" } }),
      page,
      one,
      200,
      new Headers(),
    );
    expect(zipped.headers.get("Content-Encoding")).toBe("gzip");
    const text = gunzipSync(new Uint8Array(await zipped.arrayBuffer())).toString("utf8");
    expect(text).toContain(`nonce="${one}"`);
    const plain = pageResponse(new Request("http://x/"), page, nonce(), 200, new Headers());
    expect(plain.headers.get("Content-Encoding")).toBeNull();
    expect(await plain.text()).not.toContain(one);
  });

  it("keys pages by their data, hashing unchanging values once", () => {
    const data = markUnchanging({ jumps: [1, 2, 3] });
    const key = (loaderData: unknown, url = "/layouts/a") =>
      pageKey({ build: "b1", url, status: 200, loaderData });
    expect(key({ page: data })).toBe(key({ page: data }));
    expect(key({ page: data })).not.toBe(key({ page: { jumps: [1, 2, 4] } }));
    expect(key({ page: data }, "/layouts/a?skill=expert")).not.toBe(key({ page: data }));
  });
});
