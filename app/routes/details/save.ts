import { parseWithZod } from "@conform-to/zod/v4";
import { data } from "react-router";
import type { Route } from "./+types/save";
import { requireCsrf } from "~/auth/csrf.server";
import { requireUser } from "~/auth/guards.server";
import { saveDetailSchema } from "~/desk/saved-form";
import { setSaved } from "~/desk/saved.server";

// POST /details/:slug/save — a member saves (intent=save) or forgets (intent=unsave) a published detail.
export async function action({ request, params, context }: Route.ActionArgs) {
  const user = requireUser(request, context);
  const form = await requireCsrf(request);
  const submission = parseWithZod(form, { schema: saveDetailSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const saved = await setSaved(user.id, params.slug, submission.value.intent === "save");
  if (saved === null) throw data({ message: "No published detail has this address." }, { status: 404 });
  return { saved };
}
