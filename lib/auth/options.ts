import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { authSecret, ensureAuthUrl } from "@/lib/env";
import { authenticateWithLink, authenticateWithPassword, type SessionUser } from "@/lib/data/users";
import { endSessionsOf } from "@/lib/data/sessions";
import type { Role } from "@/lib/auth/roles";

/** Twelve hours: a poolside session lasts a training day, not a week. */
const sessionSeconds = 12 * 60 * 60;

function toNextAuthUser(user: SessionUser) {
  return { id: String(user.id), name: user.name, email: user.email, role: user.role, clubId: user.clubId, tokenVersion: user.tokenVersion };
}

/**
 * next-auth options, built on first use so that the secret (generated into the data dir when not set)
 * is read at run time, not at build time.
 */
export function authOptions(): NextAuthOptions {
  ensureAuthUrl();
  return {
    secret: authSecret(),
    session: { strategy: "jwt", maxAge: sessionSeconds },
    pages: { signIn: "/sign-in", error: "/sign-in" },
    providers: [
      CredentialsProvider({
        id: "password",
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(credentials) {
          const email = typeof credentials?.email === "string" ? credentials.email.slice(0, 254) : "";
          const password = typeof credentials?.password === "string" ? credentials.password.slice(0, 200) : "";
          if (!email || !password) return null;
          const user = await authenticateWithPassword(email, password);
          return user ? toNextAuthUser(user) : null;
        },
      }),
      CredentialsProvider({
        id: "link",
        name: "One-time link",
        credentials: { token: { label: "Token", type: "text" } },
        async authorize(credentials) {
          const token = typeof credentials?.token === "string" ? credentials.token.slice(0, 100) : "";
          if (!token) return null;
          const user = await authenticateWithLink(token);
          return user ? toNextAuthUser(user) : null;
        },
      }),
    ],
    events: {
      // Sign-out ends the session for real: the token version moves on, so a copied cookie stops working.
      async signOut({ token }) {
        if (typeof token?.uid === "number" && typeof token.tokenVersion === "number") {
          await endSessionsOf(token.uid, token.tokenVersion);
        }
      },
    },
    callbacks: {
      async jwt({ token, user, account }) {
        if (user) {
          const signedIn = user as ReturnType<typeof toNextAuthUser>;
          token.uid = Number(signedIn.id);
          token.role = signedIn.role;
          token.clubId = signedIn.clubId;
          token.tokenVersion = signedIn.tokenVersion;
          // How and when this session began: a fresh e-mail-link session may set a password without the old one.
          token.signInMethod = account?.provider === "link" ? "link" : "password";
          token.signedInAt = Math.floor(Date.now() / 1000);
        }
        return token;
      },
      async session({ session, token }) {
        session.user = {
          id: token.uid as number,
          role: token.role as Role,
          clubId: token.clubId as number,
          tokenVersion: token.tokenVersion as number,
          name: token.name ?? "",
          email: token.email ?? "",
        };
        return session;
      },
    },
  };
}
