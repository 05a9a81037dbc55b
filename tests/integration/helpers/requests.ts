import { sessionStorage } from "~/auth/session.server";

const BASE = "http://localhost";

/** A cookie header value that signs the given user in. */
export async function sessionCookie(userId: string): Promise<string> {
  const session = await sessionStorage().getSession();
  session.set("userId", userId);
  const setCookie = await sessionStorage().commitSession(session);
  return setCookie.split(";")[0];
}

export function getRequest(pathname: string, cookie?: string, headers: Record<string, string> = {}) {
  return new Request(BASE + pathname, { headers: { ...(cookie ? { Cookie: cookie } : {}), ...headers } });
}

/** A POST with an urlencoded form body, as a browser's form submission sends it. */
export function formRequest(
  pathname: string,
  fields: Record<string, string>,
  cookie?: string,
  headers: Record<string, string> = {},
) {
  return new Request(BASE + pathname, {
    method: "POST",
    headers: {
      "Content-Type": "application/x-www-form-urlencoded",
      ...(cookie ? { Cookie: cookie } : {}),
      ...headers,
    },
    body: new URLSearchParams(fields).toString(),
  });
}

export function jsonRequest(pathname: string, body: unknown, cookie?: string, method = "POST") {
  return new Request(BASE + pathname, {
    method,
    headers: { "Content-Type": "application/json", ...(cookie ? { Cookie: cookie } : {}) },
    body: typeof body === "string" ? body : JSON.stringify(body),
  });
}

export type Outcome = { status: number; data: unknown; headers: Headers; location: string | null };

/**
 * Runs a loader or action and normalises what it returns or throws (Response, data() result or
 * plain object) into status + data, so tests can assert on either path.
 */
export async function run(fn: () => unknown): Promise<Outcome> {
  let value: unknown;
  try {
    value = await fn();
  } catch (thrown) {
    value = thrown;
    if (!(thrown instanceof Response) && !isDataWithResponseInit(thrown)) throw thrown;
  }
  if (value instanceof Response) {
    const text = await value.text();
    let data: unknown = text;
    try {
      data = JSON.parse(text);
    } catch {
      /* plain text body */
    }
    return { status: value.status, data, headers: value.headers, location: value.headers.get("Location") };
  }
  if (isDataWithResponseInit(value)) {
    const headers = new Headers(value.init?.headers);
    return {
      status: value.init?.status ?? 200,
      data: value.data,
      headers,
      location: headers.get("Location"),
    };
  }
  return { status: 200, data: value, headers: new Headers(), location: null };
}

type DataWithInit = { type: "DataWithResponseInit"; data: unknown; init: ResponseInit | null };
function isDataWithResponseInit(v: unknown): v is DataWithInit {
  return typeof v === "object" && v !== null && (v as { type?: string }).type === "DataWithResponseInit";
}

/** Route args for a loader/action call; `context` is what the server entry would give. */
export function args(
  request: Request,
  params: Record<string, string> = {},
  context: { clientAddress?: string | null } = {},
) {
  return { request, params, context } as never;
}
