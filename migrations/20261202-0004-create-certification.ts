import { DataTypes, type QueryInterface } from "sequelize";

interface MigrationParams {
  context: QueryInterface;
}

export async function up({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.createTable("practical_assessments", {
    id: { type: DataTypes.STRING(36), primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    module_slug: { type: DataTypes.STRING(60), allowNull: false },
    requested_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    coach_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" } },
    requested_at: { type: DataTypes.DATE, allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "waiting" },
    assessor_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" } },
    assessed_at: { type: DataTypes.DATE, allowNull: true },
    checklist: { type: DataTypes.JSON, allowNull: true },
    verdicts: { type: DataTypes.JSON, allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: true },
  });
  await queryInterface.addIndex("practical_assessments", ["club_id", "status"]);
  await queryInterface.addIndex("practical_assessments", ["athlete_id", "module_slug"]);

  await queryInterface.createTable("evidence_photos", {
    id: { type: DataTypes.STRING(36), primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    assessment_id: {
      type: DataTypes.STRING(36),
      allowNull: false,
      references: { model: "practical_assessments", key: "id" },
    },
    uploaded_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    stored_name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    media_type: { type: DataTypes.STRING(32), allowNull: false },
    byte_size: { type: DataTypes.INTEGER, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("evidence_photos", ["assessment_id"]);

  await queryInterface.createTable("certificates", {
    id: { type: DataTypes.STRING(36), primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    kind: { type: DataTypes.STRING(16), allowNull: false },
    module_slug: { type: DataTypes.STRING(60), allowNull: true },
    assessment_id: {
      type: DataTypes.STRING(36),
      allowNull: true,
      references: { model: "practical_assessments", key: "id" },
    },
    covered_modules: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
    serial: { type: DataTypes.STRING(32), allowNull: false },
    serial_year: { type: DataTypes.INTEGER, allowNull: false },
    serial_number: { type: DataTypes.INTEGER, allowNull: false },
    verification_code: { type: DataTypes.STRING(32), allowNull: false, unique: true },
    athlete_name: { type: DataTypes.STRING(120), allowNull: false },
    title: { type: DataTypes.STRING(160), allowNull: false },
    signed_off_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" } },
    signed_off_by_name: { type: DataTypes.STRING(120), allowNull: false },
    issued_on: { type: DataTypes.DATEONLY, allowNull: false },
    expires_on: { type: DataTypes.DATEONLY, allowNull: false },
    issued_at: { type: DataTypes.DATE, allowNull: false },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    revoked_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" } },
    revoke_reason: { type: DataTypes.TEXT, allowNull: true },
  });
  await queryInterface.addIndex("certificates", ["club_id", "serial_year", "serial_number"], {
    unique: true,
  });
  await queryInterface.addIndex("certificates", ["club_id", "serial"], { unique: true });
  await queryInterface.addIndex("certificates", ["club_id", "issued_on"]);
  await queryInterface.addIndex("certificates", ["athlete_id", "kind"]);

  await queryInterface.createTable("clearance_suspensions", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    reason: { type: DataTypes.TEXT, allowNull: false },
    suspended_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    suspended_at: { type: DataTypes.DATE, allowNull: false },
    lifted_at: { type: DataTypes.DATE, allowNull: true },
    lifted_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" } },
    lift_note: { type: DataTypes.TEXT, allowNull: true },
  });
  await queryInterface.addIndex("clearance_suspensions", ["athlete_id", "lifted_at"]);
}

export async function down({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.dropTable("clearance_suspensions");
  await queryInterface.dropTable("certificates");
  await queryInterface.dropTable("evidence_photos");
  await queryInterface.dropTable("practical_assessments");
}
