import "server-only";
import { databaseReady } from "@/lib/data/database";
import { assertMayListMembers, type Actor } from "@/lib/auth/permissions";
import type { Role, UserStatus } from "@/lib/auth/roles";
import { Club, User } from "@/models";
import { selectRows } from "@/lib/data/sql";
import { nextOffsetAfter, type Page, type PageQuery } from "@/lib/validations/paging";

export interface MemberSummary {
  id: number;
  name: string;
  email: string;
  role: Role;
  status: UserStatus;
  lastSignInAt: string | null;
}

export interface ClubSummary {
  id: number;
  name: string;
}

/** The actor's club. */
export async function clubOf(actor: Actor): Promise<ClubSummary> {
  await databaseReady();
  const club = await Club.findByPk(actor.clubId);
  return { id: actor.clubId, name: club?.name ?? "Your club" };
}

const memberColumns = ["id", "name", "email", "role", "status", "lastSignInAt"] as const;

/** Members of the actor's club (coaches and admins only), optionally one role. */
export async function listClubMembers(actor: Actor, role?: Role): Promise<MemberSummary[]> {
  await databaseReady();
  assertMayListMembers(actor);
  // Plain rows with only the columns shown: building model instances for a 1,000-athlete club cost
  // four times the query itself in the benchmark.
  const users = await User.findAll({
    where: { clubId: actor.clubId, ...(role ? { role } : {}) },
    attributes: [...memberColumns],
    order: [["name", "ASC"]],
    raw: true,
  });
  return users.map(memberSummary);
}

type MemberRow = Pick<User, (typeof memberColumns)[number]>;

/**
 * The roster's page in plain SQL on the read connection (lib/data/sql.ts): coaches load it while quiz
 * submissions are being written, and Sequelize's own connection takes one statement at a time.
 */
const countMembers = "SELECT COUNT(*) AS total FROM users WHERE club_id = ? AND role = ?";
const pageOfMembers =
  "SELECT id, name, email, role, status, last_sign_in_at AS lastSignInAt FROM users WHERE club_id = ? AND role = ? ORDER BY name ASC, id ASC LIMIT ? OFFSET ?";

/** One page of the club's members of a role, by name (then id, so pages never overlap). */
export async function pageOfClubMembers(actor: Actor, role: Role, page: PageQuery): Promise<Page<MemberSummary>> {
  await databaseReady();
  assertMayListMembers(actor);
  const [counted, users] = await Promise.all([
    selectRows<{ total: number }>(countMembers, [actor.clubId, role]),
    selectRows<MemberRow>(pageOfMembers, [actor.clubId, role, page.limit, page.offset]),
  ]);
  const total = counted[0]?.total ?? 0;
  return {
    items: users.map(memberSummary),
    total,
    limit: page.limit,
    offset: page.offset,
    nextOffset: nextOffsetAfter(page.offset, users.length, total),
  };
}

function memberSummary(user: Pick<User, (typeof memberColumns)[number]>): MemberSummary {
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    role: user.role,
    status: user.status,
    lastSignInAt: user.lastSignInAt ? new Date(user.lastSignInAt).toISOString() : null,
  };
}
