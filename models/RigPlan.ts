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
import type { Boat } from "@/models/Boat";
import type { OarSet } from "@/models/OarSet";
import type { OarType } from "@/lib/rigging/types";
import type { RigPlanResponse } from "@/lib/fleet/plan-response";

/** A boat change an athlete planned and saved: what they measured, what they aimed for, the steps, when. */
export class RigPlan extends Model<InferAttributes<RigPlan>, InferCreationAttributes<RigPlan>> {
  declare id: CreationOptional<number>;
  declare clubId: ForeignKey<Club["id"]>;
  declare userId: ForeignKey<User["id"]>;
  declare boatId: ForeignKey<Boat["id"]>;
  declare oarSetId: ForeignKey<OarSet["id"]>;
  /** Made on the phone, so a plan sent twice (offline queue, lost answer) is recorded once. */
  declare clientId: string;
  declare oarType: OarType;
  declare measuredLengthCm: number;
  declare measuredInboardCm: number;
  declare targetLengthCm: number;
  declare targetInboardCm: number;
  declare clickCm: number;
  declare spanCm: number | null;
  declare spreadCm: number | null;
  declare halfSwivelCm: number;
  declare result: RigPlanResponse;
  /** When the athlete worked the plan out (maybe offline, before it reached the server). */
  declare plannedAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;
  declare boat?: NonAttribute<Boat>;
  declare oarSet?: NonAttribute<OarSet>;

  static initModel(sequelize: Sequelize): typeof RigPlan {
    RigPlan.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        boatId: { type: DataTypes.INTEGER, allowNull: false },
        oarSetId: { type: DataTypes.INTEGER, allowNull: false },
        clientId: { type: DataTypes.STRING(36), allowNull: false },
        oarType: { type: DataTypes.STRING(10), allowNull: false },
        measuredLengthCm: { type: DataTypes.FLOAT, allowNull: false },
        measuredInboardCm: { type: DataTypes.FLOAT, allowNull: false },
        targetLengthCm: { type: DataTypes.FLOAT, allowNull: false },
        targetInboardCm: { type: DataTypes.FLOAT, allowNull: false },
        clickCm: { type: DataTypes.FLOAT, allowNull: false },
        spanCm: { type: DataTypes.FLOAT, allowNull: true },
        spreadCm: { type: DataTypes.FLOAT, allowNull: true },
        halfSwivelCm: { type: DataTypes.FLOAT, allowNull: false },
        result: { type: DataTypes.JSON, allowNull: false },
        plannedAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "rig_plans", updatedAt: false },
    );
    return RigPlan;
  }
}
