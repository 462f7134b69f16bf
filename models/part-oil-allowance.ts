import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { REPLACED_PART_IDS, type ReplacedPartId } from "@/lib/service/oil";
import type { Shop } from "./shop";

/** The shop's own figure for the oil a replaced part carries out (mL); null = drain and measure. */
export class PartOilAllowance extends Model<
  InferAttributes<PartOilAllowance>,
  InferCreationAttributes<PartOilAllowance>
> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare part: ReplacedPartId;
  declare allowanceMl: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PartOilAllowance.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        part: { type: DataTypes.ENUM(...REPLACED_PART_IDS), allowNull: false },
        allowanceMl: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "part_oil_allowance", modelName: "PartOilAllowance", underscored: true },
    );
  }
}
