import type { Sequelize } from "sequelize";
import { AuditEvent } from "@/models/AuditEvent";
import { Certificate } from "@/models/Certificate";
import { ClearanceSuspension } from "@/models/ClearanceSuspension";
import { Club } from "@/models/Club";
import { EmailChange } from "@/models/EmailChange";
import { EvidencePhoto } from "@/models/EvidencePhoto";
import { Invitation } from "@/models/Invitation";
import { LessonRead } from "@/models/LessonRead";
import { PracticalAssessment } from "@/models/PracticalAssessment";
import { QuizAttempt } from "@/models/QuizAttempt";
import { SignInLink } from "@/models/SignInLink";
import { User } from "@/models/User";
import { Boat } from "@/models/Boat";
import { BoatOarSet } from "@/models/BoatOarSet";
import { CleaningDigest } from "@/models/CleaningDigest";
import { CleaningRecord } from "@/models/CleaningRecord";
import { OarSet } from "@/models/OarSet";
import { RigPlan } from "@/models/RigPlan";

export { AuditEvent, Club, EmailChange, Invitation, LessonRead, QuizAttempt, SignInLink, User };
export { Boat, BoatOarSet, CleaningDigest, CleaningRecord, OarSet, RigPlan };
export { Certificate, ClearanceSuspension, EvidencePhoto, PracticalAssessment };

const initialised = new WeakSet<Sequelize>();

/** Initialises every model and association on the instance once. */
export function initModels(sequelize: Sequelize): void {
  if (initialised.has(sequelize)) return;
  Club.initModel(sequelize);
  User.initModel(sequelize);
  Invitation.initModel(sequelize);
  SignInLink.initModel(sequelize);
  EmailChange.initModel(sequelize);
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
  EmailChange.belongsTo(User, { foreignKey: "userId" });
  AuditEvent.belongsTo(User, { foreignKey: "actorId", as: "actor" });
  LessonRead.belongsTo(User, { foreignKey: "userId" });
  QuizAttempt.belongsTo(User, { foreignKey: "userId" });
  User.hasMany(QuizAttempt, { foreignKey: "userId" });
  initFleetModels(sequelize);
  PracticalAssessment.belongsTo(User, { foreignKey: "athleteId", as: "athlete" });
  PracticalAssessment.hasMany(EvidencePhoto, { foreignKey: "assessmentId", as: "photos" });
  Certificate.belongsTo(User, { foreignKey: "athleteId", as: "athlete" });
  ClearanceSuspension.belongsTo(User, { foreignKey: "athleteId", as: "athlete" });
  initialised.add(sequelize);
}

/** The rig feature's models (issue 5): boats, oar sets, saved plans, the cleaning log and digests. */
function initFleetModels(sequelize: Sequelize): void {
  Boat.initModel(sequelize);
  OarSet.initModel(sequelize);
  BoatOarSet.initModel(sequelize);
  RigPlan.initModel(sequelize);
  CleaningRecord.initModel(sequelize);
  CleaningDigest.initModel(sequelize);

  Boat.belongsToMany(OarSet, { through: BoatOarSet, foreignKey: "boatId", otherKey: "oarSetId", as: "oarSets" });
  OarSet.belongsToMany(Boat, { through: BoatOarSet, foreignKey: "oarSetId", otherKey: "boatId", as: "boats" });
  RigPlan.belongsTo(User, { foreignKey: "userId", as: "user" });
  RigPlan.belongsTo(Boat, { foreignKey: "boatId", as: "boat" });
  RigPlan.belongsTo(OarSet, { foreignKey: "oarSetId", as: "oarSet" });
  CleaningRecord.belongsTo(User, { foreignKey: "cleanedById", as: "cleanedBy" });
  CleaningRecord.belongsTo(OarSet, { foreignKey: "oarSetId", as: "oarSet" });
}
