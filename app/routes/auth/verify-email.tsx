import { Form, Link, redirect } from "react-router";
import type { Route } from "./+types/verify-email";
import { verifyEmail } from "~/auth/accounts.server";
import { requireCsrf } from "~/auth/csrf.server";
import { peekToken } from "~/auth/tokens.server";
import { CsrfField } from "~/components/csrf-field";
import { SubmitButton } from "~/components/form-field";

export const meta: Route.MetaFunction = () => [{ title: "Confirm your e-mail — Dryside" }];
// The token is in the address: keep it out of Referer headers sent to any other page.
export const headers: Route.HeadersFunction = () => ({ "Referrer-Policy": "no-referrer" });

export async function loader({ params }: Route.LoaderArgs) {
  return { valid: (await peekToken(params.token, "verify-email")) !== null };
}

// Confirming takes a click (a POST), so mail scanners that fetch links do not use the token up.
export async function action({ request, params }: Route.ActionArgs) {
  await requireCsrf(request);
  if (await verifyEmail(params.token)) return redirect("/sign-in?notice=verified");
  return { failed: true };
}

export default function VerifyEmail({ loaderData, actionData }: Route.ComponentProps) {
  if (!loaderData.valid || actionData?.failed) {
    return (
      <section className="mx-auto max-w-md">
        <h1 className="text-3xl">This link no longer works</h1>
        <p className="mt-4">
          Confirmation links work once and expire after 24 hours. <Link to="/sign-in">Sign in</Link> and we will send
          you a fresh one.
        </p>
      </section>
    );
  }
  return (
    <section className="mx-auto max-w-md">
      <h1 className="text-3xl">Confirm your e-mail</h1>
      <p className="mt-4">One click and your account is ready.</p>
      <Form method="post" className="mt-6">
        <CsrfField />
        <SubmitButton>Confirm my e-mail</SubmitButton>
      </Form>
    </section>
  );
}
