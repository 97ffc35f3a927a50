import { DataTypes } from "sequelize";
import type { Migration } from "../migrator.ts";

export const payments: Migration = {
  name: "2026-12-02-0004-payments",
  async up({ queryInterface: qi }) {
    // One row per money actually received (a paid invoice or a paid one-time checkout): the receipts list.
    // Unique service ids make recording a payment idempotent when a webhook arrives twice.
    await qi.createTable("payments", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "users", key: "id" },
        onDelete: "CASCADE",
      },
      kind: { type: DataTypes.ENUM("plan", "set"), allowNull: false },
      description: { type: DataTypes.STRING(200), allowNull: false },
      amount_cents: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      stripe_invoice_id: { type: DataTypes.STRING(80), allowNull: true, unique: true },
      stripe_checkout_session_id: { type: DataTypes.STRING(80), allowNull: true, unique: true },
      paid_at: { type: DataTypes.DATE(3), allowNull: false },
      receipt_sent_at: { type: DataTypes.DATE(3), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex("payments", ["user_id", "paid_at"]);
    await qi.addIndex("downloads", ["user_id", "created_at"]);
  },
  async down({ queryInterface: qi }) {
    // The new index also serves downloads.user_id's foreign key; give the key its own index back first.
    await qi.addIndex("downloads", ["user_id"]);
    await qi.removeIndex("downloads", ["user_id", "created_at"]);
    await qi.dropTable("payments");
  },
};
