import { QueryTypes } from "sequelize";
import { roleAtLeast, type StaffRole } from "~/vocabulary/roles";
import { Detail, DetailSet, sequelize } from "~/models/index.server";
import { jsonError } from "~/http/json";
import { premiumRefusal, type PremiumRefusal } from "./refusal";
import type { EntitlementKind } from "~/vocabulary/entitlements";
import { LIVE_ENTITLEMENT_SQL } from "~/vocabulary/entitlements.server";

export interface Viewer {
  id: number;
  role: StaffRole;
}

// An entitlement counts while live: ~/vocabulary/entitlements says which (isLive; the SQL form is LIVE_ENTITLEMENT_SQL).
/** Whether this viewer may read the full premium content of one detail. Free details need nothing. */
export async function canReadDetail(
  viewer: Viewer | null,
  detail: { id: number; tier: "free" | "premium" },
): Promise<boolean> {
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
  const rows = await sequelize.query(
    `SELECT 1 FROM entitlements e WHERE e.user_id = :userId AND e.kind = 'plan' AND ${LIVE_ENTITLEMENT_SQL} LIMIT 1`,
    {
      type: QueryTypes.SELECT,
      replacements: { userId: viewer.id },
    },
  );
  return rows.length > 0;
}

/** What a premium guard protects: one detail (its drawings, its site check) or one set's pack. */
export type PremiumContent =
  | { what: string; detail: { id: number; tier: "free" | "premium" } }
  | { what: string; set: { id: number; slug: string; title: string } };

/** The refusal for content this viewer may not read, naming the sets that would give access. */
export async function refusalFor(content: PremiumContent): Promise<PremiumRefusal> {
  if ("set" in content) return premiumRefusal(content.what, [content.set]);
  const sets = await DetailSet.findAll({
    attributes: ["slug", "title"],
    include: [{ model: Detail, as: "details", attributes: [], where: { id: content.detail.id }, required: true }],
    order: [["title", "ASC"]],
  });
  return premiumRefusal(content.what, sets);
}

/**
 * The premium guard: returns when the viewer may use the content, else throws the one refusal
 * (403, JSON `PremiumRefusal`). Pages that show a preview instead use `canReadDetail` and `refusalFor`.
 */
export async function requireEntitlement(viewer: Viewer | null, content: PremiumContent): Promise<void> {
  const allowed =
    "set" in content ? await canDownloadSet(viewer, content.set.id) : await canReadDetail(viewer, content.detail);
  if (allowed) return;
  const { error, message, ...details } = await refusalFor(content);
  throw jsonError(403, error, message, details);
}

async function canDownloadSet(viewer: Viewer | null, setId: number): Promise<boolean> {
  const allowed = await downloadableSetIds(viewer);
  return allowed === "all" || allowed.has(setId);
}
