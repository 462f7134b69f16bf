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

export const signOffVerdicts = ["signed_off", "sent_back"] as const;
export type SignOffVerdict = (typeof signOffVerdicts)[number];

/** Append-only: a verdict is never edited; a later verdict is a new row. */
export class SignOff extends Model<InferAttributes<SignOff>, InferCreationAttributes<SignOff>> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare caseId: ForeignKey<Case["id"]>;
  declare reviewerId: ForeignKey<User["id"]>;
  declare verdict: SignOffVerdict;
  declare comment: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SignOff.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        verdict: { type: DataTypes.ENUM(...signOffVerdicts), allowNull: false },
        comment: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "sign_off",
        modelName: "SignOff",
        underscored: true,
        updatedAt: false,
        hooks: {
          beforeUpdate() {
            throw new Error("sign_off rows are append-only");
          },
          beforeBulkUpdate() {
            throw new Error("sign_off rows are append-only");
          },
        },
      },
    );
  }
}
