import type { Sequelize } from "sequelize";
import { AuditEvent } from "@/models/AuditEvent";
import { Club } from "@/models/Club";
import { Invitation } from "@/models/Invitation";
import { LessonRead } from "@/models/LessonRead";
import { QuizAttempt } from "@/models/QuizAttempt";
import { SignInLink } from "@/models/SignInLink";
import { User } from "@/models/User";

export { AuditEvent, Club, Invitation, LessonRead, QuizAttempt, SignInLink, User };

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

  Club.hasMany(User, { foreignKey: "clubId" });
  User.belongsTo(Club, { foreignKey: "clubId" });
  Invitation.belongsTo(Club, { foreignKey: "clubId" });
  SignInLink.belongsTo(User, { foreignKey: "userId" });
  AuditEvent.belongsTo(User, { foreignKey: "actorId", as: "actor" });
  LessonRead.belongsTo(User, { foreignKey: "userId" });
  QuizAttempt.belongsTo(User, { foreignKey: "userId" });
  User.hasMany(QuizAttempt, { foreignKey: "userId" });
  initialised.add(sequelize);
}
