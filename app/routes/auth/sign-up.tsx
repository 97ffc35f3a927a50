import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { Form, Link, data } from "react-router";
import type { Route } from "./+types/sign-up";
import { signUp } from "~/auth/accounts.server";
import { requireCsrf } from "~/auth/csrf.server";
import { signUpSchema } from "~/auth/schemas";
import { CsrfField } from "~/components/csrf-field";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";

export const meta: Route.MetaFunction = () => [{ title: "Create an account — Dryside" }];

export async function action({ request }: Route.ActionArgs) {
  const formData = await requireCsrf(request);
  const submission = parseWithZod(formData, { schema: signUpSchema });
  if (submission.status !== "success") {
    return data(
      { result: submission.reply({ hideFields: ["password", "confirmPassword"] }), sentTo: null },
      { status: 400 },
    );
  }
  await signUp(submission.value);
  return { result: submission.reply({ resetForm: true }), sentTo: submission.value.email };
}

export default function SignUp({ actionData }: Route.ComponentProps) {
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(signUpSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: signUpSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  if (actionData?.sentTo) {
    return (
      <section className="mx-auto max-w-md" data-testid="sign-up-sent">
        <h1 className="text-3xl">Check your inbox</h1>
        <p className="mt-4">
          We sent a confirmation link to <strong>{actionData.sentTo}</strong>. Follow it within 24 hours, then sign in.
        </p>
        <p className="mt-4 text-sm text-graphite-soft">
          No mail after a few minutes? Look in your spam folder, or try signing in: we send a fresh link.
        </p>
      </section>
    );
  }
  return (
    <section className="mx-auto max-w-md">
      <h1 className="text-3xl">Create an account</h1>
      <p className="mt-2 text-graphite-soft">
        Members can save details, keep job folders and get an e-mail when a saved detail is revised.
      </p>
      <Form method="post" {...getFormProps(form)} className="mt-6 flex flex-col gap-4">
        <CsrfField />
        <FormErrors id={form.errorId} errors={form.errors} />
        <TextField label="Your name" meta={fields.displayName} autoComplete="name" />
        <TextField label="E-mail" meta={fields.email} type="email" autoComplete="email" />
        <TextField
          label="Password"
          meta={fields.password}
          type="password"
          autoComplete="new-password"
          hint="At least 12 characters."
        />
        <TextField label="Password again" meta={fields.confirmPassword} type="password" autoComplete="new-password" />
        <SubmitButton>Create account</SubmitButton>
      </Form>
      <p className="mt-6 text-sm">
        Already have one? <Link to="/sign-in">Sign in</Link>.
      </p>
    </section>
  );
}
