import type { Sequelize } from "sequelize";
import { AuditEvent } from "@/models/AuditEvent";
import { Certificate } from "@/models/Certificate";
import { ClearanceSuspension } from "@/models/ClearanceSuspension";
import { Club } from "@/models/Club";
import { EvidencePhoto } from "@/models/EvidencePhoto";
import { Invitation } from "@/models/Invitation";
import { LessonRead } from "@/models/LessonRead";
import { PracticalAssessment } from "@/models/PracticalAssessment";
import { QuizAttempt } from "@/models/QuizAttempt";
import { SignInLink } from "@/models/SignInLink";
import { User } from "@/models/User";

export { AuditEvent, Club, Invitation, LessonRead, QuizAttempt, SignInLink, User };
export { Certificate, ClearanceSuspension, EvidencePhoto, PracticalAssessment };

const initialised = new WeakSet<Sequelize>();

/** Initialises every model and association on the instance once. */
export function initModels(sequelize: Sequelize): void {
  if (initialised.has(sequelize)) return;
  Club.initModel(sequelize);
  User.initModel(sequelize);
  Invitation.initModel(sequelize);
  SignInLink.initModel(sequelize);
  AuditEvent.initModel(sequelize);
  LessonRead.initModel(sequelize);
  QuizAttempt.initModel(sequelize);
  PracticalAssessment.initModel(sequelize);
  EvidencePhoto.initModel(sequelize);
  Certificate.initModel(sequelize);
  ClearanceSuspension.initModel(sequelize);

  Club.hasMany(User, { foreignKey: "clubId" });
  User.belongsTo(Club, { foreignKey: "clubId" });
  Invitation.belongsTo(Club, { foreignKey: "clubId" });
  SignInLink.belongsTo(User, { foreignKey: "userId" });
  AuditEvent.belongsTo(User, { foreignKey: "actorId", as: "actor" });
  LessonRead.belongsTo(User, { foreignKey: "userId" });
  QuizAttempt.belongsTo(User, { foreignKey: "userId" });
  User.hasMany(QuizAttempt, { foreignKey: "userId" });
  PracticalAssessment.belongsTo(User, { foreignKey: "athleteId", as: "athlete" });
  PracticalAssessment.hasMany(EvidencePhoto, { foreignKey: "assessmentId", as: "photos" });
  Certificate.belongsTo(User, { foreignKey: "athleteId", as: "athlete" });
  ClearanceSuspension.belongsTo(User, { foreignKey: "athleteId", as: "athlete" });
  initialised.add(sequelize);
}
