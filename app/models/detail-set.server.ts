import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
} from "sequelize";
import type { Detail } from "./detail.server";
import type { Entitlement } from "./entitlement.server";
import { sequelize } from "~/db/sequelize.server";

export class DetailSet extends Model<InferAttributes<DetailSet>, InferCreationAttributes<DetailSet>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare title: string;
  declare summary: string;
  declare priceCents: number;
  declare currency: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare details?: NonAttribute<Detail[]>;
  declare entitlements?: NonAttribute<Entitlement[]>;
}

DetailSet.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    title: { type: DataTypes.STRING(160), allowNull: false },
    summary: { type: DataTypes.TEXT, allowNull: false },
    priceCents: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    currency: { type: DataTypes.CHAR(3), allowNull: false },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "detail_sets" },
);

export class DetailSetMember extends Model<InferAttributes<DetailSetMember>, InferCreationAttributes<DetailSetMember>> {
  declare setId: number;
  declare detailId: number;
}

DetailSetMember.init(
  {
    setId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
    detailId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
  },
  { sequelize, tableName: "detail_set_members", timestamps: false },
);
