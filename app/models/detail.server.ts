import {
  Op,
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from "sequelize";
import type { DetailRevision } from "./detail-revision.server";
import type { DetailSet } from "./detail-set.server";
import type { SavedDetail } from "./saved-detail.server";
import { sequelize } from "~/db/sequelize.server";

export type Tier = "free" | "premium";

export interface LayerStripEntry {
  role: string;
  family: string;
  thickness_mm: number;
}

/** The searchable projection of a detail's current published revision. */
/** The `live` scope as SQL, for the catalogue's raw queries over `details` under the given alias. */
export function liveDetailSql(alias: string): string {
  return `${alias}.published_revision_id IS NOT NULL AND ${alias}.withdrawn_at IS NULL`;
}

export class Detail extends Model<InferAttributes<Detail>, InferCreationAttributes<Detail>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare title: string;
  declare summary: string;
  declare searchText: string;
  declare assembly: string;
  declare substrate: string;
  declare belowGrade: string;
  declare strategy: string;
  declare interiorClass: string;
  declare tier: Tier;
  declare rValueRsi: number | null;
  /** Role, material family and thickness of each layer, for the card's section strip. */
  declare layerStrip: LayerStripEntry[];
  declare zonesLabel: string;
  /** Bit masks of the zones and moisture regimes (app/catalogue/zone-mask.ts), for facet counting. */
  declare zoneMask: CreationOptional<number>;
  declare regimeMask: CreationOptional<number>;
  declare publishedRevisionId: number | null;
  declare publishedAt: Date | null;
  declare withdrawnAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** Readers may see it: published and not withdrawn (the `live` scope and `liveDetailSql` say the same). */
  isLive(): this is this & { publishedRevisionId: number; withdrawnAt: null } {
    return this.publishedRevisionId !== null && !this.withdrawnAt;
  }

  declare zones?: NonAttribute<DetailZone[]>;
  declare revisions?: NonAttribute<DetailRevision[]>;
  declare publishedRevision?: NonAttribute<DetailRevision | null>;
  declare sets?: NonAttribute<DetailSet[]>;
  declare saves?: NonAttribute<SavedDetail[]>;
}

Detail.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    slug: { type: DataTypes.STRING(120), allowNull: false, unique: true },
    title: { type: DataTypes.STRING(200), allowNull: false },
    summary: { type: DataTypes.TEXT, allowNull: false },
    searchText: { type: DataTypes.TEXT, allowNull: false },
    assembly: { type: DataTypes.STRING(40), allowNull: false },
    substrate: { type: DataTypes.STRING(40), allowNull: false },
    belowGrade: { type: DataTypes.STRING(40), allowNull: false },
    strategy: { type: DataTypes.STRING(40), allowNull: false },
    interiorClass: { type: DataTypes.STRING(8), allowNull: false },
    tier: { type: DataTypes.ENUM("free", "premium"), allowNull: false },
    rValueRsi: {
      type: DataTypes.DECIMAL(6, 3),
      allowNull: true,
      // The connector returns DECIMAL as a string; the model speaks numbers.
      get() {
        const raw = this.getDataValue("rValueRsi") as unknown;
        return raw === null || raw === undefined ? null : Number(raw);
      },
    },
    layerStrip: { type: DataTypes.JSON, allowNull: false },
    zonesLabel: { type: DataTypes.STRING(120), allowNull: false },
    zoneMask: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    regimeMask: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    publishedRevisionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    publishedAt: { type: DataTypes.DATE(3), allowNull: true },
    withdrawnAt: { type: DataTypes.DATE(3), allowNull: true },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  {
    sequelize,
    tableName: "details",
    // `Detail.scope("live")`: what readers may see, a published detail that was not withdrawn.
    scopes: { live: { where: { publishedRevisionId: { [Op.ne]: null }, withdrawnAt: null } } },
  },
);

export class DetailZone extends Model<InferAttributes<DetailZone>, InferCreationAttributes<DetailZone>> {
  declare detailId: number;
  declare zone: string;
  declare zoneNumber: number;
  declare regime: string | null;
}

DetailZone.init(
  {
    detailId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
    zone: { type: DataTypes.STRING(3), primaryKey: true },
    zoneNumber: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
    regime: { type: DataTypes.CHAR(1), allowNull: true },
  },
  { sequelize, tableName: "detail_zones", timestamps: false },
);
