import { DataTypes } from "sequelize";
import type { Migration } from "../migrator.ts";

const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
};
const userRef = {
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: true,
  references: { model: "users", key: "id" },
  onDelete: "SET NULL",
} as const;

export const catalogue: Migration = {
  name: "2026-12-02-0002-catalogue",
  async up({ queryInterface: qi }) {
    await qi.createTable("materials", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(160), allowNull: false },
      family: { type: DataTypes.STRING(40), allowNull: false },
      properties: { type: DataTypes.JSON, allowNull: false },
      ...timestamps,
    });
    // `details` holds the searchable projection of the current published revision; the
    // revisions table is the history. Facet columns are plain indexed columns for fast counts.
    await qi.createTable("details", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      slug: { type: DataTypes.STRING(120), allowNull: false, unique: true },
      title: { type: DataTypes.STRING(200), allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      search_text: { type: DataTypes.TEXT, allowNull: false },
      assembly: { type: DataTypes.STRING(40), allowNull: false },
      substrate: { type: DataTypes.STRING(40), allowNull: false },
      below_grade: { type: DataTypes.STRING(40), allowNull: false },
      strategy: { type: DataTypes.STRING(40), allowNull: false },
      interior_class: { type: DataTypes.STRING(8), allowNull: false },
      tier: { type: DataTypes.ENUM("free", "premium"), allowNull: false },
      r_value_rsi: { type: DataTypes.DECIMAL(6, 3), allowNull: true },
      layer_strip: { type: DataTypes.JSON, allowNull: false },
      zones_label: { type: DataTypes.STRING(120), allowNull: false },
      published_revision_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      published_at: { type: DataTypes.DATE(3), allowNull: true },
      withdrawn_at: { type: DataTypes.DATE(3), allowNull: true },
      ...timestamps,
    });
    for (const column of [
      "assembly",
      "substrate",
      "below_grade",
      "strategy",
      "interior_class",
      "tier",
      "published_at",
    ]) {
      await qi.addIndex("details", [column]);
    }
    await qi.addIndex("details", {
      fields: ["title", "summary", "search_text"],
      type: "FULLTEXT",
      name: "details_fulltext",
    });
    await qi.createTable("detail_zones", {
      detail_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        primaryKey: true,
        references: { model: "details", key: "id" },
        onDelete: "CASCADE",
      },
      zone: { type: DataTypes.STRING(3), allowNull: false, primaryKey: true },
      zone_number: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
      regime: { type: DataTypes.CHAR(1), allowNull: true },
    });
    await qi.addIndex("detail_zones", ["zone_number", "detail_id"]);
    await qi.addIndex("detail_zones", ["regime", "detail_id"]);
    await qi.createTable("detail_revisions", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      detail_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "details", key: "id" },
        onDelete: "CASCADE",
      },
      number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      state: {
        type: DataTypes.ENUM("draft", "in_review", "changes_requested", "published", "superseded", "withdrawn"),
        allowNull: false,
      },
      title: { type: DataTypes.STRING(200), allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      body_md: { type: DataTypes.TEXT("medium"), allowNull: false },
      front_matter: { type: DataTypes.JSON, allowNull: false },
      change_note: { type: DataTypes.STRING(500), allowNull: true },
      author_id: userRef,
      author_name: { type: DataTypes.STRING(120), allowNull: false },
      reviewer_id: userRef,
      reviewer_name: { type: DataTypes.STRING(120), allowNull: true },
      submitted_at: { type: DataTypes.DATE(3), allowNull: true },
      reviewed_at: { type: DataTypes.DATE(3), allowNull: true },
      published_at: { type: DataTypes.DATE(3), allowNull: true },
      content_hash: { type: DataTypes.CHAR(64), allowNull: false },
      ...timestamps,
    });
    await qi.addIndex("detail_revisions", ["detail_id", "number"], { unique: true });
    await qi.addIndex("detail_revisions", ["state"]);
    await qi.createTable("review_comments", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      revision_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "detail_revisions", key: "id" },
        onDelete: "CASCADE",
      },
      author_id: userRef,
      section: { type: DataTypes.STRING(60), allowNull: false },
      body: { type: DataTypes.TEXT, allowNull: false },
      ...timestamps,
    });
    await qi.createTable("detail_sets", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
      title: { type: DataTypes.STRING(160), allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      price_cents: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      ...timestamps,
    });
    await qi.createTable("detail_set_members", {
      set_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        primaryKey: true,
        references: { model: "detail_sets", key: "id" },
        onDelete: "CASCADE",
      },
      detail_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        primaryKey: true,
        references: { model: "details", key: "id" },
        onDelete: "CASCADE",
      },
    });
    await qi.createTable("saved_details", {
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        primaryKey: true,
        references: { model: "users", key: "id" },
        onDelete: "CASCADE",
      },
      detail_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        primaryKey: true,
        references: { model: "details", key: "id" },
        onDelete: "CASCADE",
      },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.createTable("content_imports", {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      source: { type: DataTypes.STRING(200), allowNull: false },
      summary: { type: DataTypes.JSON, allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
  },
  async down({ queryInterface: qi }) {
    for (const table of [
      "content_imports",
      "saved_details",
      "detail_set_members",
      "detail_sets",
      "review_comments",
      "detail_revisions",
      "detail_zones",
      "details",
      "materials",
    ]) {
      await qi.dropTable(table);
    }
  },
};
