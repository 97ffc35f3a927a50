import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, redirect } from "react-router";
import type { Route } from "./+types/billing";
import { requireCsrf } from "~/auth/csrf.server";
import { userContext } from "~/auth/guards.server";
import { CsrfField } from "~/components/csrf-field";
import { billingOverview, requestPlanEnd } from "~/payments/billing.server";
import { planChangeSchema } from "~/payments/plan-change-form";
import { ENTITLEMENT_STATUS_LABELS } from "~/vocabulary/entitlements";

export const meta: Route.MetaFunction = () => [{ title: "Billing — Dryside" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const user = context.get(userContext);
  const requested = new URL(request.url).searchParams.get("requested");
  const overview = await billingOverview(user);
  // After a change request the page refreshes itself until the service's webhook has confirmed it.
  const waiting =
    (requested === "end" && overview.plan?.cancelAtPeriodEnd === false) ||
    (requested === "keep" && overview.plan?.cancelAtPeriodEnd === true);
  return { ...overview, waiting };
}

export async function action({ request, context }: Route.ActionArgs) {
  const user = context.get(userContext);
  const form = await requireCsrf(request);
  const submission = parseWithZod(form, { schema: planChangeSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const ending = submission.value.intent === "end-at-period-end";
  const result = await requestPlanEnd(user, ending);
  if (!result.ok) return data({ result: submission.reply({ formErrors: [result.message] }) }, { status: 409 });
  return redirect(`/account/billing?requested=${ending ? "end" : "keep"}`, { status: 303 });
}

function day(iso: string | null): string {
  return iso ? iso.slice(0, 10) : "—";
}

export default function Billing({ loaderData, actionData }: Route.ComponentProps) {
  const { plan, sets, receipts, downloads, waiting } = loaderData;
  const running = plan?.live;
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: planChangeSchema }),
  });
  const refusal = Object.values(form.allErrors).flat();
  return (
    <div className="flex flex-col gap-10">
      {waiting && <meta httpEquiv="refresh" content="2" />}
      <header>
        <h1 className="text-3xl">Billing</h1>
        <p className="mt-2 text-graphite-soft">
          <Link to="/account">Back to your account</Link>
        </p>
      </header>
      {refusal.length > 0 && (
        <p id={form.errorId} role="alert" className="text-sm">
          {refusal.join(" ")}
        </p>
      )}
      {waiting && (
        <p role="status" className="text-sm" data-testid="billing-waiting">
          Change sent to the payments service; this page updates when it confirms.
        </p>
      )}

      <section
        aria-labelledby="plan-heading"
        className="rounded border border-rule bg-sheet p-6"
        data-testid="billing-plan"
      >
        <h2 id="plan-heading" className="text-xl">
          Plan
        </h2>
        {plan ? (
          <>
            <dl className="mt-4 grid grid-cols-[12rem_1fr] gap-y-2 text-sm">
              <dt className="text-graphite-soft">Plan</dt>
              <dd>{plan.name}</dd>
              <dt className="text-graphite-soft">State</dt>
              <dd data-testid="plan-status">{ENTITLEMENT_STATUS_LABELS[plan.status]}</dd>
              <dt className="text-graphite-soft">
                {running && !plan.cancelAtPeriodEnd ? "Renews on" : "Access until"}
              </dt>
              <dd data-testid="plan-date">{day(plan.renewsOrEndsAt)}</dd>
            </dl>
            {running && (
              <Form method="post" {...getFormProps(form)} className="mt-4">
                <CsrfField />
                {plan.cancelAtPeriodEnd ? (
                  <button
                    type="submit"
                    name={fields.intent.name}
                    value="keep-running"
                    className="rounded border border-rule px-3 py-2"
                    data-testid="plan-resume"
                  >
                    Keep my plan running
                  </button>
                ) : (
                  <button
                    type="submit"
                    name={fields.intent.name}
                    value="end-at-period-end"
                    className="rounded border border-rule px-3 py-2"
                    data-testid="plan-cancel"
                  >
                    Stop at the end of this period
                  </button>
                )}
              </Form>
            )}
          </>
        ) : (
          <p className="mt-2 text-sm text-graphite-soft">
            No plan. <Link to="/pricing">See the plans</Link>.
          </p>
        )}
      </section>

      <section aria-labelledby="sets-heading">
        <h2 id="sets-heading" className="text-xl">
          Sets you bought
        </h2>
        {sets.length === 0 ? (
          <p className="mt-2 text-sm text-graphite-soft">None yet.</p>
        ) : (
          <ul className="mt-2 text-sm">
            {sets.map((set) => (
              <li key={set.slug}>
                <Link to={`/sets#${set.slug}`}>{set.title}</Link> — bought {day(set.boughtAt)} ·{" "}
                <a href={`/sets/${set.slug}/pack`} download>
                  download the pack
                </a>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="receipts-heading">
        <h2 id="receipts-heading" className="text-xl">
          Receipts
        </h2>
        {receipts.length === 0 ? (
          <p className="mt-2 text-sm text-graphite-soft">No payments yet.</p>
        ) : (
          <table className="mt-2 w-full text-left text-sm" data-testid="receipts">
            <thead>
              <tr className="border-b border-rule">
                <th className="py-2">Date</th>
                <th>For</th>
                <th>Amount</th>
                <th>E-mailed</th>
              </tr>
            </thead>
            <tbody>
              {receipts.map((receipt) => (
                <tr key={receipt.id} className="border-b border-rule/60">
                  <td className="py-2">{day(receipt.paidAt)}</td>
                  <td>{receipt.description}</td>
                  <td className="font-mono">{receipt.amount}</td>
                  <td>{receipt.emailed ? "yes" : "not yet"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>

      <section aria-labelledby="downloads-heading">
        <h2 id="downloads-heading" className="text-xl">
          Recent downloads
        </h2>
        {downloads.length === 0 ? (
          <p className="mt-2 text-sm text-graphite-soft">No packs downloaded yet.</p>
        ) : (
          <ul className="mt-2 text-sm">
            {downloads.map((d, i) => (
              <li key={i}>
                {d.setTitle} — {d.at.slice(0, 16).replace("T", " ")} UTC
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
