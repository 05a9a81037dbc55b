import { redirect } from "react-router";
import type { Route } from "./+types/sign-out";
import { destroyUserSession } from "~/auth/session.server";

// Signing out changes state, so it is a POST (a link or an image tag cannot sign anyone out).
export async function action({ request }: Route.ActionArgs) {
  return destroyUserSession(request, "/");
}

export async function loader() {
  throw redirect("/");
}
