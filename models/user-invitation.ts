import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Shop } from "./shop";
import { userRoles, type User, type UserRole } from "./user";

/** An invitation to join a shop; the link's token is stored only as its SHA-256 hash. */
export class UserInvitation extends Model<
  InferAttributes<UserInvitation>,
  InferCreationAttributes<UserInvitation>
> {
  declare id: CreationOptional<number>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare email: string;
  declare name: string;
  declare role: UserRole;
  declare tokenHash: string;
  declare invitedBy: ForeignKey<User["id"]>;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    UserInvitation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        email: {
          type: DataTypes.STRING(255),
          allowNull: false,
          set(value: string) {
            this.setDataValue("email", value.trim().toLowerCase());
          },
        },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.ENUM(...userRoles), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
        invitedBy: { type: DataTypes.STRING(40), allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        acceptedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "user_invitation",
        modelName: "UserInvitation",
        underscored: true,
        // The hash never leaves the data layer unless asked for by name.
        defaultScope: { attributes: { exclude: ["tokenHash"] } },
      },
    );
  }
}
