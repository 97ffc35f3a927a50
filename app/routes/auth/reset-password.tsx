import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { Form, Link, data, redirect } from "react-router";
import type { Route } from "./+types/reset-password";
import { resetPassword } from "~/auth/accounts.server";
import { requireCsrf } from "~/auth/csrf.server";
import { resetPasswordSchema } from "~/auth/schemas";
import { peekToken } from "~/auth/tokens.server";
import { CsrfField } from "~/components/csrf-field";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";

export const meta: Route.MetaFunction = () => [{ title: "Choose a new password — Dryside" }];
export const headers: Route.HeadersFunction = () => ({ "Referrer-Policy": "no-referrer" });

export async function loader({ params }: Route.LoaderArgs) {
  return { valid: (await peekToken(params.token, "reset-password")) !== null };
}

export async function action({ request, params }: Route.ActionArgs) {
  const formData = await requireCsrf(request);
  const submission = parseWithZod(formData, { schema: resetPasswordSchema });
  if (submission.status !== "success") {
    return data(
      { result: submission.reply({ hideFields: ["password", "confirmPassword"] }), expired: false },
      { status: 400 },
    );
  }
  if (await resetPassword(params.token, submission.value.password)) return redirect("/sign-in?notice=reset");
  return data(
    { result: submission.reply({ hideFields: ["password", "confirmPassword"] }), expired: true },
    { status: 410 },
  );
}

export default function ResetPassword({ loaderData, actionData }: Route.ComponentProps) {
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(resetPasswordSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: resetPasswordSchema }),
    shouldValidate: "onBlur",
  });
  if (!loaderData.valid || actionData?.expired) {
    return (
      <section className="mx-auto max-w-md">
        <h1 className="text-3xl">This link no longer works</h1>
        <p className="mt-4">
          Password links work once and expire after one hour. <Link to="/forgot-password">Ask for a new one</Link>.
        </p>
      </section>
    );
  }
  return (
    <section className="mx-auto max-w-md">
      <h1 className="text-3xl">Choose a new password</h1>
      <Form method="post" {...getFormProps(form)} className="mt-6 flex flex-col gap-4">
        <CsrfField />
        <FormErrors id={form.errorId} errors={form.errors} />
        <TextField
          label="New password"
          meta={fields.password}
          type="password"
          autoComplete="new-password"
          hint="At least 12 characters."
        />
        <TextField
          label="New password again"
          meta={fields.confirmPassword}
          type="password"
          autoComplete="new-password"
        />
        <SubmitButton>Save the new password</SubmitButton>
      </Form>
    </section>
  );
}
