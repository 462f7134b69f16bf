import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Customer } from "./customer";
import type { Shop } from "./shop";
import type { User } from "./user";
import { CASE_STATUSES, type CaseStatus } from "@/lib/cases/statuses";
import type { Vehicle } from "./vehicle";

export type { CaseStatus };

/** A JSON value as stored in the answers and findings columns. */
export type JsonValue = string | number | boolean | null | JsonValue[] | { [key: string]: JsonValue };
export type JsonObject = { [key: string]: JsonValue };

// Table `service_case`: CASE is reserved in SQL. `version` is Sequelize's optimistic lock:
// every save bumps it, and saving a stale copy throws OptimisticLockError.
export class Case extends Model<InferAttributes<Case>, InferCreationAttributes<Case>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare customerId: ForeignKey<Customer["id"]> | null;
  declare vehicleId: ForeignKey<Vehicle["id"]> | null;
  declare technicianId: ForeignKey<User["id"]>;
  declare status: CreationOptional<CaseStatus>;
  declare complaint: string;
  declare symptomTags: CreationOptional<string[]>;
  declare interviewStep: CreationOptional<string | null>;
  declare answers: CreationOptional<JsonObject>;
  declare findings: CreationOptional<JsonValue | null>;
  declare engineVersion: CreationOptional<string | null>;
  declare conclusionCause: CreationOptional<string | null>;
  declare conclusionNotes: CreationOptional<string | null>;
  declare confirmedRepair: CreationOptional<string | null>;
  declare version: CreationOptional<number>;
  declare submittedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Case.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        status: { type: DataTypes.ENUM(...CASE_STATUSES), allowNull: false, defaultValue: "draft" },
        complaint: { type: DataTypes.TEXT, allowNull: false },
        symptomTags: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        interviewStep: { type: DataTypes.STRING(40), allowNull: true },
        answers: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
        findings: { type: DataTypes.JSON, allowNull: true },
        engineVersion: { type: DataTypes.STRING(64), allowNull: true },
        conclusionCause: { type: DataTypes.STRING(40), allowNull: true },
        conclusionNotes: { type: DataTypes.TEXT, allowNull: true },
        confirmedRepair: { type: DataTypes.TEXT, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        submittedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "service_case", modelName: "Case", underscored: true, version: "version" },
    );
  }
}
