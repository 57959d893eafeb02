import { DataTypes, type QueryInterface } from "sequelize";

interface MigrationParams {
  context: QueryInterface;
}

/**
 * A certificate reissued under a member's corrected name is revoked and points at the one that
 * replaced it, so the register, the athlete's page and the public check page can say "replaced".
 */
export async function up({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.addColumn("certificates", "replaced_by_id", { type: DataTypes.STRING(36), allowNull: true });
}

export async function down({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.removeColumn("certificates", "replaced_by_id");
}
