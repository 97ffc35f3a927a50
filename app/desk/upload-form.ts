import { z } from "zod";

// What the upload panel posts to /desk/revisions/:id/uploads: a file with its caption, or the removal
// of one upload. Pure: the panel checks its request with this schema before sending it.

const UPLOAD_CAPTION_MAX = 300;

const uploadRequestSchema = z.discriminatedUnion("intent", [
  z.object({
    intent: z.literal("attach"),
    file: z
      .instanceof(File, { error: "Choose a file to attach." })
      .refine((file) => file.size > 0, "Choose a file to attach."),
    caption: z
      .string()
      .trim()
      .max(UPLOAD_CAPTION_MAX, `Keep the caption under ${UPLOAD_CAPTION_MAX} characters.`)
      .default(""),
  }),
  z.object({
    intent: z.literal("remove"),
    uploadId: z.coerce.number({ error: "Say which upload to remove." }).int().positive("Say which upload to remove."),
  }),
]);

/** A request read from posted form data; a post without an intent attaches its file. */
export function readUploadRequest(form: FormData) {
  return uploadRequestSchema.safeParse({ intent: "attach", ...Object.fromEntries(form) });
}
