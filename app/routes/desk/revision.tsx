import { parseWithZod } from "@conform-to/zod/v4";
import { Link, data, redirect, type ShouldRevalidateFunctionArgs } from "react-router";
import type { Route } from "./+types/revision";
import { requireCsrf } from "~/auth/csrf.server";
import { userContext } from "~/auth/guards.server";
import { DraftEditor } from "~/components/desk/draft-editor";
import { UploadPanel } from "~/components/desk/upload-panel";
import { draftPostSchema, valuesFromFrontMatter } from "~/desk/draft-form";
import { editorChoices } from "~/desk/editor-data.server";
import { deskStep, refusedForm } from "~/desk/desk-step.server";
import { commentsOn, loadRevision, saveRevision } from "~/desk/revisions.server";
import { uploadsOf } from "~/desk/uploads.server";
import { REVIEW_SECTION_LABELS } from "~/desk/review-sections";
import { unitsFor } from "~/preferences/units.server";
import { REVISION_STATE_LABELS, isEditableRevisionState } from "~/vocabulary/revision-states";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `${data?.values.title ?? "Revision"} — Desk — Dryside` },
];

// The preview and the site check change nothing: re-running this page's loader after them would only cost a query.
export function shouldRevalidate({ formAction, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) {
  return formAction?.startsWith("/desk/api/") ? false : defaultShouldRevalidate;
}

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = context.get(userContext);
  const found = await loadRevision(Number(params.id) || 0);
  if (!found) throw data({ message: "No such revision." }, { status: 404 });
  const { revision, detail } = found;
  const [choices, units, comments, uploads] = await Promise.all([
    editorChoices(),
    unitsFor(request),
    commentsOn(revision.id),
    uploadsOf(revision.id),
  ]);
  const editable = revision.authorId === user.id && isEditableRevisionState(revision.state);
  return {
    ...choices,
    units,
    comments,
    uploads,
    editable,
    revision: {
      id: revision.id,
      number: revision.number,
      state: revision.state,
      authorName: revision.authorName,
      mine: revision.authorId === user.id,
    },
    slug: detail.slug,
    published: Boolean(detail.publishedRevisionId && !detail.withdrawnAt),
    values: valuesFromFrontMatter(revision.frontMatter, revision.bodyMd),
    notice: new URL(request.url).searchParams.get("saved")
      ? "Saved."
      : new URL(request.url).searchParams.get("submitted")
        ? "Submitted for review."
        : null,
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = context.get(userContext);
  const form = await requireCsrf(request);
  const submission = parseWithZod(form, { schema: draftPostSchema });
  if (submission.status !== "success")
    return data({ result: submission.reply() }, { status: submission.status === "error" ? 400 : 200 });
  const { intent, ...values } = submission.value;
  return deskStep(async () => {
    const outcome = await saveRevision(user, Number(params.id) || 0, values, intent === "submit");
    if (!outcome.ok) return data({ result: submission.reply({ fieldErrors: outcome.errors }) }, { status: 400 });
    return redirect(`/desk/revisions/${outcome.revisionId}?${intent === "submit" ? "submitted" : "saved"}=1`);
  }, refusedForm(submission));
}

export default function RevisionEditor({ loaderData, actionData }: Route.ComponentProps) {
  const { revision, comments, uploads, editable, notice } = loaderData;
  const heading = `Revision ${revision.number} · ${REVISION_STATE_LABELS[revision.state]} · written by ${revision.authorName}`;
  return (
    <div className="space-y-10">
      {notice && !actionData ? (
        <p
          role="status"
          className="rounded border border-vapour/40 bg-vapour/5 px-3 py-2 text-sm text-vapour"
          data-testid="desk-notice"
        >
          {notice}
        </p>
      ) : null}
      {!editable ? (
        <p className="rounded border border-rule bg-sheet px-3 py-2 text-sm" data-testid="read-only-note">
          {revision.state === "in_review"
            ? "Waiting for review: the form is read-only until a reviewer answers."
            : revision.mine
              ? `This revision is ${REVISION_STATE_LABELS[revision.state]}.`
              : `Only ${revision.authorName} edits this revision.`}{" "}
          {loaderData.published ? (
            <Link to={`/desk/details/${loaderData.slug}/edit`}>Start or open the next revision</Link>
          ) : null}
        </p>
      ) : null}
      {comments.length ? (
        <section aria-labelledby="comments-heading" className="rounded border border-caution/50 bg-caution/5 p-4">
          <h2 id="comments-heading" className="text-xl">
            Reviewers' comments
          </h2>
          <ul className="mt-2 space-y-2 text-sm" data-testid="review-comments">
            {comments.map((comment) => (
              <li key={comment.id}>
                <span className="font-semibold">
                  {REVIEW_SECTION_LABELS[comment.section as keyof typeof REVIEW_SECTION_LABELS] ?? comment.section}:
                </span>{" "}
                {comment.body}{" "}
                <span className="text-xs text-graphite-soft">
                  — {comment.authorName}, {comment.at.slice(0, 10)}
                </span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <DraftEditor
        key={revision.id}
        mode="revision"
        heading={heading}
        revision={revision.number}
        values={loaderData.values}
        lastResult={actionData?.result}
        materials={loaderData.materials}
        sets={loaderData.sets}
        units={loaderData.units}
        editable={editable}
      />
      <UploadPanel revisionId={revision.id} uploads={uploads} editable={editable} />
      <p className="text-sm">
        <a href={`/desk/revisions/${revision.id}/export`} download>
          Export as Markdown
        </a>{" "}
        <span className="text-graphite-soft">(the content-file form of this revision)</span>
      </p>
    </div>
  );
}
