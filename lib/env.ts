import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

/** The folder holding the SQLite file, uploads, the local mail outbox and the generated auth secret. */
export function dataDir(): string {
  const dir = path.resolve(/*turbopackIgnore: true*/ process.env.SLIPWAY_DATA_DIR || path.join(process.cwd(), "data"));
  fs.mkdirSync(dir, { recursive: true });
  return dir;
}

export function databaseFile(): string {
  return path.join(dataDir(), "slipway.sqlite");
}

export function uploadsDir(): string {
  const dir = path.join(dataDir(), "uploads");
  fs.mkdirSync(dir, { recursive: true });
  return dir;
}

export function outboxDir(): string {
  const dir = path.join(dataDir(), "outbox");
  fs.mkdirSync(dir, { recursive: true });
  return dir;
}

let cachedSecret: string | undefined;

/** NEXTAUTH_SECRET when set; otherwise a random secret generated once into the data dir (never committed). */
export function authSecret(): string {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  if (cachedSecret) return cachedSecret;
  const file = path.join(dataDir(), "auth-secret");
  try {
    cachedSecret = fs.readFileSync(file, "utf8").trim();
  } catch {
    const secret = randomBytes(32).toString("base64url");
    // "wx" fails if another process wrote it first; then read theirs.
    try {
      fs.writeFileSync(file, secret, { flag: "wx", mode: 0o600 });
      cachedSecret = secret;
    } catch {
      cachedSecret = fs.readFileSync(file, "utf8").trim();
    }
  }
  return cachedSecret;
}

/** The address links in e-mails and certificates point to. */
export function publicBaseUrl(): string {
  const fromEnv = process.env.SLIPWAY_BASE_URL || process.env.NEXTAUTH_URL;
  if (fromEnv) return fromEnv.replace(/\/$/, "");
  return `http://127.0.0.1:${process.env.PORT || "3000"}`;
}

/**
 * next-auth 4 builds its redirects from NEXTAUTH_URL; when it is not set, use the address the server
 * was started for, so redirects never point at another port.
 */
export function ensureAuthUrl(): void {
  process.env.NEXTAUTH_URL ??= publicBaseUrl();
}

/** Demo mode: no real SMTP server configured, so mail goes to the outbox that admins can read in the browser. */
export function isDemoMail(): boolean {
  return !process.env.SMTP_URL;
}

export type SqliteSynchronous = "FULL" | "NORMAL";

/** FULL by default: a result the server acknowledged must survive a power cut, not only a process crash. */
export function sqliteSynchronous(): SqliteSynchronous {
  return process.env.SLIPWAY_SQLITE_SYNCHRONOUS === "NORMAL" ? "NORMAL" : "FULL";
}
