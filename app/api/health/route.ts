// GET /api/health → 200 {"ok": true, "db": "pglite" | "postgres"}
//                 → 503 {"ok": false, "db": …} when the database does not answer.
import { sql } from "drizzle-orm";
import { dbKind, getDb } from "@/db/client";

export const dynamic = "force-dynamic";

export async function GET(): Promise<Response> {
  try {
    const db = await getDb();
    await db.execute(sql`select 1`);
    return Response.json({ ok: true, db: dbKind() });
  } catch (error) {
    console.error("[health] database check failed", error);
    return Response.json({ ok: false, db: dbKind() }, { status: 503 });
  }
}
