import { DataTypes, Model, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "~/db/sequelize.server";

export type PaymentEventResult = "applied" | "ignored" | "failed";

/** Every verified webhook event with what processing it did: the idempotency key and the admin's log. */
export class PaymentEvent extends Model<InferAttributes<PaymentEvent>, InferCreationAttributes<PaymentEvent>> {
  declare id: string;
  declare type: string;
  declare stripeCreated: number;
  declare payload: unknown;
  declare result: PaymentEventResult;
  declare message: string | null;
  declare receivedAt: Date;
}

PaymentEvent.init(
  {
    id: { type: DataTypes.STRING(80), primaryKey: true },
    type: { type: DataTypes.STRING(80), allowNull: false },
    stripeCreated: {
      type: DataTypes.BIGINT,
      allowNull: false,
      get() {
        return Number(this.getDataValue("stripeCreated"));
      },
    },
    payload: { type: DataTypes.JSON, allowNull: false },
    result: { type: DataTypes.ENUM("applied", "ignored", "failed"), allowNull: false },
    message: { type: DataTypes.STRING(500), allowNull: true },
    receivedAt: { type: DataTypes.DATE(3), allowNull: false },
  },
  { sequelize, tableName: "payment_events", timestamps: false },
);
