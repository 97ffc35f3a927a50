// The one place that lists who may do what. Subscriber is not stored: it is derived from entitlements.
// The users.role column holds this list (db/migrations/2026-12-02-0001-accounts.ts): a new role needs a migration.
export const STAFF_ROLES = ["member", "editor", "reviewer", "admin"] as const;
export type StaffRole = (typeof STAFF_ROLES)[number];

// Each role includes the ones before it: a reviewer is an editor who may also approve others' work.
const RANK: Record<StaffRole, number> = { member: 0, editor: 1, reviewer: 2, admin: 3 };

/** Short names, for lists and menus. */
export const STAFF_ROLE_LABELS: Record<StaffRole, string> = {
  member: "Member",
  editor: "Editor",
  reviewer: "Reviewer",
  admin: "Admin",
};

/** What each role may do, in a sentence fragment for the account page. */
export const STAFF_ROLE_DESCRIPTIONS: Record<StaffRole, string> = {
  member: "Member",
  editor: "Editor — writes and revises details",
  reviewer: "Reviewer — may approve others' submissions",
  admin: "Admin",
};

export function roleAtLeast(role: StaffRole, needed: StaffRole): boolean {
  return RANK[role] >= RANK[needed];
}

export function isStaffRole(value: unknown): value is StaffRole {
  return typeof value === "string" && (STAFF_ROLES as readonly string[]).includes(value);
}
