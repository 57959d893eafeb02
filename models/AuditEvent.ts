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

/** Who did what to whom: invitations, role changes, deactivations, suspensions, revocations. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare clubId: ForeignKey<Club["id"]>;
  declare actorId: ForeignKey<User["id"]> | null;
  declare action: string;
  declare subjectType: string;
  declare subjectId: string;
  declare details: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof AuditEvent {
    AuditEvent.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(60), allowNull: false },
        subjectType: { type: DataTypes.STRING(40), allowNull: false },
        subjectId: { type: DataTypes.STRING(64), allowNull: false },
        details: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "audit_events", updatedAt: false },
    );
    return AuditEvent;
  }
}
