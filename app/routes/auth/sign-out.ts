import { redirect } from "react-router";
import type { Route } from "./+types/sign-out";
import { requireCsrf } from "~/auth/csrf.server";
import { endSession } from "~/auth/session.server";

// POST only: a link or an image tag must never be able to sign someone out.
export async function action({ request }: Route.ActionArgs) {
  await requireCsrf(request);
  return redirect("/", { headers: { "Set-Cookie": await endSession(request) } });
}
