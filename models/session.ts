import {
  DataTypes,
  Model,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { User } from "./user";

// Lucia writes this table through its own adapter; the model is for tests, cleanup and admin views.
export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
  declare id: string;
  declare userId: ForeignKey<User["id"]>;
  declare expiresAt: Date;

  static initModel(sequelize: Sequelize) {
    Session.init(
      {
        id: { type: DataTypes.STRING(255), primaryKey: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: "user_session", modelName: "Session", underscored: true, timestamps: false },
    );
  }
}
