import { Form, Link, data, redirect } from "react-router";
import type { Route } from "./+types/withdraw";
import { requireCsrf } from "~/auth/csrf.server";
import { requireRole } from "~/auth/guards.server";
import { CsrfField } from "~/components/csrf-field";
import { DeskError, withdrawPublished } from "~/desk/revisions.server";
import { Detail } from "~/models/index.server";

export const meta: Route.MetaFunction = () => [{ title: "Withdraw a detail — Desk — Dryside" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  requireRole(request, context, "reviewer");
  const detail = await Detail.findOne({ where: { slug: params.slug }, attributes: ["slug", "title", "publishedRevisionId", "withdrawnAt"] });
  if (!detail) throw data({ message: `No detail “${params.slug}”.` }, { status: 404 });
  return { slug: detail.slug, title: detail.title, live: Boolean(detail.publishedRevisionId && !detail.withdrawnAt) };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = requireRole(request, context, "reviewer");
  const form = await requireCsrf(request);
  const reason = form.get("reason");
  try {
    await withdrawPublished(user, params.slug, typeof reason === "string" ? reason : "");
    return redirect(`/desk?withdrawn=${encodeURIComponent(params.slug)}`);
  } catch (error) {
    if (error instanceof DeskError) return data({ message: error.message, reason: typeof reason === "string" ? reason : "" }, { status: error.status });
    throw error;
  }
}

export default function Withdraw({ loaderData, actionData }: Route.ComponentProps) {
  const { title, live } = loaderData;
  return (
    <div className="max-w-prose space-y-4">
      <h1 className="text-3xl">Withdraw “{title}”</h1>
      {!live ? (
        <p>This detail is not in the catalogue.</p>
      ) : (
        <Form method="post" className="space-y-3">
          <CsrfField />
          <p>Withdrawing takes the detail out of the catalogue and its pages; its history stays, and publishing a later revision brings it back. Members who saved it keep it in their list, marked withdrawn.</p>
          <label className="flex flex-col gap-1 text-sm">
            Reason (kept in the audit log)
            <textarea name="reason" rows={3} defaultValue={actionData?.reason ?? ""} className="rounded border border-rule bg-sheet px-3 py-2" aria-invalid={actionData?.message ? true : undefined} />
          </label>
          {actionData?.message ? <p role="alert" className="text-sm text-stop">{actionData.message}</p> : null}
          <button type="submit" className="rounded bg-stop px-4 py-2 font-medium text-white">Withdraw this detail</button>
        </Form>
      )}
      <p className="text-sm"><Link to="/desk">Back to the desk</Link></p>
    </div>
  );
}
