// Amounts travel as integer minor units (cents), as the payments service stores them; only display formats.
export function formatMoney(amountCents: number, currency: string): string {
  return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(
    amountCents / 100,
  );
}

export type BillingInterval = "month" | "year";

const CADENCE: Record<BillingInterval, string> = { month: "per month", year: "per year" };

/** "$19.00 per month" */
export function formatRecurring(amountCents: number, currency: string, interval: BillingInterval): string {
  return `${formatMoney(amountCents, currency)} ${CADENCE[interval]}`;
}
