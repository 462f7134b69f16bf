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

/** A cause the repair confirmed (an id from lib/diagnosis/causes.ts, or none_found). */
export class CaseConfirmedCause extends Model<
  InferAttributes<CaseConfirmedCause>,
  InferCreationAttributes<CaseConfirmedCause>
> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]>;
  declare cause: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CaseConfirmedCause.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        cause: { type: DataTypes.STRING(40), allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "case_confirmed_cause",
        modelName: "CaseConfirmedCause",
        underscored: true,
        updatedAt: false,
      },
    );
  }
}

/** A repair done on the case (an id from lib/repairs/catalog.ts). */
export class CaseRepair extends Model<InferAttributes<CaseRepair>, InferCreationAttributes<CaseRepair>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]>;
  declare repairId: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CaseRepair.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        repairId: { type: DataTypes.STRING(40), allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "case_repair", modelName: "CaseRepair", underscored: true, updatedAt: false },
    );
  }
}
