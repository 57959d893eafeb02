import { DataTypes, type QueryInterface } from "sequelize";

interface MigrationParams {
  context: QueryInterface;
}

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.createTable("clubs", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
    settings: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
    logo_file: { type: DataTypes.STRING(120), allowNull: true },
    ...timestamps,
  });
  await queryInterface.createTable("users", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: true },
    status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "active" },
    token_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    last_sign_in_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await queryInterface.addIndex("users", ["club_id", "role"]);
  await queryInterface.createTable("invitations", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    invited_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" } },
    email: { type: DataTypes.STRING(254), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await queryInterface.createTable("sign_in_links", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await queryInterface.createTable("audit_events", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    club_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "clubs", key: "id" } },
    actor_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" } },
    action: { type: DataTypes.STRING(60), allowNull: false },
    subject_type: { type: DataTypes.STRING(40), allowNull: false },
    subject_id: { type: DataTypes.STRING(64), allowNull: false },
    details: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("audit_events", ["club_id", "created_at"]);
}

export async function down({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.dropTable("audit_events");
  await queryInterface.dropTable("sign_in_links");
  await queryInterface.dropTable("invitations");
  await queryInterface.dropTable("users");
  await queryInterface.dropTable("clubs");
}
