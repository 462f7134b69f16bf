import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

export const shopUnits = ["metric", "imperial"] as const;
export type ShopUnits = (typeof shopUnits)[number];

export class Shop extends Model<InferAttributes<Shop>, InferCreationAttributes<Shop>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare units: CreationOptional<ShopUnits>;
  declare altitudeM: CreationOptional<number>;
  declare timeZone: CreationOptional<string>;
  /** BCP 47 tag for dates and times the shop reads, with timeZone */
  declare locale: CreationOptional<string>;
  /** A case opened this many days or fewer after the vehicle's last closed case is a comeback. */
  declare comebackWindowDays: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Shop.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        units: { type: DataTypes.ENUM(...shopUnits), allowNull: false, defaultValue: "metric" },
        altitudeM: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        timeZone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: "UTC" },
        locale: { type: DataTypes.STRING(35), allowNull: false, defaultValue: "en" },
        comebackWindowDays: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 90 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "shop", modelName: "Shop", underscored: true },
    );
  }
}
