import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Case } from "./case";
import type { Shop } from "./shop";

export const readingSetKinds = ["static", "running", "final"] as const;
export type ReadingSetKind = (typeof readingSetKinds)[number];

type Reading = CreationOptional<number | null>;

// Pressures are stored as entered at the gauge (kPa gauge); the physics converts to absolute
// with the shop's altitude, which can change after the readings were taken.
export class ReadingSet extends Model<InferAttributes<ReadingSet>, InferCreationAttributes<ReadingSet>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]>;
  declare kind: ReadingSetKind;
  declare ambientC: Reading;
  declare relativeHumidityPct: Reading;
  declare engineRpm: Reading;
  declare staticKpaGauge: Reading;
  declare highKpaGauge: Reading;
  declare lowKpaGauge: Reading;
  declare liquidLineC: Reading;
  declare suctionLineC: Reading;
  declare ventC: Reading;
  declare takenAt: CreationOptional<Date>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const decimal = (precision: number, scale: number) => ({
      type: DataTypes.DECIMAL(precision, scale),
      allowNull: true,
    });
    ReadingSet.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.ENUM(...readingSetKinds), allowNull: false },
        ambientC: decimal(5, 2),
        relativeHumidityPct: decimal(5, 2),
        engineRpm: { type: DataTypes.INTEGER, allowNull: true },
        staticKpaGauge: decimal(7, 2),
        highKpaGauge: decimal(7, 2),
        lowKpaGauge: decimal(7, 2),
        liquidLineC: decimal(5, 2),
        suctionLineC: decimal(5, 2),
        ventC: decimal(5, 2),
        takenAt: { type: DataTypes.DATE(3), allowNull: false, defaultValue: DataTypes.NOW },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "reading_set", modelName: "ReadingSet", underscored: true },
    );
  }
}
