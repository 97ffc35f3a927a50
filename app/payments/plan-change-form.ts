import { z } from "zod";

// What the billing page's plan buttons post: stop the plan at the end of the period, or keep it
// running. Pure: the page's form and the action read it with this schema.
const PLAN_CHANGES = ["end-at-period-end", "keep-running"] as const;

export const planChangeSchema = z.object({
  intent: z.enum(PLAN_CHANGES, { error: "That change was not understood." }),
});
