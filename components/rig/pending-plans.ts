import { z } from "zod";
import type { SavedRigPlanInput } from "@/lib/validations/rig-plans";

/**
 * Plans an athlete saved while the phone was offline, kept in localStorage until the server has them.
 * Each is tagged with the member who saved it, so a shared phone never sends one under someone else.
 */
const storageKey = "slipway.rig.pending-plans.v1";
const changeEvent = "slipway:pending-plans";

export interface PendingPlan {
  userId: number;
  payload: SavedRigPlanInput;
}

const storedSchema = z.array(
  z.looseObject({
    userId: z.number().int(),
    payload: z.looseObject({ clientId: z.string() }),
  }),
);

/** The raw stored list (a string, so React can compare snapshots cheaply). */
export function pendingSnapshot(): string {
  return window.localStorage.getItem(storageKey) ?? "[]";
}

/** Parses a snapshot; anything unreadable (edited by hand, an older format) counts as an empty list. */
export function parsePending(snapshot: string): PendingPlan[] {
  let raw: unknown;
  try {
    raw = JSON.parse(snapshot);
  } catch {
    return [];
  }
  const parsed = storedSchema.safeParse(raw);
  return parsed.success ? (parsed.data as unknown as PendingPlan[]) : [];
}

function write(plans: PendingPlan[]): void {
  window.localStorage.setItem(storageKey, JSON.stringify(plans));
  window.dispatchEvent(new Event(changeEvent));
}

/** For useSyncExternalStore: changes in this tab and in other tabs. */
export function subscribePending(onChange: () => void): () => void {
  window.addEventListener(changeEvent, onChange);
  window.addEventListener("storage", onChange);
  return () => {
    window.removeEventListener(changeEvent, onChange);
    window.removeEventListener("storage", onChange);
  };
}

export function addPending(plan: PendingPlan): void {
  const plans = parsePending(pendingSnapshot()).filter((item) => item.payload.clientId !== plan.payload.clientId);
  write([...plans, plan]);
}

function removePending(clientId: string): void {
  write(parsePending(pendingSnapshot()).filter((item) => item.payload.clientId !== clientId));
}

export type SendOutcome = { kind: "saved" } | { kind: "unreachable" } | { kind: "signed-out" } | { kind: "refused"; message: string };

/** Sends one plan to the server; "unreachable" covers no network and server errors (worth trying again). */
export async function sendPlan(payload: SavedRigPlanInput): Promise<SendOutcome> {
  let response: Response;
  try {
    response = await fetch("/api/rig/plans", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(payload),
    });
  } catch {
    // fetch rejects only when no answer came back at all: offline, or the server is unreachable.
    return { kind: "unreachable" };
  }
  if (response.ok) return { kind: "saved" };
  if (response.status === 401) return { kind: "signed-out" };
  if (response.status >= 500 || response.status === 429) return { kind: "unreachable" };
  const body = (await response.json().catch(() => null)) as { message?: string } | null;
  return { kind: "refused", message: body?.message ?? "The server refused this plan." };
}

/**
 * Sends this member's kept plans. Sent and refused ones leave the list (a refused one would be refused
 * again); the rest stay for the next try. Returns how many were sent and refused.
 */
export async function flushPending(userId: number): Promise<{ sent: number; refused: string[]; waiting: number }> {
  const mine = parsePending(pendingSnapshot()).filter((item) => item.userId === userId);
  let sent = 0;
  const refused: string[] = [];
  let waiting = 0;
  for (const item of mine) {
    const outcome = await sendPlan(item.payload);
    if (outcome.kind === "saved") {
      sent += 1;
      removePending(item.payload.clientId);
    } else if (outcome.kind === "refused") {
      refused.push(outcome.message);
      removePending(item.payload.clientId);
    } else {
      waiting += 1;
    }
  }
  return { sent, refused, waiting };
}

/** A random v4 UUID; crypto.randomUUID is missing on plain-http addresses, getRandomValues is not. */
export function newClientId(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  bytes[6] = ((bytes[6] ?? 0) & 0x0f) | 0x40;
  bytes[8] = ((bytes[8] ?? 0) & 0x3f) | 0x80;
  const hex = [...bytes].map((byte) => byte.toString(16).padStart(2, "0")).join("");
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
