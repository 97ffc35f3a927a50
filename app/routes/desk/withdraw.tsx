import { getFormProps, getTextareaProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form, Link, data, redirect } from "react-router";
import type { Route } from "./+types/withdraw";
import { requireCsrf } from "~/auth/csrf.server";
import { requireRole } from "~/auth/guards.server";
import { CsrfField } from "~/components/csrf-field";
import { FieldError, FormErrors, withoutKey } from "~/components/form-field";
import { withdrawPage } from "~/desk/desk-pages.server";
import { deskStep, refusedForm } from "~/desk/desk-step.server";
import { withdrawPublished } from "~/desk/revisions.server";
import { withdrawFormSchema } from "~/desk/withdraw-form";

export const meta: Route.MetaFunction = () => [{ title: "Withdraw a detail — Desk — Dryside" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  requireRole(request, context, "reviewer");
  const page = await withdrawPage(params.slug);
  if (!page) throw data({ message: `No detail “${params.slug}”.` }, { status: 404 });
  return page;
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = requireRole(request, context, "reviewer");
  const form = await requireCsrf(request);
  const submission = parseWithZod(form, { schema: withdrawFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  return deskStep(async () => {
    await withdrawPublished(user, params.slug, submission.value.reason);
    return redirect(`/desk?withdrawn=${encodeURIComponent(params.slug)}`);
  }, refusedForm(submission));
}

export default function Withdraw({ loaderData, actionData }: Route.ComponentProps) {
  const { title, live } = loaderData;
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: withdrawFormSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  return (
    <div className="max-w-prose space-y-4">
      <h1 className="text-3xl">Withdraw “{title}”</h1>
      {!live ? (
        <p>This detail is not in the catalogue.</p>
      ) : (
        <Form method="post" {...getFormProps(form)} className="space-y-3">
          <CsrfField />
          <FormErrors id={form.errorId} errors={form.errors} />
          <p>
            Withdrawing takes the detail out of the catalogue and its pages; its history stays, and publishing a later
            revision brings it back. Members who saved it keep it in their list, marked withdrawn.
          </p>
          <div className="flex flex-col gap-1 text-sm">
            <label htmlFor={fields.reason.id}>Reason (kept in the audit log)</label>
            <textarea
              key={fields.reason.key}
              {...withoutKey(getTextareaProps(fields.reason))}
              rows={3}
              className="rounded border border-rule bg-sheet px-3 py-2 aria-[invalid=true]:border-stop"
            />
            <FieldError meta={fields.reason} />
          </div>
          <button type="submit" className="rounded bg-stop px-4 py-2 font-medium text-white">
            Withdraw this detail
          </button>
        </Form>
      )}
      <p className="text-sm">
        <Link to="/desk">Back to the desk</Link>
      </p>
    </div>
  );
}
