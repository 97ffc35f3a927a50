import { DataTypes } from "sequelize";
import type { Migration } from "../migrator.ts";

const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
};

export const accounts: Migration = {
  name: "2026-12-02-0001-accounts",
  async up({ queryInterface: qi }) {
    await qi.createTable("users", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      display_name: { type: DataTypes.STRING(120), allowNull: false },
      password_hash: { type: DataTypes.STRING(255), allowNull: false },
      role: { type: DataTypes.ENUM("member", "editor", "reviewer", "admin"), allowNull: false, defaultValue: "member" },
      email_verified_at: { type: DataTypes.DATE(3), allowNull: true },
      stripe_customer_id: { type: DataTypes.STRING(64), allowNull: true, unique: true },
      ...timestamps,
    });
    await qi.createTable("sessions", {
      id: { type: DataTypes.CHAR(43), primaryKey: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "users", key: "id" },
        onDelete: "CASCADE",
      },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      revoked_at: { type: DataTypes.DATE(3), allowNull: true },
      user_agent: { type: DataTypes.STRING(255), allowNull: true },
      ...timestamps,
    });
    await qi.createTable("auth_tokens", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "users", key: "id" },
        onDelete: "CASCADE",
      },
      purpose: { type: DataTypes.ENUM("verify-email", "reset-password"), allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      used_at: { type: DataTypes.DATE(3), allowNull: true },
      ...timestamps,
    });
    await qi.createTable("sign_in_attempts", {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      bucket: { type: DataTypes.STRING(300), allowNull: false },
      succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex("sign_in_attempts", ["bucket", "created_at"]);
    await qi.createTable("audit_events", {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      actor_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: "users", key: "id" },
        onDelete: "SET NULL",
      },
      action: { type: DataTypes.STRING(64), allowNull: false },
      subject_type: { type: DataTypes.STRING(32), allowNull: false },
      subject_id: { type: DataTypes.STRING(64), allowNull: false },
      details: { type: DataTypes.JSON, allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex("audit_events", ["subject_type", "subject_id"]);
  },
  async down({ queryInterface: qi }) {
    await qi.dropTable("audit_events");
    await qi.dropTable("sign_in_attempts");
    await qi.dropTable("auth_tokens");
    await qi.dropTable("sessions");
    await qi.dropTable("users");
  },
};
