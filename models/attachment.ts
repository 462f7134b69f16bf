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

export const attachmentKinds = ["gauges", "label", "identifier", "leak", "damage", "other"] as const;
export type AttachmentKindValue = (typeof attachmentKinds)[number];

/** A photo on a case: object keys of its re-encoded display copy and thumbnail in object storage. */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]>;
  declare kind: CreationOptional<AttachmentKindValue>;
  declare caption: CreationOptional<string>;
  declare shareable: CreationOptional<boolean>;
  declare objectKey: string;
  declare thumbKey: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare widthPx: number;
  declare heightPx: number;
  declare uploadedBy: ForeignKey<User["id"]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Attachment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.ENUM(...attachmentKinds), allowNull: false, defaultValue: "other" },
        caption: { type: DataTypes.STRING(200), allowNull: false, defaultValue: "" },
        shareable: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        objectKey: { type: DataTypes.STRING(200), allowNull: false },
        thumbKey: { type: DataTypes.STRING(200), allowNull: false },
        contentType: { type: DataTypes.STRING(40), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        widthPx: { type: DataTypes.INTEGER, allowNull: false },
        heightPx: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "attachment", modelName: "Attachment", underscored: true },
    );
  }
}
