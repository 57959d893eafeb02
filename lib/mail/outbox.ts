import "server-only";
import fs from "node:fs/promises";
import path from "node:path";
import { outboxDir } from "@/lib/env";
import { sentAtOfOutboxId } from "@/lib/mail/outbox-names";

export interface OutboxMessage {
  id: string;
  to: string;
  subject: string;
  text: string;
  sentAt: string;
  attachments: string[];
}

interface StoredJsonMail {
  to?: { address: string }[] | string;
  subject?: string;
  text?: string;
  date?: string;
  attachments?: { filename?: string }[];
}

const idPattern = /^[0-9A-Za-z-]{10,80}$/;

function toMessage(id: string, stored: StoredJsonMail): OutboxMessage {
  const to = Array.isArray(stored.to) ? stored.to.map((entry) => entry.address).join(", ") : (stored.to ?? "");
  return {
    id,
    to,
    subject: stored.subject ?? "(no subject)",
    text: stored.text ?? "",
    sentAt: stored.date ?? sentAtOfOutboxId(id) ?? "",
    attachments: (stored.attachments ?? []).map((file) => file.filename ?? "attachment"),
  };
}

/** Messages in the local outbox, newest first. */
export async function listOutbox(limit = 100): Promise<OutboxMessage[]> {
  const names = (await fs.readdir(outboxDir()))
    .filter((name) => name.endsWith(".json"))
    .sort()
    .reverse();
  const messages = await Promise.all(
    names.slice(0, limit).map(async (name) => {
      const id = name.slice(0, -5);
      const stored = JSON.parse(await fs.readFile(path.join(outboxDir(), name), "utf8")) as StoredJsonMail;
      return toMessage(id, stored);
    }),
  );
  return messages;
}

/** One message by id, or null; ids are checked against a strict pattern so no path can be injected. */
export async function readOutboxMessage(id: string): Promise<OutboxMessage | null> {
  if (!idPattern.test(id)) return null;
  try {
    const stored = JSON.parse(await fs.readFile(path.join(outboxDir(), `${id}.json`), "utf8")) as StoredJsonMail;
    return toMessage(id, stored);
  } catch {
    return null;
  }
}
