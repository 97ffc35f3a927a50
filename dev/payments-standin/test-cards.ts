/**
 * The test card numbers the real service documents for its test mode, with the outcome each one
 * produces there. Any other number is declined: no real card is ever taken here.
 */
export type CardOutcome =
  | { ok: true; funding: "credit" | "debit" }
  | { ok: false; code: string; declineCode?: string; message: string };

export const TEST_CARDS: Record<string, CardOutcome> = {
  "4242424242424242": { ok: true, funding: "credit" },
  "4000056655665556": { ok: true, funding: "debit" },
  "5555555555554444": { ok: true, funding: "credit" },
  "4000000000000002": {
    ok: false,
    code: "card_declined",
    declineCode: "generic_decline",
    message: "Your card was declined.",
  },
  "4000000000009995": {
    ok: false,
    code: "card_declined",
    declineCode: "insufficient_funds",
    message: "Your card has insufficient funds.",
  },
  "4000000000000069": { ok: false, code: "expired_card", message: "Your card has expired." },
  "4000000000000127": { ok: false, code: "incorrect_cvc", message: "Your card's security code is incorrect." },
};

export type CardForm = { number: string; expiry: string; cvc: string; name: string };

/** Checks the form the way a card form would (number, expiry, CVC, name), then applies the test-card outcome. */
export function checkCard(card: CardForm, now = new Date()): CardOutcome {
  const digits = card.number.replace(/[\s-]/g, "");
  if (!/^\d{12,19}$/.test(digits) || !passesLuhn(digits)) {
    return { ok: false, code: "incorrect_number", message: "Your card number is incorrect." };
  }
  const expiry = /^(\d{1,2})\s*\/\s*(\d{2}|\d{4})$/.exec(card.expiry.trim());
  const month = expiry ? Number(expiry[1]) : 0;
  if (!expiry || month < 1 || month > 12) {
    return { ok: false, code: "invalid_expiry_month", message: "Your card's expiration date is incomplete." };
  }
  const year = expiry[2].length === 2 ? 2000 + Number(expiry[2]) : Number(expiry[2]);
  // A card is valid through the last day of its expiry month.
  if (Date.UTC(year, month, 1) <= now.getTime()) {
    return { ok: false, code: "invalid_expiry_year", message: "Your card's expiration date is in the past." };
  }
  if (!/^\d{3,4}$/.test(card.cvc.trim())) {
    return { ok: false, code: "invalid_cvc", message: "Your card's security code is incomplete." };
  }
  if (card.name.trim() === "") return { ok: false, code: "missing_name", message: "Enter the name on the card." };
  return (
    TEST_CARDS[digits] ?? {
      ok: false,
      code: "card_declined",
      declineCode: "test_mode_live_card",
      message: "Your card was declined. Only the test card numbers listed below work here.",
    }
  );
}

/** The check digit every card number carries (ISO/IEC 7812-1). */
function passesLuhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let digit = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      digit *= 2;
      if (digit > 9) digit -= 9;
    }
    sum += digit;
  }
  return sum % 10 === 0;
}
