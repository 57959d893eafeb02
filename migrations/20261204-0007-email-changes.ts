import { DataTypes, type QueryInterface } from "sequelize";

interface MigrationParams {
  context: QueryInterface;
}

/**
 * A member's request to move their account to another e-mail address: it takes effect when the link
 * sent to the new address is used. Only the SHA-256 of the link's token is stored.
 */
export async function up({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.createTable("email_changes", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    new_email: { type: DataTypes.STRING(254), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("email_changes", ["user_id"]);
}

export async function down({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.dropTable("email_changes");
}
