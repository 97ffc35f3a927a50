import { getFormProps, useForm, type SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Link, useFetcher } from "react-router";
import { saveDetailSchema } from "~/desk/saved-form";
import { CsrfField } from "./csrf-field";

/** Save or forget a detail without leaving the page; visitors are offered sign-in instead. */
export function SaveDetailButton({ slug, saved }: { slug: string; saved: boolean | null }) {
  const fetcher = useFetcher<{ saved: boolean } | { result: SubmissionResult<string[]> }>();
  const [form] = useForm({ onValidate: ({ formData }) => parseWithZod(formData, { schema: saveDetailSchema }) });
  if (saved === null) {
    return (
      <Link
        to={`/sign-in?next=${encodeURIComponent(`/details/${slug}`)}`}
        className="no-print text-sm text-ochre-deep underline"
      >
        Sign in to save this detail
      </Link>
    );
  }
  // Show the answer optimistically while the request is in flight.
  const pending = fetcher.formData?.get("intent");
  const isSaved = pending ? pending === "save" : fetcher.data && "saved" in fetcher.data ? fetcher.data.saved : saved;
  return (
    <fetcher.Form method="post" action={`/details/${slug}/save`} {...getFormProps(form)} className="no-print">
      <CsrfField />
      <input type="hidden" name="intent" value={isSaved ? "unsave" : "save"} />
      <button
        type="submit"
        className="rounded border border-rule px-3 py-1 text-sm"
        aria-pressed={isSaved}
        data-testid="save-detail"
      >
        {isSaved ? "Saved ✓ (forget)" : "Save this detail"}
      </button>
    </fetcher.Form>
  );
}
