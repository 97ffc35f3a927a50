// The one place that lists who may do what. Subscriber is not stored: it is derived from entitlements.
export const STAFF_ROLES = ["member", "editor", "reviewer", "admin"] as const;
export type StaffRole = (typeof STAFF_ROLES)[number];

// Each role includes the ones before it: a reviewer is an editor who may also approve others' work.
const RANK: Record<StaffRole, number> = { member: 0, editor: 1, reviewer: 2, admin: 3 };

export function roleAtLeast(role: StaffRole, needed: StaffRole): boolean {
  return RANK[role] >= RANK[needed];
}

export function isStaffRole(value: unknown): value is StaffRole {
  return typeof value === "string" && (STAFF_ROLES as readonly string[]).includes(value);
}
