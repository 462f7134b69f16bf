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

// Derived from a case and rewritten whenever it changes (lib/server/casebook/refresh.ts); never edited
// on its own.

/** One row per case: what the casebook searches and filters on. */
export class CasebookEntry extends Model<
  InferAttributes<CasebookEntry>,
  InferCreationAttributes<CasebookEntry>
> {
  declare caseId: ForeignKey<Case["id"]>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare status: string;
  declare technicianId: string;
  declare vehicleId: number | null;
  declare make: string | null;
  declare model: string | null;
  declare year: number | null;
  declare refrigerant: string | null;
  declare meteringDevice: string | null;
  declare compressorType: string | null;
  declare leadingSuspect: string | null;
  declare outcome: string | null;
  declare openedAt: Date;
  declare closedAt: Date | null;
  declare comebackOfCaseId: number | null;
  declare cameBackCaseId: number | null;
  declare comeback: boolean;
  declare searchText: string;
  declare searchTerms: string;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CasebookEntry.init(
      {
        caseId: { type: DataTypes.INTEGER, primaryKey: true },
        status: { type: DataTypes.STRING(20), allowNull: false },
        technicianId: { type: DataTypes.STRING(40), allowNull: false },
        vehicleId: { type: DataTypes.INTEGER, allowNull: true },
        make: { type: DataTypes.STRING(60), allowNull: true },
        model: { type: DataTypes.STRING(80), allowNull: true },
        year: { type: DataTypes.SMALLINT, allowNull: true },
        refrigerant: { type: DataTypes.STRING(12), allowNull: true },
        meteringDevice: { type: DataTypes.STRING(20), allowNull: true },
        compressorType: { type: DataTypes.STRING(30), allowNull: true },
        leadingSuspect: { type: DataTypes.STRING(40), allowNull: true },
        outcome: { type: DataTypes.STRING(40), allowNull: true },
        openedAt: { type: DataTypes.DATE(3), allowNull: false },
        closedAt: { type: DataTypes.DATE(3), allowNull: true },
        comebackOfCaseId: { type: DataTypes.INTEGER, allowNull: true },
        cameBackCaseId: { type: DataTypes.INTEGER, allowNull: true },
        comeback: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        searchText: { type: DataTypes.TEXT, allowNull: false },
        searchTerms: { type: DataTypes.TEXT, allowNull: false },
        updatedAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "casebook_entry",
        modelName: "CasebookEntry",
        underscored: true,
        createdAt: false,
      },
    );
  }
}

/** A symptom ticked on a case, one row each, so the casebook filters and counts by symptom with an index. */
export class CasebookSymptom extends Model<
  InferAttributes<CasebookSymptom>,
  InferCreationAttributes<CasebookSymptom>
> {
  declare shopId: ForeignKey<Shop["id"]>;
  declare symptom: string;
  declare caseId: ForeignKey<Case["id"]>;

  static initModel(sequelize: Sequelize) {
    CasebookSymptom.init(
      {
        shopId: { type: DataTypes.INTEGER, primaryKey: true },
        symptom: { type: DataTypes.STRING(48), primaryKey: true },
        caseId: { type: DataTypes.INTEGER, primaryKey: true },
      },
      {
        sequelize,
        tableName: "casebook_symptom",
        modelName: "CasebookSymptom",
        underscored: true,
        timestamps: false,
      },
    );
  }
}

/** A submitted case's readings (°C, K, %), for the nearest closed cases. */
export class CaseFeatures extends Model<
  InferAttributes<CaseFeatures>,
  InferCreationAttributes<CaseFeatures>
> {
  declare caseId: ForeignKey<Case["id"]>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare refrigerant: string;
  declare meteringDevice: string;
  declare closed: boolean;
  declare condensingC: number | null;
  declare evaporatingC: number | null;
  declare subcoolingK: number | null;
  declare superheatK: number | null;
  declare approachK: number | null;
  declare ambientC: number | null;
  declare chargeDeviationPct: number | null;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    // A fresh object each: Sequelize writes the column name into the definition it is given.
    const reading = () => ({ type: DataTypes.FLOAT, allowNull: true });
    CaseFeatures.init(
      {
        caseId: { type: DataTypes.INTEGER, primaryKey: true },
        refrigerant: { type: DataTypes.STRING(12), allowNull: false },
        meteringDevice: { type: DataTypes.STRING(20), allowNull: false },
        closed: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        condensingC: reading(),
        evaporatingC: reading(),
        subcoolingK: reading(),
        superheatK: reading(),
        approachK: reading(),
        ambientC: reading(),
        chargeDeviationPct: reading(),
        updatedAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "case_features",
        modelName: "CaseFeatures",
        underscored: true,
        createdAt: false,
      },
    );
  }
}
