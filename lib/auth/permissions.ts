import type { Role } from "@/lib/auth/roles";
import { ForbiddenError, NotFoundError, UnauthenticatedError } from "@/lib/http/errors";

/** The signed-in user as every permission check sees them. */
export interface Actor {
  id: number;
  clubId: number;
  role: Role;
  name: string;
  email: string;
}

/** Who may enter a part of the site: anyone, any member, coaches (and admins), admins only. */
export type Area = "public" | "member" | "coach" | "admin";

const areaPrefixes: { prefix: string; area: Area }[] = [
  { prefix: "/club", area: "admin" },
  { prefix: "/roster", area: "coach" },
  { prefix: "/learn", area: "member" },
  { prefix: "/rig", area: "member" },
  { prefix: "/account", area: "member" },
];

/** The area a page path belongs to; paths not listed are public. */
export function areaForPath(pathname: string): Area {
  for (const { prefix, area } of areaPrefixes) {
    if (pathname === prefix || pathname.startsWith(`${prefix}/`)) return area;
  }
  return "public";
}

/** Who a refused page is for, in the words the 403 page uses ("This page is for …"). */
export function areaAudience(area: Area): string {
  if (area === "admin") return "club administrators";
  if (area === "coach") return "coaches and club administrators";
  return "members of the club";
}

const roleRank: Record<Role, number> = { athlete: 1, coach: 2, admin: 3 };
const areaRank: Record<Area, number> = { public: 0, member: 1, coach: 2, admin: 3 };

/** Admins can do what coaches do, coaches what members do. */
export function canEnterArea(role: Role | null, area: Area): boolean {
  if (area === "public") return true;
  if (!role) return false;
  return roleRank[role] >= areaRank[area];
}

/** Where each role lands after signing in. */
export function homePathFor(role: Role): string {
  if (role === "admin") return "/club";
  if (role === "coach") return "/roster";
  return "/learn";
}

export function isCoach(actor: Actor): boolean {
  return canEnterArea(actor.role, "coach");
}

export function isAdmin(actor: Actor): boolean {
  return actor.role === "admin";
}

interface ClubMember {
  id: number;
  clubId: number;
}

/** Athletes see their own records; coaches and admins see their own club's athletes. */
export function canViewAthlete(actor: Actor, athlete: ClubMember): boolean {
  return actor.id === athlete.id || (isCoach(actor) && actor.clubId === athlete.clubId);
}

/** A coach or admin of the athlete's club observes the practical, never their own. */
export function canSignOff(actor: Actor, athlete: ClubMember): boolean {
  return isCoach(actor) && actor.clubId === athlete.clubId && actor.id !== athlete.id;
}

/** Athletes ask for their own practical sign-off; nobody asks on another's behalf. */
export function canRequestSignOff(actor: Actor, athlete: ClubMember): boolean {
  return actor.id === athlete.id && actor.clubId === athlete.clubId;
}

/** Coaches (and admins) of the athlete's club suspend and lift a clearance, never their own. */
export function canSuspendClearance(actor: Actor, athlete: ClubMember): boolean {
  return canSignOff(actor, athlete);
}

/** Admins manage members, settings, certificates and the register of their own club. */
export function canManageClub(actor: Actor, clubId: number): boolean {
  return isAdmin(actor) && actor.clubId === clubId;
}

/** Admins may change another member's role or deactivate them, never their own account. */
export function canChangeMember(actor: Actor, member: ClubMember): boolean {
  return canManageClub(actor, member.clubId) && actor.id !== member.id;
}

/** The local mail outbox is readable only in demo mode, and only by admins. */
export function canReadOutbox(actor: Actor, demoMail: boolean): boolean {
  return demoMail && isAdmin(actor);
}

/** Coaches and admins keep their own club's boats, oar sets, race days and cleaning digest. */
export function canManageFleet(actor: Actor, clubId: number): boolean {
  return isCoach(actor) && actor.clubId === clubId;
}

/** Coaches and admins see the rig plans their own club's athletes saved. */
export function canReviewRigPlans(actor: Actor, clubId: number): boolean {
  return isCoach(actor) && actor.clubId === clubId;
}

/*
 * Role checks as assertions: the data functions call them (or the rule behind them), and so do their
 * routes and server actions before reading a query or an input, so that a role that may not act gets
 * 403 whatever it sends, never a 400 about fields it may not fill in.
 */

/** 403 unless coach or admin: boats, oar sets, the cleaning calendar and digest (the actor's club). */
export function assertMayManageFleet(actor: Actor): void {
  assertAllowed(canManageFleet(actor, actor.clubId), "Only coaches and administrators look after the fleet and its cleaning calendar.");
}

/** 403 unless an admin: members, invitations, club settings, certificates (the admin's own club). */
export function assertMayManageClub(actor: Actor): void {
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can do this.");
}

/** 403 unless coach or admin: the member lists (GET /api/roster). */
export function assertMayListMembers(actor: Actor): void {
  assertAllowed(isCoach(actor), "Only coaches and administrators can list members.");
}

/** 403 unless coach or admin: the roster matrix and its CSV. */
export function assertMaySeeRoster(actor: Actor): void {
  assertAllowed(isCoach(actor), "Only coaches and administrators see the roster.");
}

/** 403 unless an admin: the induction register and its CSV and PDF (of the admin's own club). */
export function assertMaySeeRegister(actor: Actor): void {
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators see the induction register.");
}

/** 403 unless coach or admin: the club's saved rig plans. */
export function assertMayReviewRigPlans(actor: Actor): void {
  assertAllowed(canReviewRigPlans(actor, actor.clubId), "Only coaches and administrators see saved rig plans.");
}

/** Throws 401 when nobody is signed in. */
export function assertSignedIn(actor: Actor | null): asserts actor is Actor {
  if (!actor) throw new UnauthenticatedError();
}

/** Throws 403 when the rule refuses a signed-in user. */
export function assertAllowed(allowed: boolean, message?: string): asserts allowed {
  if (!allowed) throw new ForbiddenError(message);
}

/** Throws 404 for records that exist but are not the actor's to see (no hint that they exist). */
export function assertVisible(visible: boolean): asserts visible {
  if (!visible) throw new NotFoundError();
}
