import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from "sequelize";
import type { AuthToken } from "./auth-token.server";
import type { Download } from "./download.server";
import type { Entitlement } from "./entitlement.server";
import type { Payment } from "./payment.server";
import type { SavedDetail } from "./saved-detail.server";
import type { Session } from "./session.server";
import { sequelize } from "~/db/sequelize.server";
import { STAFF_ROLES, type StaffRole } from "~/vocabulary/roles";

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare displayName: string;
  declare passwordHash: string;
  declare role: CreationOptional<StaffRole>;
  declare emailVerifiedAt: Date | null;
  declare stripeCustomerId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare sessions?: NonAttribute<Session[]>;
  declare authTokens?: NonAttribute<AuthToken[]>;
  declare entitlements?: NonAttribute<Entitlement[]>;
  declare payments?: NonAttribute<Payment[]>;
  declare downloads?: NonAttribute<Download[]>;
  declare savedDetails?: NonAttribute<SavedDetail[]>;
}

User.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    displayName: { type: DataTypes.STRING(120), allowNull: false },
    passwordHash: { type: DataTypes.STRING(255), allowNull: false },
    role: { type: DataTypes.ENUM(...STAFF_ROLES), allowNull: false, defaultValue: "member" },
    emailVerifiedAt: { type: DataTypes.DATE(3), allowNull: true },
    stripeCustomerId: { type: DataTypes.STRING(64), allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "users" },
);
