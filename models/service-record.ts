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
import type { Case } from "./case";
import type { Shop } from "./shop";
import type { User } from "./user";

export type PartReplacedJson = { part: string; count: number; measuredMl: number | null };

type Opt<T> = CreationOptional<T | null>;

// One per case. Pressures are absolute kPa (vacuum readings converted at the edge with the
// shop's altitude), masses grams, volumes millilitres. `version` guards step-by-step saves.
export class ServiceRecord extends Model<
  InferAttributes<ServiceRecord>,
  InferCreationAttributes<ServiceRecord>
> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]>;
  declare technicianId: ForeignKey<User["id"]>;
  declare version: CreationOptional<number>;
  declare step: CreationOptional<string>;
  declare refrigerant: RefrigerantId;
  declare specEntryId: Opt<number>;
  declare labelChargeG: Opt<number>;
  declare purityPct: Opt<number>;
  declare airPct: Opt<number>;
  declare recoveryStartedAt: Opt<Date>;
  declare recoveryEndedAt: Opt<Date>;
  declare recoveredChargeG: Opt<number>;
  declare recoveryCylinderId: Opt<number>;
  declare oilRemovedMl: Opt<number>;
  declare oilPulled: CreationOptional<boolean>;
  declare slowRecoveryNote: Opt<string>;
  declare deepestKpaAbs: Opt<number>;
  declare holdStartKpaAbs: Opt<number>;
  declare holdEndKpaAbs: Opt<number>;
  declare holdMinutes: Opt<number>;
  declare holdPassed: Opt<boolean>;
  declare oilAddedType: Opt<string>;
  declare oilAddedMl: Opt<number>;
  declare partsReplaced: CreationOptional<PartReplacedJson[]>;
  declare targetG: Opt<number>;
  declare chargedG: Opt<number>;
  declare chargeCylinderId: Opt<number>;
  declare finalReadingSetId: Opt<number>;
  declare notes: Opt<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const int = () => ({ type: DataTypes.INTEGER, allowNull: true });
    // DECIMAL comes back from the driver as a string; the getter keeps the model numeric.
    const decimal = (
      precision: number,
      scale: number,
      name: "purityPct" | "airPct" | "deepestKpaAbs" | "holdStartKpaAbs" | "holdEndKpaAbs" | "holdMinutes",
    ) => ({
      type: DataTypes.DECIMAL(precision, scale),
      allowNull: true,
      get(this: ServiceRecord) {
        const raw = this.getDataValue(name) as unknown;
        return raw === null || raw === undefined ? null : Number(raw);
      },
    });
    ServiceRecord.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        step: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "identify" },
        refrigerant: { type: DataTypes.ENUM(...REFRIGERANT_IDS), allowNull: false },
        specEntryId: int(),
        labelChargeG: int(),
        purityPct: decimal(5, 2, "purityPct"),
        airPct: decimal(5, 2, "airPct"),
        recoveryStartedAt: { type: DataTypes.DATE(3), allowNull: true },
        recoveryEndedAt: { type: DataTypes.DATE(3), allowNull: true },
        recoveredChargeG: int(),
        recoveryCylinderId: int(),
        oilRemovedMl: int(),
        oilPulled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        slowRecoveryNote: { type: DataTypes.TEXT, allowNull: true },
        deepestKpaAbs: decimal(9, 5, "deepestKpaAbs"),
        holdStartKpaAbs: decimal(9, 5, "holdStartKpaAbs"),
        holdEndKpaAbs: decimal(9, 5, "holdEndKpaAbs"),
        holdMinutes: decimal(6, 1, "holdMinutes"),
        holdPassed: { type: DataTypes.BOOLEAN, allowNull: true },
        oilAddedType: { type: DataTypes.STRING(60), allowNull: true },
        oilAddedMl: int(),
        partsReplaced: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        targetG: int(),
        chargedG: int(),
        chargeCylinderId: int(),
        finalReadingSetId: int(),
        notes: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "service_record", modelName: "ServiceRecord", underscored: true },
    );
  }
}
