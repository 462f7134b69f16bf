import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { REFRIGERANT_IDS, type RefrigerantId } from "@/lib/refrigerants/catalog";
import { specMatchKey } from "@/lib/specs/schema";
import { COMPRESSOR_TYPES, type CompressorType } from "@/lib/vehicles/compressor-types";
import type { Shop } from "./shop";

/** One row of a shop's spec table: what a vehicle variant carries (grams, millilitres). */
export class SpecEntry extends Model<InferAttributes<SpecEntry>, InferCreationAttributes<SpecEntry>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare yearFrom: number;
  declare yearTo: number;
  declare make: string;
  declare model: string;
  declare variant: CreationOptional<string>;
  declare rearAc: boolean;
  declare refrigerant: RefrigerantId;
  declare labelChargeG: number;
  declare oilType: string;
  declare totalOilMl: CreationOptional<number | null>;
  /** specMatchKey of the row, set on every save; unique per shop (spec_entry_shop_match_key). */
  declare matchKey: CreationOptional<string>;
  declare compressorType: CreationOptional<CompressorType | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SpecEntry.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        yearFrom: { type: DataTypes.SMALLINT, allowNull: false },
        yearTo: { type: DataTypes.SMALLINT, allowNull: false },
        make: { type: DataTypes.STRING(60), allowNull: false },
        model: { type: DataTypes.STRING(80), allowNull: false },
        variant: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
        rearAc: { type: DataTypes.BOOLEAN, allowNull: false },
        refrigerant: { type: DataTypes.ENUM(...REFRIGERANT_IDS), allowNull: false },
        labelChargeG: { type: DataTypes.INTEGER, allowNull: false },
        oilType: { type: DataTypes.STRING(60), allowNull: false },
        totalOilMl: { type: DataTypes.INTEGER, allowNull: true },
        matchKey: { type: DataTypes.STRING(720), allowNull: false },
        compressorType: { type: DataTypes.ENUM(...COMPRESSOR_TYPES), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "spec_entry",
        modelName: "SpecEntry",
        underscored: true,
        // Every way of writing a row fills the key from the row itself, so no caller can forget it.
        hooks: {
          beforeValidate: (row: SpecEntry) => {
            row.matchKey = specMatchKey(row);
          },
          beforeBulkCreate: (rows: SpecEntry[]) => {
            for (const row of rows) row.matchKey = specMatchKey(row);
          },
        },
      },
    );
  }
}
