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
import type { User } from "./user";

export const ownerAnswers = ["approved", "declined"] as const;

/** Repairs the shop proposes (ids from lib/repairs/catalog), a price in minor units, and the owner's answer. */
export class RepairProposal extends Model<
  InferAttributes<RepairProposal>,
  InferCreationAttributes<RepairProposal>
> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]>;
  declare repairIds: string[];
  declare priceMinor: number | null;
  declare currency: string;
  declare note: string | null;
  declare proposedBy: ForeignKey<User["id"]>;
  declare answer: CreationOptional<(typeof ownerAnswers)[number] | null>;
  declare answerNote: CreationOptional<string | null>;
  declare answeredAt: CreationOptional<Date | null>;
  declare answeredViaLinkId: CreationOptional<ForeignKey<ShareLink["id"]> | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RepairProposal.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        repairIds: { type: DataTypes.JSON, allowNull: false },
        priceMinor: { type: DataTypes.INTEGER, allowNull: true },
        currency: { type: DataTypes.CHAR(3), allowNull: false, defaultValue: "USD" },
        note: { type: DataTypes.TEXT, allowNull: true },
        answer: { type: DataTypes.ENUM(...ownerAnswers), allowNull: true },
        answerNote: { type: DataTypes.TEXT, allowNull: true },
        answeredAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: "repair_proposal", modelName: "RepairProposal", underscored: true },
    );
  }
}
