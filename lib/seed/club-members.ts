import type { Sequelize } from "sequelize";
import { hashPassword } from "@/lib/auth/password";
import type { Role } from "@/lib/auth/roles";
import { initModels, Club, User } from "@/models";

export interface SeedMember {
  email: string;
  name: string;
  role: Role;
}

/**
 * Creates an invented club and its members when they are missing; running it again changes nothing
 * (the club is matched by slug and members by e-mail, so a password someone changed is kept).
 */
export async function seedClubMembers(
  sequelize: Sequelize,
  club: { name: string; slug: string },
  members: readonly SeedMember[],
  password: string,
): Promise<{ created: number }> {
  initModels(sequelize);
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const [row] = await Club.findOrCreate({ where: { slug: club.slug }, defaults: { ...club, settings: {} }, transaction });
    let created = 0;
    for (const member of members) {
      const [, wasCreated] = await User.findOrCreate({
        where: { email: member.email },
        defaults: { ...member, clubId: row.id, passwordHash },
        transaction,
      });
      if (wasCreated) created += 1;
    }
    return { created };
  });
}
