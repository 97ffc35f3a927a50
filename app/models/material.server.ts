import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "~/db/sequelize.server";

export class MaterialRecord extends Model<InferAttributes<MaterialRecord>, InferCreationAttributes<MaterialRecord>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare name: string;
  declare family: string;
  /** The whole validated material (values and sources), as in content/materials. */
  declare properties: unknown;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

MaterialRecord.init(
  {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(160), allowNull: false },
    family: { type: DataTypes.STRING(40), allowNull: false },
    properties: { type: DataTypes.JSON, allowNull: false },
    createdAt: DataTypes.DATE(3),
    updatedAt: DataTypes.DATE(3),
  },
  { sequelize, tableName: "materials" },
);
