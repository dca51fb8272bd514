// Shop-administration changes go to the audit log with who made them (no request attached).
import { recordAudit } from "@/db/queries/audit";
import type { SessionUser } from "@/lib/auth/guard";

export function auditShop(actor: SessionUser, action: string, detail: Record<string, unknown> = {}) {
  return recordAudit({ actorUserId: actor.id, actorLabel: actor.name, action, detail });
}
