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
import { MOVEMENT_TYPES, type MovementType } from "@/lib/service/ledger";
import type { Shop } from "./shop";

const appendOnly = () => {
  throw new Error("refrigerant_movement rows are append-only: post a correction instead");
};

/** One line of the refrigerant ledger. Never updated or deleted; a correction cancels it. */
export class RefrigerantMovement extends Model<
  InferAttributes<RefrigerantMovement>,
  InferCreationAttributes<RefrigerantMovement>
> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare cylinderId: number;
  declare caseId: CreationOptional<number | null>;
  declare serviceRecordId: CreationOptional<number | null>;
  declare technicianId: string;
  declare type: MovementType;
  declare refrigerant: RefrigerantId;
  declare massG: number;
  declare occurredAt: Date;
  declare reversesId: CreationOptional<number | null>;
  declare destination: CreationOptional<string | null>;
  declare note: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RefrigerantMovement.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        cylinderId: { type: DataTypes.INTEGER, allowNull: false },
        caseId: { type: DataTypes.INTEGER, allowNull: true },
        serviceRecordId: { type: DataTypes.INTEGER, allowNull: true },
        technicianId: { type: DataTypes.STRING(40), allowNull: false },
        type: { type: DataTypes.ENUM(...MOVEMENT_TYPES), allowNull: false },
        refrigerant: { type: DataTypes.ENUM(...REFRIGERANT_IDS), allowNull: false },
        massG: { type: DataTypes.INTEGER, allowNull: false },
        occurredAt: { type: DataTypes.DATE(3), allowNull: false },
        reversesId: { type: DataTypes.INTEGER, allowNull: true },
        destination: { type: DataTypes.STRING(120), allowNull: true },
        note: { type: DataTypes.STRING(255), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "refrigerant_movement",
        modelName: "RefrigerantMovement",
        underscored: true,
        updatedAt: false,
        hooks: {
          beforeUpdate: appendOnly,
          beforeBulkUpdate: appendOnly,
          beforeDestroy: appendOnly,
          beforeBulkDestroy: appendOnly,
        },
      },
    );
  }
}
