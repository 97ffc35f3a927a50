import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

export const REVISION_STATES = ["draft", "in_review", "changes_requested", "published", "superseded", "withdrawn"] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

export class DetailRevision extends Model<InferAttributes<DetailRevision>, InferCreationAttributes<DetailRevision>> {
  declare id: CreationOptional<number>;
  declare detailId: number;
  declare number: number;
  declare state: RevisionState;
  declare title: string;
  declare summary: string;
  declare bodyMd: string;
  /** The validated front matter (metadata and layers) exactly as the content file holds it. */
  declare frontMatter: unknown;
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

  static initModel(sequelize: Sequelize) {
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
  }
}
