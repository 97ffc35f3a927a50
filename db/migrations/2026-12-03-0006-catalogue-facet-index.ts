import { DataTypes } from "sequelize";
import type { Migration } from "../migrator.ts";

// Facet counting reads every live detail once. Zones and regimes become bit masks on the details row,
// the facet columns become ASCII with binary collation (they hold slugs; Unicode collation made each
// comparison costly), and one covering index starts with every facet column, so the counts are one
// GROUP BY that walks the index in order: no temporary table, no wide rows (app/catalogue/search.server.ts).
const FACET_COLUMNS = [
  "tier",
  "assembly",
  "substrate",
  "below_grade",
  "strategy",
  "interior_class",
  "zone_mask",
  "regime_mask",
  "published_revision_id",
  "withdrawn_at",
];
const ASCII_COLUMNS: [string, string][] = [
  ["assembly", "VARCHAR(40)"],
  ["substrate", "VARCHAR(40)"],
  ["below_grade", "VARCHAR(40)"],
  ["strategy", "VARCHAR(40)"],
  ["interior_class", "VARCHAR(8)"],
  ["tier", "ENUM('free','premium')"],
];

export const catalogueFacetIndex: Migration = {
  name: "2026-12-03-0006-catalogue-facet-index",
  async up({ queryInterface: qi, sequelize }) {
    await qi.addColumn("details", "zone_mask", { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
    await qi.addColumn("details", "regime_mask", {
      type: DataTypes.TINYINT.UNSIGNED,
      allowNull: false,
      defaultValue: 0,
    });
    // Backfill from detail_zones with the same bit order as app/catalogue/zone-mask.ts (CLIMATE_ZONE_IDS order).
    const zones = [
      "0A",
      "0B",
      "1A",
      "1B",
      "2A",
      "2B",
      "3A",
      "3B",
      "3C",
      "4A",
      "4B",
      "4C",
      "5A",
      "5B",
      "5C",
      "6A",
      "6B",
      "7",
      "8",
    ];
    const zoneBit = zones.map((zone, i) => `WHEN '${zone}' THEN ${2 ** i}`).join(" ");
    await sequelize.query(`UPDATE details d SET
      zone_mask = COALESCE((SELECT BIT_OR(CASE z.zone ${zoneBit} ELSE 0 END) FROM detail_zones z WHERE z.detail_id = d.id), 0),
      regime_mask = COALESCE((SELECT BIT_OR(CASE z.regime WHEN 'A' THEN 1 WHEN 'B' THEN 2 WHEN 'C' THEN 4 ELSE 0 END) FROM detail_zones z WHERE z.detail_id = d.id), 0)`);
    await sequelize.query(
      `ALTER TABLE details ${ASCII_COLUMNS.map(([column, type]) => `MODIFY ${column} ${type} CHARACTER SET ascii COLLATE ascii_bin NOT NULL`).join(", ")}`,
    );
    await qi.addIndex("details", FACET_COLUMNS, { name: "details_facets" });
    // MAX(updated_at) is the catalogue's version for the search cache: with this index it is one lookup.
    await qi.addIndex("details", ["updated_at"], { name: "details_updated_at" });
  },
  async down({ queryInterface: qi, sequelize }) {
    await qi.removeIndex("details", "details_updated_at");
    await qi.removeIndex("details", "details_facets");
    await sequelize.query(
      `ALTER TABLE details ${ASCII_COLUMNS.map(([column, type]) => `MODIFY ${column} ${type} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci NOT NULL`).join(", ")}`,
    );
    await qi.removeColumn("details", "regime_mask");
    await qi.removeColumn("details", "zone_mask");
  },
};
