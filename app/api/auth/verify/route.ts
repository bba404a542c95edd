// POST /api/auth/verify {"token", "email"?} → 200 {"ok": true}
//   → 400 bad_request:token when the link was used, expired or never existed.
import { verifyEmail } from "@/app/_server/account";
import { handleRoute } from "@/app/_server/errors";
import { parseJsonBody } from "@/app/_server/parse";
import { verifyBody } from "./schema";

export const POST = handleRoute(async (request) => {
  const { token } = await parseJsonBody(request, verifyBody);
  await verifyEmail({ token });
  return Response.json({ ok: true });
});
