import "server-only";

/**
 * The one place that decides who may do what. Every route handler, server action and the
 * co-authoring socket asks `can`; nothing else compares roles.
 */
export const roles = ["lead", "author", "reviewer", "reader"] as const;
export type Role = (typeof roles)[number];

/** Who is asking: signed-in user with their role in each group, or null when signed out. */
export type Actor = { id: string; roles: Readonly<Record<string, Role>> } | null;

export type Resource =
  | { type: "app" }
  | { type: "group"; groupId: string }
  | { type: "notebook"; groupId: string; notebookId: string };

const groupActions = ["group:read", "group:update", "group:manage-members", "notebook:create"] as const;
const notebookActions = [
  "notebook:read",
  "notebook:edit",
  "notebook:delete",
  "notebook:remark",
  "notebook:settle-remark",
  "notebook:checkpoint",
  "notebook:restore",
  "notebook:publish",
  "notebook:attach",
  "notebook:export",
  "notebook:request-review",
  "edition:read",
] as const;
const appActions = ["group:create"] as const;

export type GroupAction = (typeof groupActions)[number];
export type NotebookAction = (typeof notebookActions)[number];
export type AppAction = (typeof appActions)[number];
export type Action = GroupAction | NotebookAction | AppAction;
export const actions: readonly Action[] = [...appActions, ...groupActions, ...notebookActions];

/** The resource an action is asked about; the compiler keeps the two in step. */
export type ResourceFor<A extends Action> = A extends AppAction
  ? Extract<Resource, { type: "app" }>
  : A extends GroupAction
    ? Extract<Resource, { type: "group" }>
    : Extract<Resource, { type: "notebook" }>;

const everyRole: readonly Role[] = roles;
const writers: readonly Role[] = ["lead", "author"];
const commenters: readonly Role[] = ["lead", "author", "reviewer"];
const leadOnly: readonly Role[] = ["lead"];

/** Which roles in the group may take each group or notebook action. */
const allowedRoles: Record<GroupAction | NotebookAction, readonly Role[]> = {
  "group:read": everyRole,
  "group:update": leadOnly,
  "group:manage-members": leadOnly,
  "notebook:create": writers,
  "notebook:read": everyRole,
  "notebook:edit": writers,
  "notebook:delete": leadOnly,
  // Reviewers read and remark; readers only read (GLOSSARY).
  "notebook:remark": commenters,
  "notebook:settle-remark": commenters,
  "notebook:checkpoint": writers,
  "notebook:restore": writers,
  "notebook:publish": leadOnly,
  "notebook:attach": writers,
  "notebook:export": everyRole,
  "notebook:request-review": writers,
  "edition:read": everyRole,
};

/**
 * Decides one permission.
 *
 * @example can({ id: "u1", roles: { g1: "author" } }, "notebook:edit", { type: "notebook", groupId: "g1", notebookId: "n1" }) // true
 */
export function can<A extends Action>(actor: Actor, action: A, resource: ResourceFor<A>): boolean {
  // Editions are citable: their permanent link is public, signed in or not.
  if (action === "edition:read") return true;
  if (!actor) return false;
  if (action === "group:create") return true;
  if (resource.type === "app") return false;
  const role = actor.roles[resource.groupId];
  if (!role) return false;
  return allowedRoles[action as GroupAction | NotebookAction].includes(role);
}

/** The role an actor holds in a group, or null for non-members and signed-out visitors. */
export function roleIn(actor: Actor, groupId: string): Role | null {
  return actor?.roles[groupId] ?? null;
}
