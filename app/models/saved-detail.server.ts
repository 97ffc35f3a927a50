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
import type { Detail } from "./detail.server";

/** A member's bookmark on a detail; savers get an e-mail when a new revision is published. */
export class SavedDetail extends Model<InferAttributes<SavedDetail>, InferCreationAttributes<SavedDetail>> {
  declare userId: number;
  declare detailId: number;
  declare createdAt: CreationOptional<Date>;

  declare user?: NonAttribute<User>;
  declare detail?: NonAttribute<Detail>;
}

SavedDetail.init(
  {
    userId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
    detailId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
    createdAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "saved_details", updatedAt: false },
);
