import { DataTypes } from "sequelize";
import type { Migration } from "../migrator.ts";

export const uploads: Migration = {
  name: "2026-12-03-0005-uploads",
  async up({ queryInterface: qi }) {
    // Drawings and photos attached to a revision. The bytes are in blob storage; this row says whose,
    // what type the bytes really are, and where they are kept.
    await qi.createTable("uploads", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      revision_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "detail_revisions", key: "id" },
        onDelete: "CASCADE",
      },
      uploader_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: "users", key: "id" },
        onDelete: "SET NULL",
      },
      original_name: { type: DataTypes.STRING(200), allowNull: false },
      content_type: { type: DataTypes.STRING(40), allowNull: false },
      byte_size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      sha256: { type: DataTypes.CHAR(64), allowNull: false },
      storage_key: { type: DataTypes.STRING(200), allowNull: false, unique: true },
      caption: { type: DataTypes.STRING(300), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
  },
  async down({ queryInterface: qi }) {
    await qi.dropTable("uploads");
  },
};
