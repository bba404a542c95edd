import "server-only";
import type { Db } from "@/db/client";
import { getDb } from "@/db/client";
import { getAttachmentById } from "@/db/queries/attachments";
import { recordAudit } from "@/db/queries/audit";
import { getRolesForUser } from "@/db/queries/roles";
import type { Attachment, Group, Notebook } from "@/db/schema";
import type { CurrentUser } from "./auth";
import { getCurrentUser } from "./auth";
import { can, type Action, type Actor, type GroupAction, type NotebookAction, type ResourceFor } from "./authz";
import { findNotebook } from "./editions/notebook-lookup";
import { AppError } from "./errors";
import { findGroup } from "./group-lookup";
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

/** What a route has once the guard let it through: the database, who asks, and their roles. */
type Admitted = { db: Db; user: CurrentUser; actor: Actor };

/**
 * How a route on one group begins: 401 when signed out, 404 not_found:group when there is no such group,
 * then `authorize` (403 forbidden:group, audited); the record is known to exist before anyone asks who may touch it.
 */
export async function admitToGroup({ groupId, action, request }: { groupId: string; action: GroupAction; request: Request }): Promise<
  Admitted & { group: Group; resource: ResourceFor<GroupAction> }
> {
  const user = await requireUser();
  const db = await getDb();
  const group = await findGroup(db, groupId);
  const actor = await loadActor({ db, user });
  const resource = { type: "group", groupId: group.id } as const;
  await authorize({ db, actor, action, resource, request });
  return { db, user, actor, group, resource };
}

/** The same for a route on one notebook: 401, then 404 not_found:notebook, then 403 forbidden:notebook. */
export async function admitToNotebook({ notebookId, action, request }: { notebookId: string; action: NotebookAction; request: Request }): Promise<
  Admitted & { notebook: Notebook; resource: ResourceFor<NotebookAction> }
> {
  const user = await requireUser();
  return admitUserToNotebook({ user, db: await getDb(), notebookId, action, request });
}

async function admitUserToNotebook({ user, db, notebookId, action, request }: { user: CurrentUser; db: Db; notebookId: string; action: NotebookAction; request: Request }) {
  const { notebook, resource } = await findNotebook(db, notebookId);
  const actor = await loadActor({ db, user });
  await authorize({ db, actor, action, resource, request });
  return { db, user, actor, notebook, resource };
}

/** The same for a route on one attachment, judged by its notebook: 401, then 404 not_found:attachment, then as admitToNotebook. */
export async function admitToAttachment({ attachmentId, action, request }: { attachmentId: string; action: NotebookAction; request: Request }): Promise<
  Admitted & { notebook: Notebook; attachment: Attachment }
> {
  const user = await requireUser();
  const db = await getDb();
  const attachment = await getAttachmentById({ db, id: attachmentId });
  if (!attachment) throw new AppError("not_found:attachment", "No attachment with that id.");
  return { ...(await admitUserToNotebook({ user, db, notebookId: attachment.notebookId, action, request })), attachment };
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
