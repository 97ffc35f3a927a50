import { z } from "zod";

// What the save button posts to /details/:slug/save: keep the detail in the member's list, or forget it.
// Pure: the button's form and the action read it with this schema.
const SAVE_INTENTS = ["save", "unsave"] as const;

export const saveDetailSchema = z.object({
  intent: z.enum(SAVE_INTENTS, { error: "Say whether to save or forget the detail." }),
});
