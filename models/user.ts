import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { UnitChoice } from "@/lib/units/reader";
import type { Shop } from "./shop";

export const userRoles = ["owner", "senior", "technician", "apprentice"] as const;
export type UserRole = (typeof userRoles)[number];

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: string;
  declare shopId: ForeignKey<Shop["id"]>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare role: UserRole;
  declare active: CreationOptional<boolean>;
  /** set by an owner's reset: the person must choose their own password before anything else */
  declare passwordMustChange: CreationOptional<boolean>;
  /** when a temporary password stops working; null for a password the person chose */
  declare passwordExpiresAt: CreationOptional<Date | null>;
  /** The units this person chose on their profile (lib/units UnitChoice); null: the shop's. */
  declare unitChoice: CreationOptional<UnitChoice | null>;
  /** BCP 47 tag for reading and writing numbers; null: the browser's. */
  declare locale: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.STRING(40), primaryKey: true },
        email: {
          type: DataTypes.STRING(255),
          allowNull: false,
          // Stored lower-cased; the table has a check that refuses anything else.
          set(value: string) {
            this.setDataValue("email", value.trim().toLowerCase());
          },
        },
        name: { type: DataTypes.STRING(120), allowNull: false },
        passwordHash: { type: DataTypes.STRING(255), allowNull: false },
        role: { type: DataTypes.ENUM(...userRoles), allowNull: false },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        passwordMustChange: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        passwordExpiresAt: { type: DataTypes.DATE(3), allowNull: true },
        unitChoice: { type: DataTypes.JSON, allowNull: true },
        locale: { type: DataTypes.STRING(35), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      {
        sequelize,
        tableName: "user",
        modelName: "User",
        underscored: true,
        // Password hashes leave the data layer only when asked for by name. A named scope replaces
        // the default one, so the empty scope means "every column".
        defaultScope: { attributes: { exclude: ["passwordHash"] } },
        scopes: { withPasswordHash: {} },
      },
    );
  }
}
