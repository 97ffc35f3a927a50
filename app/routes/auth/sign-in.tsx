import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { Form, Link, data, redirect, useSearchParams } from "react-router";
import type { Route } from "./+types/sign-in";
import { SIGN_IN_LIMITED, SignInError } from "~/auth/accounts.server";
import { authenticator } from "~/auth/authenticator.server";
import { requireCsrf } from "~/auth/csrf.server";
import { getUser, safeNext } from "~/auth/guards.server";
import { signInSchema } from "~/auth/schemas";
import { startSession } from "~/auth/session.server";
import { CsrfField } from "~/components/csrf-field";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";

export const meta: Route.MetaFunction = () => [{ title: "Sign in — Dryside" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const next = safeNext(new URL(request.url).searchParams.get("next"));
  if (getUser(context)) throw redirect(next);
  return null;
}

export async function action({ request }: Route.ActionArgs) {
  const formData = await requireCsrf(request);
  const submission = parseWithZod(formData, { schema: signInSchema });
  if (submission.status !== "success")
    return data({ result: submission.reply({ hideFields: ["password"] }) }, { status: 400 });
  try {
    const user = await authenticator.authenticate("password", request);
    const setCookie = await startSession(request, user.id);
    return redirect(safeNext(submission.value.next), { headers: { "Set-Cookie": setCookie } });
  } catch (error) {
    if (!(error instanceof SignInError)) throw error;
    const status = error.message === SIGN_IN_LIMITED ? 429 : 401;
    return data({ result: submission.reply({ formErrors: [error.message], hideFields: ["password"] }) }, { status });
  }
}

const NOTICES: Record<string, string> = {
  verified: "Your e-mail is confirmed. Sign in to continue.",
  reset: "Your new password is set and other browsers were signed out. Sign in with it now.",
};

export default function SignIn({ actionData }: Route.ComponentProps) {
  const [searchParams] = useSearchParams();
  const notice = NOTICES[searchParams.get("notice") ?? ""];
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(signInSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: signInSchema }),
    shouldValidate: "onBlur",
  });
  return (
    <section className="mx-auto max-w-md">
      <h1 className="text-3xl">Sign in</h1>
      {notice && (
        <p role="status" className="mt-4 rounded border border-vapour/40 bg-vapour/5 px-3 py-2 text-sm">
          {notice}
        </p>
      )}
      <Form method="post" {...getFormProps(form)} className="mt-6 flex flex-col gap-4">
        <CsrfField />
        <input type="hidden" name="next" value={searchParams.get("next") ?? ""} />
        <FormErrors id={form.errorId} errors={form.errors} />
        <TextField label="E-mail" meta={fields.email} type="email" autoComplete="username" />
        <TextField label="Password" meta={fields.password} type="password" autoComplete="current-password" />
        <SubmitButton>Sign in</SubmitButton>
      </Form>
      <p className="mt-6 text-sm">
        <Link to="/forgot-password">Forgot your password?</Link> · New here?{" "}
        <Link to="/sign-up">Create an account</Link>.
      </p>
    </section>
  );
}
