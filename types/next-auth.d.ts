import type { Role } from "@/lib/auth/roles";

declare module "next-auth" {
  interface Session {
    user: { id: number; role: Role; clubId: number; tokenVersion: number; name: string; email: string };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid?: number;
    role?: Role;
    clubId?: number;
    tokenVersion?: number;
    signInMethod?: "password" | "link";
    /** Seconds since 1970 when the session was started. */
    signedInAt?: number;
  }
}
