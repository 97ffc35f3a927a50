// Multiplies the imported demo library into a large catalogue for benchmarks (never for the app's data).
import { QueryTypes, type Sequelize } from "sequelize";
import { regimeBit, zoneBit } from "../../app/catalogue/zone-mask.ts";
import { CLIMATE_ZONE_IDS, moistureRegime, zoneNumber } from "../../app/vocabulary/climate-zones.ts";

const VARIANTS = ["coastal", "upland", "prairie", "river", "lakeside", "ridge", "valley", "harbour", "forest", "mesa"];
// Zones 2 to 8: where the demo library's details are written for.
const ZONE_POOL = CLIMATE_ZONE_IDS.filter((zone) => zoneNumber(zone) >= 2);

export async function growLargeCatalogue(sequelize: Sequelize, target: number): Promise<number> {
  const [{ n }] = await sequelize.query<{ n: number }>("SELECT COUNT(*) AS n FROM details", {
    type: QueryTypes.SELECT,
  });
  const base = Number(n);
  if (base === 0) throw new Error("import the demo content first: the benchmark multiplies it");
  const copies = Math.ceil((target - base) / base);
  for (let copy = 1; copy <= copies; copy++) {
    const variant = VARIANTS[copy % VARIANTS.length];
    await sequelize.query(
      `INSERT INTO details (slug, title, summary, search_text, assembly, substrate, below_grade, strategy, interior_class, tier,
                            r_value_rsi, layer_strip, zones_label, zone_mask, regime_mask, published_revision_id, published_at, created_at, updated_at)
       SELECT CONCAT(slug, '--g', :copy), CONCAT(title, ' (', :variant, ' variant ', :copy, ')'), summary,
              CONCAT(search_text, ' ', :variant), assembly, substrate, below_grade, strategy, interior_class,
              IF((id + :copy) % 3 = 0, 'free', 'premium'), r_value_rsi * (0.9 + ((id + :copy) % 5) / 20), layer_strip, zones_label, zone_mask, regime_mask,
              published_revision_id, DATE_SUB(published_at, INTERVAL :copy HOUR), NOW(3), NOW(3)
         FROM details WHERE slug NOT LIKE '%--g%' ORDER BY id`,
      { replacements: { copy, variant } },
    );
    // Spread zones so facet counts vary across the generated copies.
    const zoneA = ZONE_POOL[copy % ZONE_POOL.length];
    const zoneB = ZONE_POOL[(copy * 7) % ZONE_POOL.length];
    for (const zone of new Set([zoneA, zoneB])) {
      await sequelize.query(
        `INSERT INTO detail_zones (detail_id, zone, zone_number, regime)
         SELECT id, :zone, :zoneNumber, :regime FROM details WHERE slug LIKE CONCAT('%--g', :copy)`,
        { replacements: { zone, zoneNumber: zoneNumber(zone), regime: moistureRegime(zone), copy } },
      );
      const regime = moistureRegime(zone);
      await sequelize.query(
        `UPDATE details SET zone_mask = zone_mask | :zoneBit, regime_mask = regime_mask | :regimeBit, zones_label = CONCAT(zones_label, ' ', :zone)
          WHERE slug LIKE CONCAT('%--g', :copy) AND (zone_mask & :zoneBit) = 0`,
        { replacements: { zoneBit: zoneBit(zone), regimeBit: regime ? regimeBit(regime) : 0, zone, copy } },
      );
    }
  }
  // Auto-increment ids have gaps after INSERT … SELECT, so trim by count, newest generated rows first.
  const [{ now }] = await sequelize.query<{ now: number }>("SELECT COUNT(*) AS now FROM details", {
    type: QueryTypes.SELECT,
  });
  const excess = Number(now) - target;
  if (excess > 0) await sequelize.query(`DELETE FROM details WHERE slug LIKE '%--g%' ORDER BY id DESC LIMIT ${excess}`);
  await sequelize.query("ANALYZE TABLE details, detail_zones");
  const [{ total }] = await sequelize.query<{ total: number }>("SELECT COUNT(*) AS total FROM details", {
    type: QueryTypes.SELECT,
  });
  return Number(total);
}
