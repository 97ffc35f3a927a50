import { receiptMail } from "~/mail/templates";
import { sendMailOrLog } from "~/mail/mailer.server";
import { Payment, type User } from "~/models/index.server";
import { formatMoney } from "./money";
import type { EntitlementKind } from "~/vocabulary/entitlements";

export interface PaymentRecord {
  user: User;
  kind: EntitlementKind;
  description: string;
  amountCents: number;
  currency: string;
  stripeInvoiceId: string | null;
  stripeCheckoutSessionId: string | null;
  paidAt: Date;
}

/**
 * Stores a received payment once (keyed by its invoice or checkout id) and e-mails the receipt the first
 * time only. Returns whether this call recorded it. A mail outage never fails the webhook: the receipt
 * stays listed on the billing page and receipt_sent_at stays empty.
 */
export async function recordPayment(record: PaymentRecord): Promise<boolean> {
  const where = record.stripeInvoiceId
    ? { stripeInvoiceId: record.stripeInvoiceId }
    : { stripeCheckoutSessionId: record.stripeCheckoutSessionId };
  let payment: Payment;
  let created: boolean;
  try {
    [payment, created] = await Payment.findOrCreate({
      where,
      defaults: {
        userId: record.user.id,
        kind: record.kind,
        description: record.description.slice(0, 200),
        amountCents: record.amountCents,
        currency: record.currency.toLowerCase(),
        stripeInvoiceId: record.stripeInvoiceId,
        stripeCheckoutSessionId: record.stripeCheckoutSessionId,
        paidAt: record.paidAt,
      },
    });
  } catch (error) {
    // A concurrent delivery of the same payment won the insert.
    if (error instanceof Error && error.name === "SequelizeUniqueConstraintError") return false;
    throw error;
  }
  if (!created) return false;
  const sent = await sendMailOrLog(
    record.user.email,
    receiptMail({
      displayName: record.user.displayName,
      item: payment.description,
      amount: formatMoney(payment.amountCents, payment.currency),
      date: payment.paidAt.toISOString().slice(0, 10),
      reference: record.stripeInvoiceId ?? record.stripeCheckoutSessionId ?? `payment ${payment.id}`,
    }),
  );
  if (sent) await payment.update({ receiptSentAt: new Date() });
  return true;
}

export interface ReceiptRow {
  id: number;
  description: string;
  amount: string;
  paidAt: string;
  emailed: boolean;
}

export async function receiptsFor(userId: number): Promise<ReceiptRow[]> {
  const rows = await Payment.findAll({ where: { userId }, order: [["paidAt", "DESC"]], limit: 100 });
  return rows.map((row) => ({
    id: row.id,
    description: row.description,
    amount: formatMoney(row.amountCents, row.currency),
    paidAt: row.paidAt.toISOString(),
    emailed: row.receiptSentAt !== null,
  }));
}
