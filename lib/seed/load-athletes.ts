import type { Sequelize } from "sequelize";
import { seedClubMembers } from "@/lib/seed/club-members";
import { demoPassword } from "@/lib/seed/demo-club";

/** Test-only: a separate invented club of numbered athletes for load and crash tests (idempotent). */
export const loadClub = { name: "Load Trial Rowing Club", slug: "load-trial" };

export function loadAthleteEmail(index: number): string {
  return `load${String(index).padStart(3, "0")}@load-trial.example`;
}

export async function seedLoadAthletes(sequelize: Sequelize, count: number): Promise<void> {
  const athletes = Array.from({ length: count }, (_, index) => ({
    email: loadAthleteEmail(index + 1),
    name: `Load Athlete ${index + 1}`,
    role: "athlete" as const,
  }));
  await seedClubMembers(sequelize, loadClub, athletes, demoPassword);
}
