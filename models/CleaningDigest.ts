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

export type CleaningDigestState = "sending" | "sent";
export type CleaningDigestKind = "weekly" | "manual";

/**
 * The weekly cleaning digest of one club for one ISO week; unique per club and week, so a restarted
 * server, or two checks at once, never send the week's digest twice.
 */
export class CleaningDigest extends Model<InferAttributes<CleaningDigest>, InferCreationAttributes<CleaningDigest>> {
  declare id: CreationOptional<number>;
  declare clubId: ForeignKey<Club["id"]>;
  /** e.g. "2026-W49". */
  declare isoWeek: string;
  declare state: CleaningDigestState;
  declare kind: CleaningDigestKind;
  declare recipients: CreationOptional<number>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof CleaningDigest {
    CleaningDigest.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        isoWeek: { type: DataTypes.STRING(8), allowNull: false },
        state: { type: DataTypes.STRING(10), allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        recipients: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "cleaning_digests" },
    );
    return CleaningDigest;
  }
}
