import { PaymentEvent, Payment, User } from "~/models/index.server";
import type { PaymentEventResult } from "~/models/payment-event.server";
import { formatMoney } from "./money";

export interface AdminPaymentsView {
  events: {
    id: string;
    type: string;
    created: string;
    receivedAt: string;
    result: PaymentEventResult;
    message: string | null;
  }[];
  payments: { id: number; who: string; description: string; amount: string; paidAt: string; receiptSent: boolean }[];
  counts: Record<PaymentEventResult, number>;
}

/** The newest webhook events with their processing result, and the newest payments. */
export async function adminPaymentsView(filter: { result?: PaymentEventResult }): Promise<AdminPaymentsView> {
  const [events, payments, grouped] = await Promise.all([
    PaymentEvent.findAll({
      where: filter.result ? { result: filter.result } : {},
      attributes: ["id", "type", "stripeCreated", "receivedAt", "result", "message"],
      order: [["receivedAt", "DESC"]],
      limit: 200,
    }),
    Payment.findAll({
      include: [{ model: User, as: "user", attributes: ["email"] }],
      order: [["paidAt", "DESC"]],
      limit: 100,
    }),
    PaymentEvent.count({ group: ["result"] }),
  ]);
  const counts: Record<PaymentEventResult, number> = { applied: 0, ignored: 0, failed: 0 };
  for (const row of grouped as unknown as { result: PaymentEventResult; count: number }[])
    counts[row.result] = Number(row.count);
  return {
    events: events.map((e) => ({
      id: e.id,
      type: e.type,
      created: new Date(e.stripeCreated * 1000).toISOString(),
      receivedAt: e.receivedAt.toISOString(),
      result: e.result,
      message: e.message,
    })),
    payments: payments.map((p) => ({
      id: p.id,
      who: p.user?.email ?? `user ${p.userId}`,
      description: p.description,
      amount: formatMoney(p.amountCents, p.currency),
      paidAt: p.paidAt.toISOString(),
      receiptSent: p.receiptSentAt !== null,
    })),
    counts,
  };
}
