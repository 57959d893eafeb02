import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { User } from "@/models/User";

/** That an athlete has read a module's lesson (first time only). */
export class LessonRead extends Model<InferAttributes<LessonRead>, InferCreationAttributes<LessonRead>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User["id"]>;
  declare moduleSlug: string;
  declare readAt: Date;

  static initModel(sequelize: Sequelize): typeof LessonRead {
    LessonRead.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        moduleSlug: { type: DataTypes.STRING(60), allowNull: false },
        readAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: "lesson_reads", timestamps: false },
    );
    return LessonRead;
  }
}
