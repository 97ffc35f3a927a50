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

/** One pack download: who took which set, in which build. */
export class Download extends Model<InferAttributes<Download>, InferCreationAttributes<Download>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare setId: number;
  declare packKey: string;
  declare createdAt: CreationOptional<Date>;

  declare user?: NonAttribute<User>;
  declare detailSet?: NonAttribute<DetailSet>;
}

Download.init(
  {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    setId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    packKey: { type: DataTypes.STRING(200), allowNull: false },
    createdAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "downloads", updatedAt: false },
);
