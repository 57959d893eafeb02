import "server-only";
import { getSequelize } from "@/lib/db";
import { migrateToLatest } from "@/lib/migrate";
import { initModels } from "@/models";

interface ReadyGlobal {
  slipwayMigrated?: Promise<void>;
}
const globalStore = globalThis as unknown as ReadyGlobal;

/**
 * Resolves once the database file exists and is migrated, with the models initialised. Every data-access
 * function awaits it, so an empty or missing database is created on first use without manual steps.
 *
 * The migration promise lives on globalThis (once per process), but initModels runs per module
 * instance: Next's production server loads each route's chunks with their own module cache, so each
 * copy of the model classes must be bound to the shared Sequelize instance itself.
 */
export function databaseReady(): Promise<void> {
  const sequelize = getSequelize();
  initModels(sequelize);
  globalStore.slipwayMigrated ??= migrateToLatest(sequelize)
    .then(() => undefined)
    .catch((error: unknown) => {
      globalStore.slipwayMigrated = undefined;
      throw error;
    });
  return globalStore.slipwayMigrated;
}
