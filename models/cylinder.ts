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
import type { Shop } from "./shop";

export const cylinderKinds = ["recovery", "virgin", "recycled"] as const;
export type CylinderKind = (typeof cylinderKinds)[number];

/** A refrigerant cylinder; its contents are never stored, they are replayed from the ledger. */
export class Cylinder extends Model<InferAttributes<Cylinder>, InferCreationAttributes<Cylinder>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare label: string;
  declare serial: CreationOptional<string | null>;
  declare refrigerant: RefrigerantId;
  declare kind: CylinderKind;
  declare tareG: number;
  declare capacityG: number;
  declare initialNetG: CreationOptional<number>;
  declare retiredAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Cylinder.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        label: { type: DataTypes.STRING(60), allowNull: false },
        serial: { type: DataTypes.STRING(60), allowNull: true },
        refrigerant: { type: DataTypes.ENUM(...REFRIGERANT_IDS), allowNull: false },
        kind: { type: DataTypes.ENUM(...cylinderKinds), allowNull: false },
        tareG: { type: DataTypes.INTEGER, allowNull: false },
        capacityG: { type: DataTypes.INTEGER, allowNull: false },
        initialNetG: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        retiredAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "cylinder", modelName: "Cylinder", underscored: true },
    );
  }
}
