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

import type { Question, QuizSettings } from "@/lib/quiz/types";

export interface StoredResult {
  id: string;
  correct: boolean;
  expected: string;
  explanation: string;
}

/**
 * One quiz attempt: the seed, the questions with their answers (never sent to the browser before
 * submission), the pass mark and settings in force when it started, and once submitted the answers,
 * score and per-question results. The id is a random UUID and doubles as the submission's idempotency key.
 */
export class QuizAttempt extends Model<InferAttributes<QuizAttempt>, InferCreationAttributes<QuizAttempt>> {
  declare id: string;
  declare userId: ForeignKey<User["id"]>;
  declare clubId: ForeignKey<Club["id"]>;
  declare moduleSlug: string;
  declare seed: string;
  declare questions: Question[];
  declare passMark: number;
  declare quizSettings: QuizSettings;
  declare answers: CreationOptional<Record<string, unknown> | null>;
  declare score: CreationOptional<number | null>;
  declare passed: CreationOptional<boolean | null>;
  declare results: CreationOptional<StoredResult[] | null>;
  declare startedAt: Date;
  declare submittedAt: CreationOptional<Date | null>;

  static initModel(sequelize: Sequelize): typeof QuizAttempt {
    QuizAttempt.init(
      {
        id: { type: DataTypes.STRING(36), primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        moduleSlug: { type: DataTypes.STRING(60), allowNull: false },
        seed: { type: DataTypes.STRING(64), allowNull: false },
        questions: { type: DataTypes.JSON, allowNull: false },
        passMark: { type: DataTypes.FLOAT, allowNull: false },
        quizSettings: { type: DataTypes.JSON, allowNull: false },
        answers: { type: DataTypes.JSON, allowNull: true },
        score: { type: DataTypes.FLOAT, allowNull: true },
        passed: { type: DataTypes.BOOLEAN, allowNull: true },
        results: { type: DataTypes.JSON, allowNull: true },
        startedAt: { type: DataTypes.DATE, allowNull: false },
        submittedAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, tableName: "quiz_attempts", timestamps: false },
    );
    return QuizAttempt;
  }
}
