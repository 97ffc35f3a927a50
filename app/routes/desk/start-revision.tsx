import { Form, Link, data, redirect } from "react-router";
import type { Route } from "./+types/start-revision";
import { requireCsrf } from "~/auth/csrf.server";
import { userContext } from "~/auth/guards.server";
import { CsrfField } from "~/components/csrf-field";
import { startRevisionPage } from "~/desk/desk-pages.server";
import { deskStep } from "~/desk/desk-step.server";
import { startRevision } from "~/desk/revisions.server";
import { REVISION_STATE_LABELS } from "~/vocabulary/revision-states";

export const meta: Route.MetaFunction = () => [{ title: "Revise a detail — Desk — Dryside" }];

export async function loader({ params }: Route.LoaderArgs) {
  const page = await startRevisionPage(params.slug);
  if (!page) throw data({ message: `No detail “${params.slug}”.` }, { status: 404 });
  return page;
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const user = context.get(userContext);
  await requireCsrf(request);
  return deskStep(
    async () => redirect(`/desk/revisions/${(await startRevision(user, params.slug)).revisionId}`),
    (error) => data({ message: error.message }, { status: error.status }),
  );
}

export default function StartRevision({ loaderData, actionData }: Route.ComponentProps) {
  const { slug, title, publishedNumber, open } = loaderData;
  return (
    <div className="max-w-prose space-y-4">
      <h1 className="text-3xl">Revise “{title}”</h1>
      {actionData?.message ? (
        <p role="alert" className="text-stop">
          {actionData.message}
        </p>
      ) : null}
      {open ? (
        <p>
          Revision {open.number} is already open ({REVISION_STATE_LABELS[open.state]}, by {open.authorName}).{" "}
          <Link to={`/desk/revisions/${open.id}`}>Open it</Link>.
        </p>
      ) : (
        <Form method="post" className="space-y-3">
          <CsrfField />
          <p>
            This starts revision {(publishedNumber ?? 0) + 1} as your draft, copied from the published revision{" "}
            {publishedNumber ?? "—"}. The published page stays as it is until a reviewer approves the new one.
          </p>
          <button type="submit" className="rounded bg-ochre px-4 py-2 font-medium text-white hover:bg-ochre-deep">
            Start a new revision
          </button>
        </Form>
      )}
      <p className="text-sm">
        <Link to={`/details/${slug}`}>Back to the published page</Link>
      </p>
    </div>
  );
}
