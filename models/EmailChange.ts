import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { User } from "@/models/User";

/** A member's request to change their e-mail address, waiting for the link sent to the new one. */
export class EmailChange extends Model<InferAttributes<EmailChange>, InferCreationAttributes<EmailChange>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User["id"]>;
  /** Already normalised (trimmed, lower case). */
  declare newEmail: string;
  /** Null when the member asked (only they, signed in, may confirm); the admin's id when an admin did. */
  declare requestedById: CreationOptional<number | null>;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof EmailChange {
    EmailChange.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        newEmail: { type: DataTypes.STRING(254), allowNull: false },
        requestedById: { type: DataTypes.INTEGER, allowNull: true },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "email_changes" },
    );
    return EmailChange;
  }
}
