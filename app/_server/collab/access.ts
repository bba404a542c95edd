import "server-only";
import type { IncomingMessage } from "node:http";
import { getToken } from "next-auth/jwt";
import type { Db } from "@/db/client";
import { getRolesForUser } from "@/db/queries/roles";
import { can } from "../authz";
import { authSecret } from "../secret";
import type { Access } from "./room";

/** The signed-in user behind an upgrade request, from the next-auth session cookie. */
export async function authenticateUpgrade(req: IncomingMessage): Promise<string | null> {
  const cookies = Object.fromEntries(
    (req.headers.cookie ?? "")
      .split(";")
      .map((part) => part.trim())
      .filter(Boolean)
      .map((part) => {
        const at = part.indexOf("=");
        return at < 0 ? [part, ""] : [part.slice(0, at), decodeURIComponent(part.slice(at + 1))];
      }),
  );
  const secureCookie = Object.keys(cookies).some((name) => name.startsWith("__Secure-next-auth.session-token"));
  const token = await getToken({ req: { cookies, headers: req.headers } as never, secret: authSecret(), secureCookie });
  return typeof token?.sub === "string" ? token.sub : null;
}

/** What a user may do on a notebook's socket: write (lead, author), read (reviewer, reader), or nothing. */
export async function resolveAccess({ db, userId, groupId, notebookId }: { db: Db; userId: string; groupId: string; notebookId: string }): Promise<Access | null> {
  const actor = { id: userId, roles: await getRolesForUser({ db, userId }) };
  const resource = { type: "notebook", groupId, notebookId } as const;
  if (can(actor, "notebook:edit", resource)) return "write";
  if (can(actor, "notebook:read", resource)) return "read";
  return null;
}
