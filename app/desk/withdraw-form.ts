import { z } from "zod";

// Withdrawing a published detail: the reason goes in the audit log. Pure: conform parses the form
// with this schema on the page and in the action.

const WITHDRAW_REASON_MIN = 10;

export const withdrawFormSchema = z.object({
  reason: z
    .string({ error: "Give the reason for withdrawing; it goes in the audit log." })
    .trim()
    .min(
      WITHDRAW_REASON_MIN,
      `Give the reason for withdrawing (at least ${WITHDRAW_REASON_MIN} characters); it goes in the audit log.`,
    )
    .max(1000, "Keep the reason under 1,000 characters."),
});
