import { QueryTypes } from "sequelize";
import { roleAtLeast, type StaffRole } from "~/vocabulary/roles";
import { sequelize } from "~/models/index.server";
import type { EntitlementKind } from "~/vocabulary/entitlements";
import { LIVE_ENTITLEMENT_SQL } from "~/vocabulary/entitlements.server";

export interface Viewer {
  id: number;
  role: StaffRole;
}

// An entitlement counts while live: ~/vocabulary/entitlements says which (isLive; the SQL form is LIVE_ENTITLEMENT_SQL).
/** Whether this viewer may read the full premium content of one detail. Free details need nothing. */
export async function canReadDetail(viewer: Viewer | null, detail: { id: number; tier: "free" | "premium" }): Promise<boolean> {
  if (detail.tier === "free") return true;
  if (!viewer) return false;
  // Editors and reviewers must read what they review.
  if (roleAtLeast(viewer.role, "editor")) return true;
  const rows = await sequelize.query<{ ok: number }>(
    `SELECT 1 AS ok FROM entitlements e
      WHERE e.user_id = :userId AND ${LIVE_ENTITLEMENT_SQL}
        AND (e.kind = 'plan' OR EXISTS (SELECT 1 FROM detail_set_members m WHERE m.set_id = e.set_id AND m.detail_id = :detailId))
      LIMIT 1`,
    { type: QueryTypes.SELECT, replacements: { userId: viewer.id, detailId: detail.id } },
  );
  return rows.length > 0;
}

/** Sets the viewer may download as packs. */
export async function downloadableSetIds(viewer: Viewer | null): Promise<Set<number> | "all"> {
  if (!viewer) return new Set();
  if (roleAtLeast(viewer.role, "editor")) return "all";
  const rows = await sequelize.query<{ kind: EntitlementKind; set_id: number | null }>(
    `SELECT e.kind, e.set_id FROM entitlements e WHERE e.user_id = :userId AND ${LIVE_ENTITLEMENT_SQL}`,
    { type: QueryTypes.SELECT, replacements: { userId: viewer.id } },
  );
  if (rows.some((row) => row.kind === "plan")) return "all";
  return new Set(rows.map((row) => Number(row.set_id)));
}

/** Whether the viewer holds a live plan (not only bought sets): a second plan is not sold to them. */
export async function hasLivePlan(viewer: Viewer | null): Promise<boolean> {
  if (!viewer) return false;
  const rows = await sequelize.query(`SELECT 1 FROM entitlements e WHERE e.user_id = :userId AND e.kind = 'plan' AND ${LIVE_ENTITLEMENT_SQL} LIMIT 1`, {
    type: QueryTypes.SELECT,
    replacements: { userId: viewer.id },
  });
  return rows.length > 0;
}
