import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

// Kept in the database so several app instances count the same failures.
export class SignInAttempt extends Model<
  InferAttributes<SignInAttempt>,
  InferCreationAttributes<SignInAttempt>
> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare ip: string;
  declare succeeded: boolean;
  declare attemptedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SignInAttempt.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        email: {
          type: DataTypes.STRING(255),
          allowNull: false,
          set(value: string) {
            this.setDataValue("email", value.trim().toLowerCase());
          },
        },
        ip: { type: DataTypes.STRING(64), allowNull: false },
        succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
        attemptedAt: { type: DataTypes.DATE(3), allowNull: false, defaultValue: DataTypes.NOW },
      },
      {
        sequelize,
        tableName: "sign_in_attempt",
        modelName: "SignInAttempt",
        underscored: true,
        timestamps: false,
      },
    );
  }
}
