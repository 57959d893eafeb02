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
  }
}
