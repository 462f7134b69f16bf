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

// Table `service_case`: CASE is reserved in SQL. `version` counts the case's changes, and a change is
// made only at the version its writer last saw. The app changes a case through updateCaseAtVersion
// (lib/db/versioned-update.ts): the expected version in the WHERE clause, bumped in the same UPDATE,
// so a stale writer changes nothing and is told so. The model's `version` option guards instance
// saves the same way (save() bumps it; saving a stale copy throws OptimisticLockError); the static
// Case.update checks nothing, so the app never changes a case through it directly.
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
  /**
   * The interview as autosave stores it: `{ answers, drafts, skipped, visited }`, where `answers`
   * holds the valid answer groups by group id (complaint, system, conditions, …: ids in
   * lib/interview/steps.ts, shapes in lib/interview/answers.ts), `drafts` what was typed in a group
   * that is not valid yet, by group id, `skipped` the optional groups passed over and `visited` the
   * steps seen, in order. The current step is `interviewStep`.
   * A new case starts with the complaint and the system prefilled and no `visited`.
   */
  declare answers: CreationOptional<JsonObject>;
  declare findings: CreationOptional<JsonValue | null>;
  declare engineVersion: CreationOptional<string | null>;
  declare conclusionCause: CreationOptional<string | null>;
  declare conclusionNotes: CreationOptional<string | null>;
  declare confirmedRepair: CreationOptional<string | null>;
  declare version: CreationOptional<number>;
  declare submittedAt: CreationOptional<Date | null>;
  declare closedAt: CreationOptional<Date | null>;
  declare repairNote: CreationOptional<string | null>;
  declare conclusionWriterIds: CreationOptional<string[] | null>;
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
        closedAt: { type: DataTypes.DATE(3), allowNull: true },
        repairNote: { type: DataTypes.TEXT, allowNull: true },
        conclusionWriterIds: { type: DataTypes.JSON, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "service_case", modelName: "Case", underscored: true, version: "version" },
    );
  }
}
