import "server-only";
import type { Db } from "@/db/client";
import { getGroupById } from "@/db/queries/groups";
import type { Group } from "@/db/schema";
import { AppError } from "./errors";

/** The group, or 404 not_found:group. */
export async function findGroup(db: Db, id: string): Promise<Group> {
  const group = await getGroupById({ db, id });
  if (!group) throw new AppError("not_found:group", "No group with that id.");
  return group;
}
