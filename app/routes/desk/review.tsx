import { getFormProps, getTextareaProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form, Link, data, redirect } from "react-router";
import type { Route } from "./+types/review";
import { requireCsrf } from "~/auth/csrf.server";
import { requireRole } from "~/auth/guards.server";
import { CsrfField } from "~/components/csrf-field";
import { FieldError, withoutKey } from "~/components/form-field";
import { LayerTable } from "~/components/layer-table";
import { reviewFormSchema } from "~/desk/review-form";
import { REVIEW_SECTIONS, REVIEW_SECTION_LABELS, type ReviewSection } from "~/desk/review-sections";
import { reviewPage } from "~/desk/desk-pages.server";
import { deskStep, refusedForm } from "~/desk/desk-step.server";
import { approveAndPublish, requestChanges } from "~/desk/revisions.server";
import { unitsFor } from "~/preferences/units.server";

export const meta: Route.MetaFunction = ({ data }) => [
  { title: `Review: ${data?.title ?? "revision"} — Desk — Dryside` },
];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = requireRole(request, context, "reviewer");
  const page = await reviewPage(user, Number(params.id) || 0, await unitsFor(request));
  if (!page) throw data({ message: "No such revision." }, { status: 404 });
  return page;
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = requireRole(request, context, "reviewer");
  const form = await requireCsrf(request);
  const submission = parseWithZod(form, { schema: reviewFormSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const { intent, comments } = submission.value;
  const id = Number(params.id) || 0;
  return deskStep(async () => {
    if (intent === "approve") {
      const published = await approveAndPublish(user, id, { comments });
      return redirect(`/details/${published.slug}?published=${published.number}`);
    }
    await requestChanges(user, id, { comments });
    return redirect(`/desk?sent-back=${id}`);
  }, refusedForm(submission));
}

const FACT_LABELS: [keyof Route.ComponentProps["loaderData"]["front"], string][] = [
  ["assembly", "Assembly"],
  ["substrate", "Substrate"],
  ["below_grade", "Below grade"],
  ["strategy", "Strategy"],
  ["zones", "Zones"],
  ["tier", "Tier"],
  ["sets", "Sets"],
];

export default function Review({ loaderData, actionData }: Route.ComponentProps) {
  const r = loaderData;
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: reviewFormSchema }),
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
  });
  const comments = fields.comments.getFieldset();
  return (
    <div className="space-y-8">
      <header>
        <p className="text-xs uppercase tracking-wide text-graphite-soft">
          <Link to="/desk">Desk</Link> / review
        </p>
        <h1 className="text-3xl">{r.title}</h1>
        <p className="mt-2 text-graphite-soft">{r.summary}</p>
        <p className="mt-2 text-sm" data-testid="review-status">
          Revision {r.number} by {r.authorName} · {r.state.replace("_", " ")}
          {r.changeNote ? ` · “${r.changeNote}”` : ""}
        </p>
      </header>
      {form.errors?.length ? (
        <p
          id={form.errorId}
          role="alert"
          className="rounded border border-stop/40 bg-stop/5 px-3 py-2 text-sm text-stop"
          data-testid="review-error"
        >
          {form.errors.join(" ")}
        </p>
      ) : null}
      {r.own ? (
        <p className="rounded border border-caution/50 bg-caution/5 px-3 py-2 text-sm" data-testid="own-revision">
          You wrote this revision: another reviewer must approve or send it back.
        </p>
      ) : null}

      <section aria-labelledby="changes-heading" className="space-y-3">
        <h2 id="changes-heading" className="text-xl">
          {r.comparedWith
            ? `What changed since revision ${r.comparedWith}`
            : "A new detail: nothing published to compare with"}
        </h2>
        {r.changes.length ? (
          <ul className="list-disc pl-6 text-sm" data-testid="change-list">
            {r.changes.map((change) => (
              <li key={change}>{change}</li>
            ))}
          </ul>
        ) : null}
        {r.bodyDiff.length ? (
          <pre
            className="overflow-x-auto rounded border border-rule bg-sheet p-3 text-xs leading-relaxed"
            data-testid="body-diff"
          >
            {r.bodyDiff.map((line, i) =>
              line.kind === "gap" ? (
                <div key={i} className="text-graphite-soft">
                  ⋯ {line.count} unchanged line{line.count > 1 ? "s" : ""}
                </div>
              ) : (
                <div
                  key={i}
                  className={
                    line.kind === "added"
                      ? "bg-vapour/10 text-vapour"
                      : line.kind === "removed"
                        ? "bg-stop/10 text-stop line-through"
                        : ""
                  }
                  data-kind={line.kind}
                >
                  {line.kind === "added" ? "+ " : line.kind === "removed" ? "− " : "  "}
                  {line.text}
                </div>
              ),
            )}
          </pre>
        ) : null}
      </section>

      <section aria-labelledby="meta-heading">
        <h2 id="meta-heading" className="text-xl">
          Metadata
        </h2>
        <dl className="mt-2 grid grid-cols-[10rem_1fr] gap-y-1 text-sm">
          {FACT_LABELS.map(([key, label]) => (
            <div key={key} className="contents">
              <dt className="text-graphite-soft">{label}</dt>
              <dd>
                {Array.isArray(r.front[key]) ? (r.front[key] as string[]).join(", ") || "—" : String(r.front[key])}
              </dd>
            </div>
          ))}
        </dl>
      </section>
      <section aria-labelledby="layers-heading">
        <h2 id="layers-heading" className="mb-2 text-xl">
          Layers
        </h2>
        <LayerTable layers={r.layers} result={null} units={r.units} />
      </section>
      <section
        className="prose prose-stone max-w-none prose-headings:font-serif"
        // biome-ignore lint/security/noDangerouslySetInnerHtml: the body is rendered by marked and sanitised by DOMPurify on the server (app/markdown/render.server.ts)
        dangerouslySetInnerHTML={{ __html: r.bodyHtml }}
      />
      <section aria-labelledby="refs-heading">
        <h2 id="refs-heading" className="text-xl">
          References
        </h2>
        <ul className="mt-2 list-disc pl-6 text-sm">
          {r.front.references.map((ref) => (
            <li key={ref}>{ref}</li>
          ))}
        </ul>
      </section>
      {r.uploads.length ? (
        <section aria-labelledby="files-heading">
          <h2 id="files-heading" className="text-xl">
            Drawings and photos
          </h2>
          <ul className="mt-2 text-sm">
            {r.uploads.map((u) => (
              <li key={u.id}>
                <a href={u.href} target="_blank" rel="noreferrer">
                  {u.name}
                </a>
                {u.caption ? ` — ${u.caption}` : ""}
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      {r.comments.length ? (
        <section aria-labelledby="history-heading">
          <h2 id="history-heading" className="text-xl">
            Earlier comments
          </h2>
          <ul className="mt-2 space-y-1 text-sm" data-testid="review-comments">
            {r.comments.map((c) => (
              <li key={c.id}>
                <span className="font-semibold">{REVIEW_SECTION_LABELS[c.section as ReviewSection] ?? c.section}:</span>{" "}
                {c.body} <span className="text-xs text-graphite-soft">— {c.authorName}</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      {r.canDecide ? (
        <Form
          method="post"
          {...getFormProps(form)}
          className="space-y-4 rounded border border-rule bg-sheet p-4"
          data-testid="review-form"
        >
          <CsrfField />
          <h2 className="text-xl">Your review</h2>
          <p className="text-sm text-graphite-soft">
            Comment on any section. “Request changes” needs at least one comment; approving publishes this revision at
            once and e-mails everyone who saved the detail.
          </p>
          <fieldset
            className="grid gap-3 md:grid-cols-2"
            aria-describedby={fields.comments.errors ? fields.comments.errorId : undefined}
          >
            <legend className="sr-only">Comments by section</legend>
            {REVIEW_SECTIONS.map((section) => (
              <div key={section} className="flex flex-col gap-1 text-sm">
                <label htmlFor={comments[section].id}>{REVIEW_SECTION_LABELS[section]}</label>
                <textarea
                  key={comments[section].key}
                  {...withoutKey(getTextareaProps(comments[section]))}
                  rows={2}
                  className="rounded border border-rule bg-paper px-2 py-1"
                />
                <FieldError meta={comments[section]} />
              </div>
            ))}
          </fieldset>
          <FieldError meta={fields.comments} />
          <div className="flex gap-3">
            <button
              type="submit"
              name={fields.intent.name}
              value="request-changes"
              className="rounded border border-rule px-4 py-2"
            >
              Request changes
            </button>
            <button
              type="submit"
              name={fields.intent.name}
              value="approve"
              className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep"
            >
              Approve and publish
            </button>
          </div>
        </Form>
      ) : null}
    </div>
  );
}
