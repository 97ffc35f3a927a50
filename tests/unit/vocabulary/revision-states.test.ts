import { expect, test } from "vitest";
import {
  EDITABLE_REVISION_STATES,
  OPEN_REVISION_STATES,
  PUBLIC_REVISION_STATES,
  REVISION_STATES,
  REVISION_STATE_LABELS,
  isEditableRevisionState,
  isOpenRevisionState,
  isRevisionState,
} from "~/vocabulary/revision-states";

test("the states a revision passes through, as the database column lists them", () => {
  // db/migrations/2026-12-02-0002-catalogue.ts created detail_revisions.state with exactly these values.
  expect(REVISION_STATES).toEqual(["draft", "in_review", "changes_requested", "published", "superseded", "withdrawn"]);
});

test("open states are the ones before publication; editable ones are open and not waiting for a reviewer", () => {
  expect(OPEN_REVISION_STATES).toEqual(["draft", "in_review", "changes_requested"]);
  expect(EDITABLE_REVISION_STATES).toEqual(["draft", "changes_requested"]);
  for (const state of REVISION_STATES) {
    if (isEditableRevisionState(state)) expect(isOpenRevisionState(state), state).toBe(true);
  }
  expect(isEditableRevisionState("in_review")).toBe(false);
});

test("readers see only states that were once the published text", () => {
  expect(PUBLIC_REVISION_STATES).toEqual(["published", "superseded", "withdrawn"]);
  for (const state of PUBLIC_REVISION_STATES) expect(isOpenRevisionState(state)).toBe(false);
});

test("every state has a label in plain words", () => {
  expect(Object.keys(REVISION_STATE_LABELS)).toEqual([...REVISION_STATES]);
  for (const label of Object.values(REVISION_STATE_LABELS)) expect(label).not.toContain("_");
  expect(REVISION_STATE_LABELS.changes_requested).toBe("changes requested");
  expect(isRevisionState("in_review")).toBe(true);
  expect(isRevisionState("approved")).toBe(false);
});
