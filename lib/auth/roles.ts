export const roles = ["athlete", "coach", "admin"] as const;
export type Role = (typeof roles)[number];

export const userStatuses = ["active", "deactivated"] as const;
export type UserStatus = (typeof userStatuses)[number];

export const roleLabels: Record<Role, string> = {
  athlete: "Athlete",
  coach: "Coach",
  admin: "Club administrator",
};
