import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from "sequelize";
import { sequelize } from "~/db/sequelize.server";
import type { DetailRevision } from "./detail-revision.server";
import type { User } from "./user.server";
import type { ReviewSection } from "~/desk/review-sections";

/** A reviewer's note on one section of a submitted revision (table from the catalogue migration). */
export class ReviewComment extends Model<InferAttributes<ReviewComment>, InferCreationAttributes<ReviewComment>> {
  declare id: CreationOptional<number>;
  declare revisionId: number;
  declare authorId: number | null;
  declare section: ReviewSection;
  declare body: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare revision?: NonAttribute<DetailRevision>;
  declare author?: NonAttribute<User | null>;
}

ReviewComment.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    revisionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    section: { type: DataTypes.STRING(60), allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "review_comments" },
);
