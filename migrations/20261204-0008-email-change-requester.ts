import { DataTypes, type QueryInterface } from "sequelize";

interface MigrationParams {
  context: QueryInterface;
}

/**
 * Who asked for an e-mail change: null when the member did, so that only the member, signed in, can
 * confirm it (a typo in the new address must not hand the account to that address's owner); an admin's
 * id when an admin started it for a member who cannot sign in.
 */
export async function up({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.addColumn("email_changes", "requested_by_id", {
    type: DataTypes.INTEGER,
    allowNull: true,
    references: { model: "users", key: "id" },
  });
}

export async function down({ context: queryInterface }: MigrationParams): Promise<void> {
  await queryInterface.removeColumn("email_changes", "requested_by_id");
}
