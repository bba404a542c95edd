// GET /api/me → 200 {"user": {"id", "email", "name"}, "groups": [{"id", "name", "description", "role", "memberCount", "createdAt"}]}
//   → 401 unauthorized:session
import { getDb } from "@/db/client";
import { listGroupsForUser } from "@/db/queries/groups";
import { handleRoute } from "@/app/_server/errors";
import { requireUser } from "@/app/_server/guard";

export const dynamic = "force-dynamic";

export const GET = handleRoute(async () => {
  const user = await requireUser();
  const groups = await listGroupsForUser({ db: await getDb(), userId: user.id });
  return Response.json({ user, groups });
});
