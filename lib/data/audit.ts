import "server-only";
import type { Transaction } from "sequelize";
import { AuditEvent } from "@/models";

interface AuditEntry {
  clubId: number;
  actorId: number | null;
  action: string;
  subjectType: string;
  subjectId: string | number;
  details?: Record<string, unknown>;
}

/** Records an audited action inside the caller's write transaction. */
export async function recordAudit(entry: AuditEntry, transaction: Transaction): Promise<void> {
  await AuditEvent.create(
    {
      clubId: entry.clubId,
      actorId: entry.actorId,
      action: entry.action,
      subjectType: entry.subjectType,
      subjectId: String(entry.subjectId),
      details: entry.details ?? {},
    },
    { transaction },
  );
}
