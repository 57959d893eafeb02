import type { Sequelize } from "sequelize";
import { seedClubMembers, type SeedMember } from "@/lib/seed/club-members";

/** Invented demo data only: no real club or person. */
export const demoClub = { name: "Lantern Reach Rowing Club", slug: "lantern-reach" };
export const demoPassword = "lantern-reach-demo";

export type DemoMember = SeedMember;

export const demoMembers: DemoMember[] = [
  { email: "admin@lantern-reach.example", name: "Maren Okafor", role: "admin" },
  { email: "coach.tobias@lantern-reach.example", name: "Tobias Lindqvist", role: "coach" },
  { email: "coach.ines@lantern-reach.example", name: "Inès Barrow", role: "coach" },
  { email: "ada@lantern-reach.example", name: "Ada Whitcombe", role: "athlete" },
  { email: "bilal@lantern-reach.example", name: "Bilal Hartigan", role: "athlete" },
  { email: "carys@lantern-reach.example", name: "Carys Penhallow", role: "athlete" },
  { email: "dev@lantern-reach.example", name: "Dev Castellano", role: "athlete" },
  { email: "elin@lantern-reach.example", name: "Elin Marchetti", role: "athlete" },
  { email: "femi@lantern-reach.example", name: "Femi Ashdown", role: "athlete" },
  { email: "greta@lantern-reach.example", name: "Greta Quennell", role: "athlete" },
  { email: "hamish@lantern-reach.example", name: "Hamish Oyelaran", role: "athlete" },
  { email: "iris@lantern-reach.example", name: "Iris Delacourt", role: "athlete" },
  { email: "jonah@lantern-reach.example", name: "Jonah Treloar", role: "athlete" },
  { email: "kit@lantern-reach.example", name: "Kit Abernethy", role: "athlete" },
  { email: "lena@lantern-reach.example", name: "Lena Fairbrother", role: "athlete" },
];

/** Creates the demo club and its members when they are missing (idempotent). */
export function seedDemoClub(sequelize: Sequelize): Promise<{ created: number }> {
  return seedClubMembers(sequelize, demoClub, demoMembers, demoPassword);
}
