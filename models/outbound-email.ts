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
import type { ShareLink } from "./share-link";
import type { Shop } from "./shop";

export const emailStatuses = ["queued", "sent", "failed"] as const;
export type EmailStatusValue = (typeof emailStatuses)[number];

/**
 * One message we send. Its body is rendered at each attempt from the case, so a retry after a
 * failure sends what the case says then; `claimedUntil` keeps two retries from sending twice.
 */
export class OutboundEmail extends Model<
  InferAttributes<OutboundEmail>,
  InferCreationAttributes<OutboundEmail>
> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]> | null;
  declare shareLinkId: ForeignKey<ShareLink["id"]> | null;
  declare kind: string;
  declare toAddress: string;
  declare subject: string;
  declare status: CreationOptional<EmailStatusValue>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare claimedUntil: CreationOptional<Date | null>;
  declare messageId: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OutboundEmail.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        toAddress: { type: DataTypes.STRING(254), allowNull: false },
        subject: { type: DataTypes.STRING(200), allowNull: false },
        status: { type: DataTypes.ENUM(...emailStatuses), allowNull: false, defaultValue: "queued" },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastError: { type: DataTypes.STRING(500), allowNull: true },
        claimedUntil: { type: DataTypes.DATE(3), allowNull: true },
        messageId: { type: DataTypes.STRING(200), allowNull: true },
        sentAt: { type: DataTypes.DATE(3), allowNull: true },
        createdBy: { type: DataTypes.STRING(40), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "outbound_email", modelName: "OutboundEmail", underscored: true },
    );
  }
}
