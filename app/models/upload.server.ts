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

export const UPLOAD_TYPES = ["image/svg+xml", "image/png", "image/jpeg", "application/pdf"] as const;
export type UploadType = (typeof UPLOAD_TYPES)[number];

/** A drawing or photo attached to one revision; the bytes live in blob storage under `storageKey`. */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<number>;
  declare revisionId: number;
  declare uploaderId: number | null;
  /** The name the editor's file had, for display and downloads only; never a path. */
  declare originalName: string;
  /** The type found in the bytes, not the one the browser claimed. */
  declare contentType: UploadType;
  declare byteSize: number;
  declare sha256: string;
  declare storageKey: string;
  declare caption: string | null;
  declare createdAt: CreationOptional<Date>;

  declare revision?: NonAttribute<DetailRevision>;
  declare uploader?: NonAttribute<User | null>;
}

Upload.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    revisionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    uploaderId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    originalName: { type: DataTypes.STRING(200), allowNull: false },
    contentType: { type: DataTypes.STRING(40), allowNull: false },
    byteSize: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    storageKey: { type: DataTypes.STRING(200), allowNull: false },
    caption: { type: DataTypes.STRING(300), allowNull: true },
    createdAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "uploads", updatedAt: false },
);
