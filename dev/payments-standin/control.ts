import type { Billing } from "./billing";
import { eventView } from "./api";
import { json, type Router } from "./router";
import type { EventRecord, Store } from "./store";
import type { WebhookSender } from "./webhooks";

type ControlDeps = { store: Store; billing: Billing; sender: WebhookSender; webhookWaitMs: number };

/**
 * Test controls under `/_standin/...`, not part of the payments API: they make time pass for a
 * subscription and let tests inspect and replay webhook deliveries. No API key needed (loopback only).
 */
export function addControlRoutes(router: Router, { store, billing, sender, webhookWaitMs }: ControlDeps): void {
  const settle = (delivered: Promise<unknown>): Promise<unknown> =>
    Promise.race([delivered, new Promise((resolve) => setTimeout(resolve, webhookWaitMs).unref())]);

  // Jump a subscription to the end of its period: renew (or fail to, with fail_renewal=true),
  // or end it if cancel_at_period_end is set. Answers after the webhooks went out.
  router.add("POST", "/_standin/subscriptions/:id/advance", async (request) => {
    const subscription = store.get("subscription", request.params.id);
    const before = store.events().length;
    await settle(billing.advancePeriod(subscription, request.body.boolean("fail_renewal") ?? false));
    const events = store.events().slice(before).map(deliveryView);
    return json({ subscription, events });
  });

  router.add("GET", "/_standin/events", (request) => {
    const type = request.query.string("type");
    const records = store.events().filter((record) => !type || record.event.type === type);
    return json({ object: "list", data: records.map(deliveryView) });
  });

  // Send an already delivered event again (same id, same body) to exercise the receiver's idempotency.
  router.add("POST", "/_standin/events/:id/redeliver", async (request) => {
    const record = store.event(request.params.id);
    const attempt = await sender.redeliver(record);
    return json({ event: eventView(record), delivery: attempt });
  });

  router.add("POST", "/_standin/reset", () => {
    store.clear();
    return json({ reset: true });
  });
}

function deliveryView(record: EventRecord): {
  id: string;
  type: string;
  created: number;
  delivered: boolean;
  deliveries: EventRecord["deliveries"];
} {
  return {
    id: record.event.id,
    type: record.event.type,
    created: record.event.created,
    delivered: record.delivered,
    deliveries: record.deliveries,
  };
}
