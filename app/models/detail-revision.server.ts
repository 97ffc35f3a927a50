import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from "sequelize";
import type { DetailFrontMatter } from "~/content/detail-schema";
import type { Detail } from "./detail.server";
import type { ReviewComment } from "./review-comment.server";
import type { Upload } from "./upload.server";
import type { User } from "./user.server";
import { sequelize } from "~/db/sequelize.server";
import { REVISION_STATES, type RevisionState } from "~/vocabulary/revision-states";

export class DetailRevision extends Model<InferAttributes<DetailRevision>, InferCreationAttributes<DetailRevision>> {
  declare id: CreationOptional<number>;
  declare detailId: number;
  declare number: number;
  declare state: RevisionState;
  declare title: string;
  declare summary: string;
  declare bodyMd: string;
  /** The validated front matter (metadata and layers) exactly as the content file holds it. */
  declare frontMatter: DetailFrontMatter;
  declare changeNote: string | null;
  declare authorId: number | null;
  declare authorName: string;
  declare reviewerId: CreationOptional<number | null>;
  declare reviewerName: CreationOptional<string | null>;
  declare submittedAt: CreationOptional<Date | null>;
  declare reviewedAt: CreationOptional<Date | null>;
  declare publishedAt: CreationOptional<Date | null>;
  declare contentHash: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare detail?: NonAttribute<Detail>;
  declare author?: NonAttribute<User | null>;
  declare reviewer?: NonAttribute<User | null>;
  declare comments?: NonAttribute<ReviewComment[]>;
  declare uploads?: NonAttribute<Upload[]>;
}

DetailRevision.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    detailId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    state: { type: DataTypes.ENUM(...REVISION_STATES), allowNull: false },
    title: { type: DataTypes.STRING(200), allowNull: false },
    summary: { type: DataTypes.TEXT, allowNull: false },
    bodyMd: { type: DataTypes.TEXT("medium"), allowNull: false },
    frontMatter: { type: DataTypes.JSON, allowNull: false },
    changeNote: { type: DataTypes.STRING(500), allowNull: true },
    authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    authorName: { type: DataTypes.STRING(120), allowNull: false },
    reviewerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    reviewerName: { type: DataTypes.STRING(120), allowNull: true },
    submittedAt: { type: DataTypes.DATE(3), allowNull: true },
    reviewedAt: { type: DataTypes.DATE(3), allowNull: true },
    publishedAt: { type: DataTypes.DATE(3), allowNull: true },
    contentHash: { type: DataTypes.CHAR(64), allowNull: false },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "detail_revisions" },
);
