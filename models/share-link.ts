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
import type { User } from "./user";

/** A link to a case's owner summary. Only the SHA-256 of its token is stored. */
export class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]>;
  declare tokenHash: string;
  declare createdBy: ForeignKey<User["id"]>;
  declare expiresAt: Date;
  declare revokedAt: CreationOptional<Date | null>;
  declare revokedBy: CreationOptional<string | null>;
  declare lastViewedAt: CreationOptional<Date | null>;
  declare viewCount: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ShareLink.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        revokedAt: { type: DataTypes.DATE(3), allowNull: true },
        revokedBy: { type: DataTypes.STRING(40), allowNull: true },
        lastViewedAt: { type: DataTypes.DATE(3), allowNull: true },
        viewCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "share_link", modelName: "ShareLink", underscored: true, updatedAt: false },
    );
  }
}
