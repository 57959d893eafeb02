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
import type { OarSet } from "@/models/OarSet";
import { boatClasses, type BoatClass } from "@/lib/fleet/catalogue";

/** One of the club's boats; archived, never deleted, once plans point to it. */
export class Boat extends Model<InferAttributes<Boat>, InferCreationAttributes<Boat>> {
  declare id: CreationOptional<number>;
  declare clubId: ForeignKey<Club["id"]>;
  declare name: string;
  declare boatClass: BoatClass;
  /** Sculling boats: pin centre to pin centre. */
  declare spanCm: CreationOptional<number | null>;
  /** Sweep boats: centre line to pin centre. */
  declare spreadCm: CreationOptional<number | null>;
  declare notes: CreationOptional<string>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare oarSets?: NonAttribute<OarSet[]>;

  static initModel(sequelize: Sequelize): typeof Boat {
    Boat.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        boatClass: { type: DataTypes.STRING(4), allowNull: false, validate: { isIn: [boatClasses as unknown as string[]] } },
        spanCm: { type: DataTypes.FLOAT, allowNull: true },
        spreadCm: { type: DataTypes.FLOAT, allowNull: true },
        notes: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "boats" },
    );
    return Boat;
  }
}
