import { z } from "zod";
import { REVIEW_SECTIONS } from "./review-sections";

// The reviewer's form: a comment per section and the decision. Pure: conform parses it with this
// schema on the review page and in its action.

const REVIEW_DECISIONS = ["approve", "request-changes"] as const;

const MAX_COMMENT = 2000;

/** One optional comment per reviewable section, posted as `comments.<section>`. */
const commentsSchema = z.partialRecord(
  z.enum(REVIEW_SECTIONS),
  z.string().trim().max(MAX_COMMENT, `Keep a comment under ${MAX_COMMENT} characters.`),
);

export const reviewFormSchema = z
  .object({
    intent: z.enum(REVIEW_DECISIONS, { error: "Choose to approve or to request changes." }),
    comments: commentsSchema.default({}),
  })
  .superRefine((review, ctx) => {
    // Sending work back without saying why leaves the author guessing.
    if (review.intent === "request-changes" && REVIEW_SECTIONS.every((section) => !review.comments[section])) {
      ctx.addIssue({
        code: "custom",
        path: ["comments"],
        message: "Say what needs changing: write at least one comment.",
      });
    }
  });
