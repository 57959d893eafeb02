import { DataTypes, type QueryInterface } from "sequelize";

interface MigrationParams {
  context: QueryInterface;
}

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

/** The club's boats and oar sets, the plans athletes saved, the grip-cleaning log and the weekly digest record. */
export async function up({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.createTable("boats", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    name: { type: DataTypes.STRING(80), allowNull: false },
    boat_class: { type: DataTypes.STRING(4), allowNull: false },
    span_cm: { type: DataTypes.FLOAT, allowNull: true },
    spread_cm: { type: DataTypes.FLOAT, allowNull: true },
    notes: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await queryInterface.addIndex("boats", ["club_id", "archived_at"]);

  await queryInterface.createTable("oar_sets", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    name: { type: DataTypes.STRING(80), allowNull: false },
    oar_type: { type: DataTypes.STRING(10), allowNull: false },
    oar_count: { type: DataTypes.INTEGER, allowNull: false },
    target_length_cm: { type: DataTypes.FLOAT, allowNull: false },
    target_inboard_cm: { type: DataTypes.FLOAT, allowNull: false },
    click_cm: { type: DataTypes.FLOAT, allowNull: false },
    handle_mechanism: { type: DataTypes.STRING(20), allowNull: false },
    notes: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await queryInterface.addIndex("oar_sets", ["club_id", "archived_at"]);

  await queryInterface.createTable("boat_oar_sets", {
    boat_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: "boats", key: "id" } },
    oar_set_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: "oar_sets", key: "id" } },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("boat_oar_sets", ["oar_set_id"]);

  await queryInterface.createTable("rig_plans", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    boat_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "boats", key: "id" } },
    oar_set_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "oar_sets", key: "id" } },
    client_id: { type: DataTypes.STRING(36), allowNull: false },
    oar_type: { type: DataTypes.STRING(10), allowNull: false },
    measured_length_cm: { type: DataTypes.FLOAT, allowNull: false },
    measured_inboard_cm: { type: DataTypes.FLOAT, allowNull: false },
    target_length_cm: { type: DataTypes.FLOAT, allowNull: false },
    target_inboard_cm: { type: DataTypes.FLOAT, allowNull: false },
    click_cm: { type: DataTypes.FLOAT, allowNull: false },
    span_cm: { type: DataTypes.FLOAT, allowNull: true },
    spread_cm: { type: DataTypes.FLOAT, allowNull: true },
    half_swivel_cm: { type: DataTypes.FLOAT, allowNull: false },
    result: { type: DataTypes.JSON, allowNull: false },
    planned_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("rig_plans", ["user_id", "client_id"], { unique: true });
  await queryInterface.addIndex("rig_plans", ["club_id", "planned_at"]);
  await queryInterface.addIndex("rig_plans", ["boat_id", "planned_at"]);

  await queryInterface.createTable("cleaning_records", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    oar_set_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "oar_sets", key: "id" } },
    cleaned_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    recorded_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    cleaned_on: { type: DataTypes.DATEONLY, allowNull: false },
    method: { type: DataTypes.STRING(20), allowNull: false },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: "" },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("cleaning_records", ["oar_set_id", "cleaned_on"]);
  await queryInterface.addIndex("cleaning_records", ["club_id", "cleaned_on"]);

  await queryInterface.createTable("cleaning_digests", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    iso_week: { type: DataTypes.STRING(8), allowNull: false },
    state: { type: DataTypes.STRING(10), allowNull: false },
    kind: { type: DataTypes.STRING(10), allowNull: false },
    recipients: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await queryInterface.addIndex("cleaning_digests", ["club_id", "iso_week"], { unique: true });
}

export async function down({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.dropTable("cleaning_digests");
  await queryInterface.dropTable("cleaning_records");
  await queryInterface.dropTable("rig_plans");
  await queryInterface.dropTable("boat_oar_sets");
  await queryInterface.dropTable("oar_sets");
  await queryInterface.dropTable("boats");
}
