// The reviewer's and the withdrawal forms, read by conform with the schemas the page and the action share.
import { parseWithZod } from "@conform-to/zod/v4";
import { expect, test } from "vitest";
import { reviewFormSchema } from "~/desk/review-form";
import { withdrawFormSchema } from "~/desk/withdraw-form";

function posted(fields: Record<string, string>): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  return form;
}

test("comments are read per section, trimmed; a blank one stays blank and counts as none", () => {
  const submission = parseWithZod(
    posted({
      intent: "request-changes",
      "comments.layers": "  Say which face is thickened. ",
      "comments.cautions": "",
    }),
    { schema: reviewFormSchema },
  );
  expect(submission.status === "success" && submission.value).toEqual({
    intent: "request-changes",
    comments: { layers: "Say which face is thickened.", cautions: "" },
  });
});

test("sending work back needs at least one comment, said on the comments; approving does not", () => {
  const back = parseWithZod(posted({ intent: "request-changes", "comments.layers": "   " }), {
    schema: reviewFormSchema,
  });
  expect(back.status === "error" && back.error).toEqual({
    comments: ["Say what needs changing: write at least one comment."],
  });
  expect(parseWithZod(posted({ intent: "approve" }), { schema: reviewFormSchema }).status).toBe("success");
});

test("a comment on a section that does not exist is refused", () => {
  expect(
    parseWithZod(posted({ intent: "approve", "comments.colour": "red" }), { schema: reviewFormSchema }).status,
  ).toBe("error");
});

test("a withdrawal needs a reason of at least 10 characters, and the short one typed comes back", () => {
  const short = parseWithZod(posted({ reason: "no" }), { schema: withdrawFormSchema });
  expect(short.status === "error" && Object.keys(short.error ?? {})).toEqual(["reason"]);
  expect(short.reply().initialValue).toEqual({ reason: "no" });
  const given = parseWithZod(posted({ reason: "  Product class discontinued.  " }), { schema: withdrawFormSchema });
  expect(given.status === "success" && given.value.reason).toBe("Product class discontinued.");
});
