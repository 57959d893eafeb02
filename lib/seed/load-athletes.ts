import type { Sequelize } from "sequelize";
import { hashPassword } from "@/lib/auth/password";
import { initModels, Club, User } from "@/models";
import { demoPassword } from "@/lib/seed/demo-club";

/** Test-only: a separate invented club of numbered athletes for load and crash tests (idempotent). */
export const loadClub = { name: "Load Trial Rowing Club", slug: "load-trial" };

export function loadAthleteEmail(index: number): string {
  return `load${String(index).padStart(3, "0")}@load-trial.example`;
}

export async function seedLoadAthletes(sequelize: Sequelize, count: number): Promise<void> {
  initModels(sequelize);
  const passwordHash = await hashPassword(demoPassword);
  await sequelize.transaction(async (transaction) => {
    const [club] = await Club.findOrCreate({ where: { slug: loadClub.slug }, defaults: { ...loadClub, settings: {} }, transaction });
    for (let index = 1; index <= count; index += 1) {
      await User.findOrCreate({
        where: { email: loadAthleteEmail(index) },
        defaults: { email: loadAthleteEmail(index), name: `Load Athlete ${index}`, role: "athlete", clubId: club.id, passwordHash },
        transaction,
      });
    }
  });
}
