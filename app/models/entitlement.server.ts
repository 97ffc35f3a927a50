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
import type { DetailSet } from "./detail-set.server";
import {
  ENTITLEMENT_KINDS,
  ENTITLEMENT_STATUSES,
  type EntitlementKind,
  type EntitlementStatus,
} from "~/vocabulary/entitlements";

/** A user's right to premium content: a plan (all premium sets) or one bought set. Written only by payment webhooks. */
export class Entitlement extends Model<InferAttributes<Entitlement>, InferCreationAttributes<Entitlement>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare kind: EntitlementKind;
  declare planSlug: string | null;
  declare setId: number | null;
  declare status: EntitlementStatus;
  /** Null for a bought set: it does not lapse. */
  declare currentPeriodEnd: Date | null;
  declare cancelAtPeriodEnd: CreationOptional<boolean>;
  declare stripeCheckoutSessionId: string | null;
  declare stripeSubscriptionId: string | null;
  /** `created` (unix seconds) of the newest event applied: older events must not roll the row back. */
  declare lastEventCreated: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User>;
  declare detailSet?: NonAttribute<DetailSet | null>;
}

Entitlement.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    kind: { type: DataTypes.ENUM(...ENTITLEMENT_KINDS), allowNull: false },
    planSlug: { type: DataTypes.STRING(40), allowNull: true },
    setId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    status: { type: DataTypes.ENUM(...ENTITLEMENT_STATUSES), allowNull: false },
    currentPeriodEnd: { type: DataTypes.DATE(3), allowNull: true },
    cancelAtPeriodEnd: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    stripeCheckoutSessionId: { type: DataTypes.STRING(80), allowNull: true, unique: true },
    stripeSubscriptionId: { type: DataTypes.STRING(80), allowNull: true, unique: true },
    // BIGINT comes back as a string from the driver; the getter keeps the declared number type honest.
    lastEventCreated: {
      type: DataTypes.BIGINT,
      allowNull: true,
      get() {
        const raw = this.getDataValue("lastEventCreated") as number | string | null;
        return raw === null ? null : Number(raw);
      },
    },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "entitlements" },
);
