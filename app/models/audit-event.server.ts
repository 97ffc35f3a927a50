import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from "sequelize";
import { sequelize } from "~/db/sequelize.server";
import type { User } from "./user.server";

export type AuditDetails = Record<string, string | number | boolean | null>;

/** An append-only record of who did what to which subject (role changes, sign-ins, publications). */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare actorId: number | null;
  declare action: string;
  declare subjectType: string;
  declare subjectId: string;
  declare details: AuditDetails | null;
  declare createdAt: CreationOptional<Date>;

  declare actor?: NonAttribute<User | null>;
}

AuditEvent.init(
  {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    action: { type: DataTypes.STRING(64), allowNull: false },
    subjectType: { type: DataTypes.STRING(32), allowNull: false },
    subjectId: { type: DataTypes.STRING(64), allowNull: false },
    details: { type: DataTypes.JSON, allowNull: true },
    createdAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "audit_events", updatedAt: false },
);
