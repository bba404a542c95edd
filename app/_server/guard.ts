import "server-only";
import type { Db } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { getRolesForUser } from "@/db/queries/roles";
import type { CurrentUser } from "./auth";
import { getCurrentUser } from "./auth";
import { can, type Action, type Actor, type ResourceFor } from "./authz";
import { AppError } from "./errors";
import { clientIp } from "./request-info";

/** The signed-in user, or 401. */
export async function requireUser(): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new AppError("unauthorized:session", "Sign in to continue.");
  return user;
}

/** The user with their role in every group: what `can` decides on. */
export async function loadActor({ db, user }: { db: Db; user: CurrentUser | null }): Promise<Actor> {
  if (!user) return null;
  return { id: user.id, roles: await getRolesForUser({ db, userId: user.id }) };
}

function resourceId(resource: ResourceFor<Action>): string | null {
  if (resource.type === "notebook") return resource.notebookId;
  if (resource.type === "group") return resource.groupId;
  return null;
}

/**
 * Asks `can`; on refusal writes the attempt to the audit log and throws forbidden:<resource>.
 * Call it after the record is known to exist, and before changing anything.
 */
export async function authorize<A extends Action>({
  db,
  actor,
  action,
  resource,
  request,
}: {
  db: Db;
  actor: Actor;
  action: A;
  resource: ResourceFor<A>;
  request?: Request;
}): Promise<void> {
  if (can(actor, action, resource)) return;
  await recordAudit({
    db,
    entry: {
      actorId: actor?.id ?? null,
      action,
      resourceType: resource.type,
      resourceId: resourceId(resource),
      outcome: "denied",
      detail: request ? { method: request.method, path: new URL(request.url).pathname } : {},
      ip: request ? clientIp(request.headers) : null,
    },
  });
  throw new AppError(`forbidden:${resource.type}`, "Your role in this group does not allow that.");
}

/** Records a change that went through (who changed what), for the group's history. */
export async function auditChange({
  db,
  actor,
  action,
  resourceType,
  resourceId,
  detail,
  request,
}: {
  db: Db;
  actor: Actor | CurrentUser;
  action: string;
  resourceType: string;
  resourceId: string | null;
  detail?: Record<string, unknown>;
  request?: Request;
}): Promise<void> {
  await recordAudit({
    db,
    entry: {
      actorId: actor?.id ?? null,
      action,
      resourceType,
      resourceId,
      outcome: "allowed",
      detail: detail ?? {},
      ip: request ? clientIp(request.headers) : null,
    },
  });
}
