import { data } from "react-router";
import type { Route } from "./+types/save";
import { requireCsrf } from "~/auth/csrf.server";
import { requireUser } from "~/auth/guards.server";
import { setSaved } from "~/desk/saved.server";

// POST /details/:slug/save — a member saves (intent=save) or forgets (intent=unsave) a published detail.
export async function action({ request, params, context }: Route.ActionArgs) {
  const user = requireUser(request, context);
  const form = await requireCsrf(request);
  const saved = await setSaved(user.id, params.slug, form.get("intent") !== "unsave");
  if (saved === null) throw data({ message: "No published detail has this address." }, { status: 404 });
  return { saved };
}
