import "server-only";
import { desc, eq } from "drizzle-orm";
import type { Db } from "../client";
import { auditLog, type AuditEntry } from "../schema";

export type AuditRecord = {
  actorId: string | null;
  action: string;
  resourceType: string;
  resourceId?: string | null;
  outcome: "allowed" | "denied";
  detail?: Record<string, unknown>;
  ip?: string | null;
};

export async function recordAudit({ db, entry }: { db: Db; entry: AuditRecord }): Promise<void> {
  await db.insert(auditLog).values({
    actorId: entry.actorId,
    action: entry.action,
    resourceType: entry.resourceType,
    resourceId: entry.resourceId ?? null,
    outcome: entry.outcome,
    detail: entry.detail ?? {},
    ip: entry.ip ?? null,
  });
}

export async function listAuditEntries({
  db,
  actorId,
  limit = 100,
}: {
  db: Db;
  actorId?: string;
  limit?: number;
}): Promise<AuditEntry[]> {
  const query = db.select().from(auditLog);
  const filtered = actorId ? query.where(eq(auditLog.actorId, actorId)) : query;
  return filtered.orderBy(desc(auditLog.id)).limit(limit);
}
