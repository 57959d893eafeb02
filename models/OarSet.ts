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
import type { Boat } from "@/models/Boat";
import { handleMechanisms, type HandleMechanism } from "@/lib/fleet/catalogue";
import { oarTypes, type OarType } from "@/lib/rigging/types";

/** A set of sculls or sweep oars rigged to the same target; archived, never deleted. */
export class OarSet extends Model<InferAttributes<OarSet>, InferCreationAttributes<OarSet>> {
  declare id: CreationOptional<number>;
  declare clubId: ForeignKey<Club["id"]>;
  declare name: string;
  declare oarType: OarType;
  declare oarCount: number;
  declare targetLengthCm: number;
  declare targetInboardCm: number;
  declare clickCm: number;
  declare handleMechanism: HandleMechanism;
  declare notes: CreationOptional<string>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare boats?: NonAttribute<Boat[]>;

  static initModel(sequelize: Sequelize): typeof OarSet {
    OarSet.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        oarType: { type: DataTypes.STRING(10), allowNull: false, validate: { isIn: [oarTypes as unknown as string[]] } },
        oarCount: { type: DataTypes.INTEGER, allowNull: false },
        targetLengthCm: { type: DataTypes.FLOAT, allowNull: false },
        targetInboardCm: { type: DataTypes.FLOAT, allowNull: false },
        clickCm: { type: DataTypes.FLOAT, allowNull: false },
        handleMechanism: {
          type: DataTypes.STRING(20),
          allowNull: false,
          validate: { isIn: [handleMechanisms as unknown as string[]] },
        },
        notes: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "oar_sets" },
    );
    return OarSet;
  }
}
