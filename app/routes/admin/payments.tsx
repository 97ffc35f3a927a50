import { Link, useSearchParams } from "react-router";
import type { Route } from "./+types/payments";
import { adminPaymentsView } from "~/payments/admin.server";

export const meta: Route.MetaFunction = () => [{ title: "Payments — Dryside admin" }];

const RESULTS = ["applied", "ignored", "failed"] as const;

export async function loader({ request }: Route.LoaderArgs) {
  const wanted = new URL(request.url).searchParams.get("result");
  const result = RESULTS.find((r) => r === wanted);
  return adminPaymentsView({ result });
}

function stamp(iso: string): string {
  return `${iso.slice(0, 19).replace("T", " ")} UTC`;
}

export default function AdminPayments({ loaderData }: Route.ComponentProps) {
  const { events, payments, counts } = loaderData;
  const [searchParams] = useSearchParams();
  const active = searchParams.get("result");
  return (
    <div className="flex flex-col gap-10">
      <header>
        <h1 className="text-3xl">Payments and webhook events</h1>
        <p className="mt-2 text-sm text-graphite-soft">
          Entitlements change only through these verified events. A failed event is retried by the payments service and
          processed again.
        </p>
      </header>
      <section aria-labelledby="payments-heading">
        <h2 id="payments-heading" className="text-xl">
          Payments
        </h2>
        <table className="mt-3 w-full text-left text-sm">
          <thead>
            <tr className="border-b border-rule">
              <th className="py-2">Paid</th>
              <th>Who</th>
              <th>For</th>
              <th>Amount</th>
              <th>Receipt</th>
            </tr>
          </thead>
          <tbody>
            {payments.map((p) => (
              <tr key={p.id} className="border-b border-rule/60">
                <td className="py-2 font-mono text-xs">{stamp(p.paidAt)}</td>
                <td>{p.who}</td>
                <td>{p.description}</td>
                <td className="font-mono">{p.amount}</td>
                <td>{p.receiptSent ? "sent" : "not sent"}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {payments.length === 0 && <p className="mt-2 text-sm text-graphite-soft">No payments yet.</p>}
      </section>
      <section aria-labelledby="events-heading">
        <h2 id="events-heading" className="text-xl">
          Webhook events
        </h2>
        <nav aria-label="Filter by result" className="mt-2 flex gap-4 text-sm">
          <Link to="/admin/payments" aria-current={!active ? "page" : undefined}>
            all
          </Link>
          {RESULTS.map((r) => (
            <Link key={r} to={`/admin/payments?result=${r}`} aria-current={active === r ? "page" : undefined}>
              {r} ({counts[r]})
            </Link>
          ))}
        </nav>
        <table className="mt-3 w-full text-left text-sm" data-testid="webhook-events">
          <thead>
            <tr className="border-b border-rule">
              <th className="py-2">Received</th>
              <th>Event</th>
              <th>Type</th>
              <th>Result</th>
              <th>What happened</th>
            </tr>
          </thead>
          <tbody>
            {events.map((e) => (
              <tr key={e.id} className="border-b border-rule/60 align-top">
                <td className="py-2 font-mono text-xs">{stamp(e.receivedAt)}</td>
                <td className="font-mono text-xs">{e.id}</td>
                <td>{e.type}</td>
                <td
                  className={e.result === "failed" ? "text-stop" : e.result === "ignored" ? "text-graphite-soft" : ""}
                >
                  {e.result}
                </td>
                <td className="text-xs">{e.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
    </div>
  );
}
