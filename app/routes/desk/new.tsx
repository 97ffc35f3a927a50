import { parseWithZod } from "@conform-to/zod/v4";
import { data, redirect, type ShouldRevalidateFunctionArgs } from "react-router";
import type { Route } from "./+types/new";
import { requireCsrf } from "~/auth/csrf.server";
import { userContext } from "~/auth/guards.server";
import { DraftEditor } from "~/components/desk/draft-editor";
import { BLANK_LAYER, draftPostSchema, type DraftFormValues } from "~/desk/draft-form";
import { editorChoices } from "~/desk/editor-data.server";
import { createDetailDraft } from "~/desk/revisions.server";
import { unitsFor } from "~/preferences/units.server";

export const meta: Route.MetaFunction = () => [{ title: "New detail — Desk — Dryside" }];

const STARTER_BODY =
  "## Why it works\n\n\n## Install sequence\n\n1. \n\n## Cautions\n\n- Confirm with the code adopted where you build and a licensed professional where one is required.\n";

const EMPTY: DraftFormValues = {
  slug: "",
  title: "",
  summary: "",
  assembly: "",
  substrate: "",
  below_grade: "none",
  strategy: "",
  tier: "free",
  zones: [],
  sets: [],
  references: "",
  change_note: "",
  body: STARTER_BODY,
  layers: [
    { ...BLANK_LAYER, role: "cladding" },
    { ...BLANK_LAYER, role: "structure" },
  ],
};

// The preview and the site check change nothing: re-running this page's loader after them would only cost a query.
export function shouldRevalidate({ formAction, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) {
  return formAction?.startsWith("/desk/api/") ? false : defaultShouldRevalidate;
}

export async function loader({ request }: Route.LoaderArgs) {
  const [choices, units] = await Promise.all([editorChoices(), unitsFor(request)]);
  return { ...choices, units, values: EMPTY };
}

export async function action({ request, context }: Route.ActionArgs) {
  const user = context.get(userContext);
  const form = await requireCsrf(request);
  const submission = parseWithZod(form, { schema: draftPostSchema });
  if (submission.status !== "success")
    return data({ result: submission.reply() }, { status: submission.status === "error" ? 400 : 200 });
  const { intent: _intent, ...values } = submission.value;
  const outcome = await createDetailDraft(user, values);
  if (!outcome.ok) return data({ result: submission.reply({ fieldErrors: outcome.errors }) }, { status: 400 });
  return redirect(`/desk/revisions/${outcome.revisionId}?saved=1`);
}

export default function NewDetail({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <DraftEditor
      mode="new"
      heading="New detail: the first save creates revision 1 as a draft."
      revision={1}
      values={loaderData.values}
      lastResult={actionData?.result}
      materials={loaderData.materials}
      sets={loaderData.sets}
      units={loaderData.units}
      editable
    />
  );
}
