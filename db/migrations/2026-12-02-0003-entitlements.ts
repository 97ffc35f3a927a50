import { DataTypes } from "sequelize";
import type { Migration } from "../migrator.ts";

export const entitlements: Migration = {
  name: "2026-12-02-0003-entitlements",
  async up({ queryInterface: qi }) {
    // Granted, renewed and revoked only by verified payment webhooks.
    await qi.createTable("entitlements", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "users", key: "id" },
        onDelete: "CASCADE",
      },
      kind: { type: DataTypes.ENUM("plan", "set"), allowNull: false },
      plan_slug: { type: DataTypes.STRING(40), allowNull: true },
      set_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: "detail_sets", key: "id" },
        onDelete: "CASCADE",
      },
      status: { type: DataTypes.ENUM("active", "past_due", "canceled", "expired"), allowNull: false },
      current_period_end: { type: DataTypes.DATE(3), allowNull: true },
      cancel_at_period_end: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      stripe_checkout_session_id: { type: DataTypes.STRING(80), allowNull: true, unique: true },
      stripe_subscription_id: { type: DataTypes.STRING(80), allowNull: true, unique: true },
      last_event_created: { type: DataTypes.BIGINT, allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex("entitlements", ["user_id", "status"]);
    await qi.createTable("payment_events", {
      id: { type: DataTypes.STRING(80), primaryKey: true },
      type: { type: DataTypes.STRING(80), allowNull: false },
      stripe_created: { type: DataTypes.BIGINT, allowNull: false },
      payload: { type: DataTypes.JSON, allowNull: false },
      result: { type: DataTypes.ENUM("applied", "ignored", "failed"), allowNull: false },
      message: { type: DataTypes.STRING(500), allowNull: true },
      received_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex("payment_events", ["received_at"]);
    await qi.createTable("downloads", {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "users", key: "id" },
        onDelete: "CASCADE",
      },
      set_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "detail_sets", key: "id" },
        onDelete: "CASCADE",
      },
      pack_key: { type: DataTypes.STRING(200), allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
  },
  async down({ queryInterface: qi }) {
    await qi.dropTable("downloads");
    await qi.dropTable("payment_events");
    await qi.dropTable("entitlements");
  },
};
