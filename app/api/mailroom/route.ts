// GET /api/mailroom?to=<address>&limit=<1..500> (development, tests and demo runs only)
//   → 200 {"messages": [{"id", "kind", "from", "to": [..], "subject", "text", "createdAt"}]} newest first
//   → 404 not_found:mailroom on a production server with a real SMTP_URL
// No sign-in: it is the local stand-in for everyone's inbox, and e2e tests read sign-up links from it.
import { getDb } from "@/db/client";
import { listMailMessages } from "@/db/queries/mail";
import { AppError, handleRoute } from "@/app/_server/errors";
import { mailroomEnabled } from "@/app/_server/mail";
import { parseSearchParams } from "@/app/_server/parse";
import { mailroomQuery } from "./schema";

export const dynamic = "force-dynamic";

export const GET = handleRoute(async (request) => {
  if (!mailroomEnabled()) throw new AppError("not_found:mailroom", "There is no mailroom on this server.");
  const query = parseSearchParams(request, mailroomQuery);
  const messages = await listMailMessages({ db: await getDb(), to: query.to || undefined, limit: query.limit });
  return Response.json(
    { messages: messages.map(({ id, kind, from, to, subject, text, createdAt }) => ({ id, kind, from, to, subject, text, createdAt })) },
    { headers: { "cache-control": "no-store" } },
  );
});
