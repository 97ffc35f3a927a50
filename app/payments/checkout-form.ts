import { z } from "zod";

// What a buy button posts: a plan by slug or a set by slug. Shared by /pricing and /sets.
export const checkoutFormSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("plan"), plan: z.string().min(1).max(40) }),
  z.object({ kind: z.literal("set"), set: z.string().min(1).max(80) }),
]);
