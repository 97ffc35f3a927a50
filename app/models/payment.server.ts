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
import { ENTITLEMENT_KINDS, type EntitlementKind } from "~/vocabulary/entitlements";

/** Money received: a paid plan invoice or a paid one-time set checkout. Each one gets a receipt. */
export class Payment extends Model<InferAttributes<Payment>, InferCreationAttributes<Payment>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare kind: EntitlementKind;
  declare description: string;
  declare amountCents: number;
  declare currency: string;
  declare stripeInvoiceId: string | null;
  declare stripeCheckoutSessionId: string | null;
  declare paidAt: Date;
  declare receiptSentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User>;
}

Payment.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    kind: { type: DataTypes.ENUM(...ENTITLEMENT_KINDS), allowNull: false },
    description: { type: DataTypes.STRING(200), allowNull: false },
    amountCents: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    currency: { type: DataTypes.CHAR(3), allowNull: false },
    stripeInvoiceId: { type: DataTypes.STRING(80), allowNull: true, unique: true },
    stripeCheckoutSessionId: { type: DataTypes.STRING(80), allowNull: true, unique: true },
    paidAt: { type: DataTypes.DATE(3), allowNull: false },
    receiptSentAt: { type: DataTypes.DATE(3), allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "payments" },
);
