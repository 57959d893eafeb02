import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Club } from "@/models/Club";
import { roles, userStatuses, type Role, type UserStatus } from "@/lib/auth/roles";

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare clubId: ForeignKey<Club["id"]>;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare passwordHash: CreationOptional<string | null>;
  declare status: CreationOptional<UserStatus>;
  /** Bumped on deactivation, role change and sign-out-everywhere; sessions carrying an older value end. */
  declare tokenVersion: CreationOptional<number>;
  declare lastSignInAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof User {
    User.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [roles as unknown as string[]] } },
        passwordHash: { type: DataTypes.STRING(100), allowNull: true },
        status: {
          type: DataTypes.STRING(16),
          allowNull: false,
          defaultValue: "active",
          validate: { isIn: [userStatuses as unknown as string[]] },
        },
        tokenVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        lastSignInAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "users" },
    );
    return User;
  }
}
