import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "~/db/sequelize.server";

/** One attempt against a rate-limit bucket ("account:…" or "address:…"), kept in the database so every app server sees it. */
export class SignInAttempt extends Model<InferAttributes<SignInAttempt>, InferCreationAttributes<SignInAttempt>> {
  declare id: CreationOptional<number>;
  declare bucket: string;
  declare succeeded: boolean;
  declare createdAt: CreationOptional<Date>;
}

SignInAttempt.init(
  {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    bucket: { type: DataTypes.STRING(300), allowNull: false },
    succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
    createdAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "sign_in_attempts", updatedAt: false },
);
