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

/** A signed-in browser. The id column holds a SHA-256 of the cookie's session id, never the id itself. */
export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
  declare id: string;
  declare userId: number;
  declare expiresAt: Date;
  declare revokedAt: CreationOptional<Date | null>;
  declare userAgent: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User>;
}

Session.init(
  {
    id: { type: DataTypes.CHAR(43), primaryKey: true },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    expiresAt: { type: DataTypes.DATE(3), allowNull: false },
    revokedAt: { type: DataTypes.DATE(3), allowNull: true },
    userAgent: { type: DataTypes.STRING(255), allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "sessions" },
);
