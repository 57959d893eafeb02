import { describe, expect, it } from "vitest";
import {
  areaAudience,
  areaForPath,
  assertAllowed,
  assertSignedIn,
  assertVisible,
  canChangeMember,
  canEnterArea,
  canManageClub,
  canReadOutbox,
  canSignOff,
  canViewAthlete,
  homePathFor,
  type Actor,
} from "@/lib/auth/permissions";
import { ForbiddenError, NotFoundError, UnauthenticatedError } from "@/lib/http/errors";

const athlete: Actor = { id: 10, clubId: 1, role: "athlete", name: "A", email: "a@x.example" };
const otherAthlete: Actor = { id: 11, clubId: 1, role: "athlete", name: "B", email: "b@x.example" };
const coach: Actor = { id: 20, clubId: 1, role: "coach", name: "C", email: "c@x.example" };
const admin: Actor = { id: 30, clubId: 1, role: "admin", name: "D", email: "d@x.example" };
const foreignCoach: Actor = { id: 40, clubId: 2, role: "coach", name: "E", email: "e@x.example" };
const foreignAdmin: Actor = { id: 50, clubId: 2, role: "admin", name: "F", email: "f@x.example" };

describe("areas", () => {
  it.each([
    ["/", "public"],
    ["/sign-in", "public"],
    ["/verify/abc", "public"],
    ["/learn", "member"],
    ["/learn/overall-length/quiz", "member"],
    ["/roster", "coach"],
    ["/roster/12", "coach"],
    ["/club", "admin"],
    ["/club/outbox", "admin"],
    ["/clubhouse", "public"],
  ] as const)("%s is %s", (path, area) => {
    expect(areaForPath(path)).toBe(area);
  });

  it("ranks roles: admins do what coaches do, coaches what members do", () => {
    expect(canEnterArea(null, "public")).toBe(true);
    expect(canEnterArea(null, "member")).toBe(false);
    expect(canEnterArea("athlete", "member")).toBe(true);
    expect(canEnterArea("athlete", "coach")).toBe(false);
    expect(canEnterArea("coach", "coach")).toBe(true);
    expect(canEnterArea("coach", "admin")).toBe(false);
    expect(canEnterArea("admin", "coach")).toBe(true);
    expect(canEnterArea("admin", "admin")).toBe(true);
  });

  it("lands each role on its own page", () => {
    expect(homePathFor("athlete")).toBe("/learn");
    expect(homePathFor("coach")).toBe("/roster");
    expect(homePathFor("admin")).toBe("/club");
  });
});

describe("who a refused page is for (the 403 page's words)", () => {
  it.each([
    ["/club/register", "club administrators"],
    ["/club", "club administrators"],
    ["/roster/sign-offs", "coaches and club administrators"],
    ["/learn", "members of the club"],
  ] as const)("%s is for %s", (path, audience) => {
    expect(areaAudience(areaForPath(path))).toBe(audience);
  });
});

describe("records", () => {
  it("lets athletes see only themselves and coaches only their own club", () => {
    expect(canViewAthlete(athlete, athlete)).toBe(true);
    expect(canViewAthlete(athlete, otherAthlete)).toBe(false);
    expect(canViewAthlete(coach, athlete)).toBe(true);
    expect(canViewAthlete(admin, athlete)).toBe(true);
    expect(canViewAthlete(foreignCoach, athlete)).toBe(false);
  });

  it("lets coaches of the club sign off others, never themselves or athletes", () => {
    expect(canSignOff(coach, athlete)).toBe(true);
    expect(canSignOff(admin, athlete)).toBe(true);
    expect(canSignOff(coach, coach)).toBe(false);
    expect(canSignOff(athlete, otherAthlete)).toBe(false);
    expect(canSignOff(foreignCoach, athlete)).toBe(false);
  });

  it("keeps club management to the club's own admins and never one's own account", () => {
    expect(canManageClub(admin, 1)).toBe(true);
    expect(canManageClub(coach, 1)).toBe(false);
    expect(canManageClub(foreignAdmin, 1)).toBe(false);
    expect(canChangeMember(admin, athlete)).toBe(true);
    expect(canChangeMember(admin, admin)).toBe(false);
    expect(canChangeMember(foreignAdmin, athlete)).toBe(false);
  });

  it("opens the outbox to admins in demo mode only", () => {
    expect(canReadOutbox(admin, true)).toBe(true);
    expect(canReadOutbox(admin, false)).toBe(false);
    expect(canReadOutbox(coach, true)).toBe(false);
  });
});

describe("assertions throw the typed errors that map to statuses", () => {
  it("401 when nobody is signed in", () => {
    expect(() => assertSignedIn(null)).toThrow(UnauthenticatedError);
    expect(new UnauthenticatedError().status).toBe(401);
    expect(() => assertSignedIn(athlete)).not.toThrow();
  });

  it("403 for a refused role and 404 for what is not yours", () => {
    expect(() => assertAllowed(false)).toThrow(ForbiddenError);
    expect(new ForbiddenError().status).toBe(403);
    expect(() => assertVisible(false)).toThrow(NotFoundError);
    expect(new NotFoundError().status).toBe(404);
    expect(() => assertAllowed(true)).not.toThrow();
  });
});

describe("fleet (issue 5)", () => {
  it("lets coaches and admins of the club manage boats and oar sets, never athletes or other clubs", async () => {
    const { canManageFleet } = await import("@/lib/auth/permissions");
    expect(canManageFleet(coach, 1)).toBe(true);
    expect(canManageFleet(admin, 1)).toBe(true);
    expect(canManageFleet(athlete, 1)).toBe(false);
    expect(canManageFleet(foreignCoach, 1)).toBe(false);
    expect(canManageFleet(foreignAdmin, 1)).toBe(false);
  });

  it("shows saved rig plans to the club's coaches and admins only", async () => {
    const { canReviewRigPlans } = await import("@/lib/auth/permissions");
    expect(canReviewRigPlans(coach, 1)).toBe(true);
    expect(canReviewRigPlans(admin, 1)).toBe(true);
    expect(canReviewRigPlans(athlete, 1)).toBe(false);
    expect(canReviewRigPlans(foreignCoach, 1)).toBe(false);
  });

  it("keeps /rig for members", () => {
    expect(areaForPath("/rig")).toBe("member");
    expect(areaForPath("/rig/boats/3")).toBe("member");
    expect(areaForPath("/rig/care")).toBe("member");
    expect(areaForPath("/roster/fleet")).toBe("coach");
  });
});
