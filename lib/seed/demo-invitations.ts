import type { Sequelize } from "sequelize";
import { Club, Invitation, User } from "@/models";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { demoClub } from "@/lib/seed/demo-club";

/** Two invented invitations nobody has accepted: one still open, one expired (its link was never sent anywhere). */
const demoInvitations = [
  { email: "tamsin@lantern-reach.example", name: "Tamsin Fairweather", role: "athlete" as const, sentDaysAgo: 3 },
  { email: "oskar@lantern-reach.example", name: "Oskar Brandvold", role: "athlete" as const, sentDaysAgo: 20 },
];

/** Adds the demo club's unanswered invitations when it has none yet (idempotent). Run after seedDemoClub. */
export async function seedDemoInvitations(sequelize: Sequelize): Promise<{ created: number }> {
  const club = await Club.findOne({ where: { slug: demoClub.slug } });
  if (!club) throw new Error("Seed the demo club first (seedDemoClub).");
  if ((await Invitation.count({ where: { clubId: club.id } })) > 0) return { created: 0 };
  const admin = await User.findOne({ where: { clubId: club.id, role: "admin" } });
  return sequelize.transaction(async (transaction) => {
    for (const invitation of demoInvitations) {
      const sentAt = new Date(Date.now() - invitation.sentDaysAgo * 86_400_000);
      await Invitation.create(
        {
          clubId: club.id,
          invitedById: admin?.id ?? null,
          email: invitation.email,
          name: invitation.name,
          role: invitation.role,
          tokenHash: hashToken(newToken()),
          expiresAt: new Date(sentAt.getTime() + 14 * 86_400_000),
          createdAt: sentAt,
          updatedAt: sentAt,
        },
        { transaction },
      );
    }
    return { created: demoInvitations.length };
  });
}
