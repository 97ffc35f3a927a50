import type { Route } from "./+types/payments-webhook";
import { jsonError } from "~/http/json";
import { handlePaymentWebhook } from "~/payments/webhooks.server";

// POST /api/payments/webhook — the payments service's signed events. The signature covers the exact
// bytes sent, so the body is read as text and never re-serialised before verification.
export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return jsonError(405, "method_not_allowed", "POST only.");
  const reply = await handlePaymentWebhook(await request.text(), request.headers.get("Stripe-Signature"));
  return Response.json(reply.body, { status: reply.status, headers: { "Cache-Control": "no-store" } });
}

export function loader() {
  return jsonError(405, "method_not_allowed", "The payments webhook takes POST only.");
}
