import { expect, test } from "vitest";
import { STAFF_ROLES, STAFF_ROLE_DESCRIPTIONS, STAFF_ROLE_LABELS, isStaffRole, roleAtLeast } from "~/vocabulary/roles";

test("roles are ordered: each includes the ones before it", () => {
  expect(STAFF_ROLES).toEqual(["member", "editor", "reviewer", "admin"]);
  STAFF_ROLES.forEach((role, i) => {
    STAFF_ROLES.forEach((needed, j) => expect(roleAtLeast(role, needed), `${role} ≥ ${needed}`).toBe(i >= j));
  });
});

test("only listed roles pass the guard; subscriber is not a stored role", () => {
  for (const role of STAFF_ROLES) expect(isStaffRole(role)).toBe(true);
  for (const junk of ["subscriber", "Admin", "", null, 1]) expect(isStaffRole(junk)).toBe(false);
});

test("every role has a label and a description", () => {
  expect(Object.keys(STAFF_ROLE_LABELS)).toEqual([...STAFF_ROLES]);
  expect(Object.keys(STAFF_ROLE_DESCRIPTIONS)).toEqual([...STAFF_ROLES]);
});
