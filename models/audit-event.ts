import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { JsonValue } from "./case";
import type { Shop } from "./shop";
import type { User } from "./user";

/** Who changed what: entity names the table-level thing ("case", "user"), action what happened. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare actorId: ForeignKey<User["id"]> | null;
  declare entity: string;
  declare entityId: string;
  declare action: string;
  declare detail: CreationOptional<JsonValue | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AuditEvent.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        entity: { type: DataTypes.STRING(40), allowNull: false },
        entityId: { type: DataTypes.STRING(40), allowNull: false },
        action: { type: DataTypes.STRING(40), allowNull: false },
        detail: { type: DataTypes.JSON, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "audit_event",
        modelName: "AuditEvent",
        underscored: true,
        updatedAt: false,
        hooks: {
          beforeUpdate() {
            throw new Error("audit_event rows are append-only");
          },
          beforeBulkUpdate() {
            throw new Error("audit_event rows are append-only");
          },
        },
      },
    );
  }
}
