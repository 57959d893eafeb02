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
import type { User } from "@/models/User";

/** A coach stopped an athlete's clearance to rig unsupervised; active until lifted. */
export class ClearanceSuspension extends Model<InferAttributes<ClearanceSuspension>, InferCreationAttributes<ClearanceSuspension>> {
  declare id: CreationOptional<number>;
  declare clubId: ForeignKey<Club["id"]>;
  declare athleteId: ForeignKey<User["id"]>;
  declare reason: string;
  declare suspendedById: ForeignKey<User["id"]>;
  declare suspendedAt: Date;
  declare liftedAt: CreationOptional<Date | null>;
  declare liftedById: CreationOptional<number | null>;
  declare liftNote: CreationOptional<string | null>;

  static initModel(sequelize: Sequelize): typeof ClearanceSuspension {
    ClearanceSuspension.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        athleteId: { type: DataTypes.INTEGER, allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        suspendedById: { type: DataTypes.INTEGER, allowNull: false },
        suspendedAt: { type: DataTypes.DATE, allowNull: false },
        liftedAt: { type: DataTypes.DATE, allowNull: true },
        liftedById: { type: DataTypes.INTEGER, allowNull: true },
        liftNote: { type: DataTypes.TEXT, allowNull: true },
      },
      { sequelize, tableName: "clearance_suspensions", timestamps: false },
    );
    return ClearanceSuspension;
  }
}
