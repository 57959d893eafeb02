import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";
import { migrationList } from "@/migrations";

function migrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: migrationList.map(({ name, module }) => ({
      name,
      up: ({ context }) => module.up({ context }),
      down: ({ context }) => module.down({ context }),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, modelName: "SequelizeMeta" }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns the names applied. */
export async function migrateToLatest(sequelize: Sequelize): Promise<string[]> {
  const applied = await migrator(sequelize).up();
  return applied.map((migration) => migration.name);
}

/** Reverts every migration (tests of the down steps). */
export async function migrateToNothing(sequelize: Sequelize): Promise<void> {
  await migrator(sequelize).down({ to: 0 });
}
