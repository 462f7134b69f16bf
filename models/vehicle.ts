import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { COMPRESSOR_TYPES, type CompressorType } from "@/lib/vehicles/compressor-types";
import type { Customer } from "./customer";
import { REFRIGERANT_IDS, type RefrigerantId } from "@/lib/refrigerants/catalog";
import { EXPANSION_DEVICE_IDS, type ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type { Shop } from "./shop";

export type { ExpansionDevice };

export class Vehicle extends Model<InferAttributes<Vehicle>, InferCreationAttributes<Vehicle>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare customerId: ForeignKey<Customer["id"]>;
  declare year: number;
  declare make: string;
  declare model: string;
  declare engine: CreationOptional<string | null>;
  declare vin: CreationOptional<string | null>;
  declare plate: CreationOptional<string | null>;
  declare refrigerant: RefrigerantId;
  declare expansionDevice: ExpansionDevice;
  declare electricCompressor: CreationOptional<boolean>;
  /** null when not known; electricCompressor stays true exactly when this is "electric" */
  declare compressorType: CreationOptional<CompressorType | null>;
  declare labelChargeG: CreationOptional<number | null>;
  declare oilType: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Vehicle.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        year: { type: DataTypes.SMALLINT, allowNull: false },
        make: { type: DataTypes.STRING(60), allowNull: false },
        model: { type: DataTypes.STRING(80), allowNull: false },
        engine: { type: DataTypes.STRING(80), allowNull: true },
        vin: { type: DataTypes.STRING(17), allowNull: true },
        plate: { type: DataTypes.STRING(12), allowNull: true },
        refrigerant: { type: DataTypes.ENUM(...REFRIGERANT_IDS), allowNull: false },
        expansionDevice: { type: DataTypes.ENUM(...EXPANSION_DEVICE_IDS), allowNull: false },
        electricCompressor: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        compressorType: { type: DataTypes.ENUM(...COMPRESSOR_TYPES), allowNull: true },
        labelChargeG: { type: DataTypes.INTEGER, allowNull: true },
        oilType: { type: DataTypes.STRING(60), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "vehicle", modelName: "Vehicle", underscored: true },
    );
  }
}
