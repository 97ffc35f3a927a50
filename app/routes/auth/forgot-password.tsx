import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { Form, data } from "react-router";
import type { Route } from "./+types/forgot-password";
import { requestPasswordReset } from "~/auth/accounts.server";
import { requireCsrf } from "~/auth/csrf.server";
import { forgotPasswordSchema } from "~/auth/schemas";
import { CsrfField } from "~/components/csrf-field";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";

export const meta: Route.MetaFunction = () => [{ title: "Forgot your password — Dryside" }];

export async function action({ request }: Route.ActionArgs) {
  const formData = await requireCsrf(request);
  const submission = parseWithZod(formData, { schema: forgotPasswordSchema });
  if (submission.status !== "success") return data({ result: submission.reply(), sent: false }, { status: 400 });
  await requestPasswordReset(submission.value.email);
  return { result: submission.reply(), sent: true };
}

export default function ForgotPassword({ actionData }: Route.ComponentProps) {
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(forgotPasswordSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: forgotPasswordSchema }),
    shouldValidate: "onBlur",
  });
  return (
    <section className="mx-auto max-w-md">
      <h1 className="text-3xl">Choose a new password</h1>
      {actionData?.sent ? (
        // The same words whether or not the address has an account.
        <p role="status" className="mt-4" data-testid="reset-sent">
          If an account uses that address, a link to choose a new password is on its way. It works for one hour.
        </p>
      ) : (
        <Form method="post" {...getFormProps(form)} className="mt-6 flex flex-col gap-4">
          <CsrfField />
          <FormErrors id={form.errorId} errors={form.errors} />
          <TextField label="E-mail" meta={fields.email} type="email" autoComplete="email" />
          <SubmitButton>Send me a link</SubmitButton>
        </Form>
      )}
    </section>
  );
}
