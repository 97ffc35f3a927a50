// The states a detail revision passes through. The detail_revisions.state column holds this list
// (db/migrations/2026-12-02-0002-catalogue.ts): a new state needs a migration.
//
// draft → in_review → (changes_requested → in_review)* → published → superseded | withdrawn

export const REVISION_STATES = [
  "draft",
  "in_review",
  "changes_requested",
  "published",
  "superseded",
  "withdrawn",
] as const;

export type RevisionState = (typeof REVISION_STATES)[number];

export const REVISION_STATE_LABELS: Record<RevisionState, string> = {
  draft: "draft",
  in_review: "in review",
  changes_requested: "changes requested",
  published: "published",
  superseded: "superseded",
  withdrawn: "withdrawn",
};

/** In progress: a detail has at most one open revision, so a second one is not started beside it. */
export const OPEN_REVISION_STATES = [
  "draft",
  "in_review",
  "changes_requested",
] as const satisfies readonly RevisionState[];

/** The author may still change it (a revision in review is frozen until the reviewer answers). */
export const EDITABLE_REVISION_STATES = ["draft", "changes_requested"] as const satisfies readonly RevisionState[];

/** Was the published text at some time: readers see these in a detail's history. */
export const PUBLIC_REVISION_STATES = [
  "published",
  "superseded",
  "withdrawn",
] as const satisfies readonly RevisionState[];

export function isRevisionState(value: unknown): value is RevisionState {
  return typeof value === "string" && (REVISION_STATES as readonly string[]).includes(value);
}

export function isOpenRevisionState(state: RevisionState): boolean {
  return (OPEN_REVISION_STATES as readonly RevisionState[]).includes(state);
}

export function isEditableRevisionState(state: RevisionState): boolean {
  return (EDITABLE_REVISION_STATES as readonly RevisionState[]).includes(state);
}
