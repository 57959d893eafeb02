import { DataTypes, type QueryInterface } from "sequelize";

interface MigrationParams {
  context: QueryInterface;
}

export async function up({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.createTable("lesson_reads", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    module_slug: { type: DataTypes.STRING(60), allowNull: false },
    read_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("lesson_reads", ["user_id", "module_slug"], { unique: true });

  await queryInterface.createTable("quiz_attempts", {
    id: { type: DataTypes.STRING(36), primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    module_slug: { type: DataTypes.STRING(60), allowNull: false },
    seed: { type: DataTypes.STRING(64), allowNull: false },
    questions: { type: DataTypes.JSON, allowNull: false },
    pass_mark: { type: DataTypes.FLOAT, allowNull: false },
    quiz_settings: { type: DataTypes.JSON, allowNull: false },
    answers: { type: DataTypes.JSON, allowNull: true },
    score: { type: DataTypes.FLOAT, allowNull: true },
    passed: { type: DataTypes.BOOLEAN, allowNull: true },
    results: { type: DataTypes.JSON, allowNull: true },
    started_at: { type: DataTypes.DATE, allowNull: false },
    submitted_at: { type: DataTypes.DATE, allowNull: true },
  });
  await queryInterface.addIndex("quiz_attempts", ["user_id", "module_slug", "submitted_at"]);
  await queryInterface.addIndex("quiz_attempts", ["club_id", "module_slug"]);
}

export async function down({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.dropTable("quiz_attempts");
  await queryInterface.dropTable("lesson_reads");
}
