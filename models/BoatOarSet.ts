import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Boat } from "@/models/Boat";
import type { OarSet } from "@/models/OarSet";

/** Which oar sets are used in which boats (many to many). */
export class BoatOarSet extends Model<InferAttributes<BoatOarSet>, InferCreationAttributes<BoatOarSet>> {
  declare boatId: ForeignKey<Boat["id"]>;
  declare oarSetId: ForeignKey<OarSet["id"]>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof BoatOarSet {
    BoatOarSet.init(
      {
        boatId: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
        oarSetId: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "boat_oar_sets", updatedAt: false },
    );
    return BoatOarSet;
  }
}
