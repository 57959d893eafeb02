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
import type { ChecklistItem } from "@/lib/content/module-schema";
import type { ChecklistVerdict } from "@/lib/clearance/checklist";

export const assessmentStatuses = ["waiting", "passed", "not-yet", "withdrawn"] as const;
export type AssessmentStatus = (typeof assessmentStatuses)[number];

/**
 * One practical sign-off: asked for (waiting), then decided by a coach (passed or not yet). The
 * checklist is copied in at the decision, so a later edit of the lesson never rewrites what was observed.
 */
export class PracticalAssessment extends Model<InferAttributes<PracticalAssessment>, InferCreationAttributes<PracticalAssessment>> {
  declare id: string;
  declare clubId: ForeignKey<Club["id"]>;
  declare athleteId: ForeignKey<User["id"]>;
  declare moduleSlug: string;
  declare requestedById: ForeignKey<User["id"]>;
  /** The coach the athlete asked; null means any coach of the club. */
  declare coachId: CreationOptional<number | null>;
  declare requestedAt: Date;
  declare status: CreationOptional<AssessmentStatus>;
  declare assessorId: CreationOptional<number | null>;
  declare assessedAt: CreationOptional<Date | null>;
  declare checklist: CreationOptional<ChecklistItem[] | null>;
  declare verdicts: CreationOptional<Record<string, ChecklistVerdict> | null>;
  declare note: CreationOptional<string | null>;

  static initModel(sequelize: Sequelize): typeof PracticalAssessment {
    PracticalAssessment.init(
      {
        id: { type: DataTypes.STRING(36), primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        athleteId: { type: DataTypes.INTEGER, allowNull: false },
        moduleSlug: { type: DataTypes.STRING(60), allowNull: false },
        requestedById: { type: DataTypes.INTEGER, allowNull: false },
        coachId: { type: DataTypes.INTEGER, allowNull: true },
        requestedAt: { type: DataTypes.DATE, allowNull: false },
        status: {
          type: DataTypes.STRING(16),
          allowNull: false,
          defaultValue: "waiting",
          validate: { isIn: [assessmentStatuses as unknown as string[]] },
        },
        assessorId: { type: DataTypes.INTEGER, allowNull: true },
        assessedAt: { type: DataTypes.DATE, allowNull: true },
        checklist: { type: DataTypes.JSON, allowNull: true },
        verdicts: { type: DataTypes.JSON, allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: true },
      },
      { sequelize, tableName: "practical_assessments", timestamps: false },
    );
    return PracticalAssessment;
  }
}
