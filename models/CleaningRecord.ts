import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { Club } from "@/models/Club";
import type { User } from "@/models/User";
import type { OarSet } from "@/models/OarSet";
import { cleaningMethods, type CleaningMethod } from "@/lib/care/methods";

/** One cleaning of an oar set's handles: the day, who cleaned, who wrote it down, how. */
export class CleaningRecord extends Model<InferAttributes<CleaningRecord>, InferCreationAttributes<CleaningRecord>> {
  declare id: CreationOptional<number>;
  declare clubId: ForeignKey<Club["id"]>;
  declare oarSetId: ForeignKey<OarSet["id"]>;
  declare cleanedById: ForeignKey<User["id"]>;
  declare recordedById: ForeignKey<User["id"]>;
  /** YYYY-MM-DD. */
  declare cleanedOn: string;
  declare method: CleaningMethod;
  declare note: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare cleanedBy?: NonAttribute<User>;
  declare oarSet?: NonAttribute<OarSet>;

  static initModel(sequelize: Sequelize): typeof CleaningRecord {
    CleaningRecord.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        oarSetId: { type: DataTypes.INTEGER, allowNull: false },
        cleanedById: { type: DataTypes.INTEGER, allowNull: false },
        recordedById: { type: DataTypes.INTEGER, allowNull: false },
        cleanedOn: { type: DataTypes.DATEONLY, allowNull: false },
        method: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [cleaningMethods as unknown as string[]] } },
        note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: "" },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "cleaning_records", updatedAt: false },
    );
    return CleaningRecord;
  }
}
