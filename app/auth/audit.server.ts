import type { Transaction } from "sequelize";
import { AuditEvent, User } from "~/models/index.server";
import type { AuditDetails } from "~/models/audit-event.server";

export type AuditAction =
  | "user.signed_up"
  | "user.signed_in"
  | "user.email_verified"
  | "user.password_reset"
  | "user.role_changed"
  | "user.sessions_revoked"
  | "detail.published"
  | "detail.withdrawn"
  | "detail.superseded"
  | "material.updated";

export interface AuditEntry {
  actorId: number | null;
  action: AuditAction;
  subjectType: "user" | "detail" | "set" | "material";
  subjectId: string | number;
  details?: AuditDetails;
}

/** Pass the caller's transaction so the record commits or rolls back with the change it describes. */
export async function recordAudit(entry: AuditEntry, transaction?: Transaction): Promise<void> {
  await AuditEvent.create(
    {
      actorId: entry.actorId,
      action: entry.action,
      subjectType: entry.subjectType,
      subjectId: String(entry.subjectId),
      details: entry.details ?? null,
    },
    { transaction },
  );
}

export interface AuditRow {
  id: number;
  at: string;
  actor: string | null;
  action: string;
  subject: string;
  details: AuditDetails | null;
}

export async function listAuditEvents({
  limit = 100,
  subject,
}: {
  limit?: number;
  subject?: { type: string; id: string };
} = {}): Promise<AuditRow[]> {
  const rows = await AuditEvent.findAll({
    where: subject ? { subjectType: subject.type, subjectId: subject.id } : {},
    include: [{ model: User, as: "actor", attributes: ["displayName", "email"] }],
    order: [["id", "DESC"]],
    limit,
  });
  return rows.map((row) => {
    const actor = (row as AuditEvent & { actor?: User | null }).actor;
    return {
      id: row.id,
      at: row.createdAt.toISOString(),
      actor: actor ? `${actor.displayName} <${actor.email}>` : null,
      action: row.action,
      subject: `${row.subjectType} ${row.subjectId}`,
      details: typeof row.details === "string" ? (JSON.parse(row.details) as AuditDetails) : row.details,
    };
  });
}
