// POST /api/auth/signup {"name", "email", "password" (8–72 chars)}
//   → 202 {"ok": true, "message"} — the same answer whether or not the address has an account;
//     a confirmation link (or an "account exists" note) goes to the address.
//   → 400 bad_request:body, 429 rate_limited:mail
import { signUp } from "@/app/_server/account";
import { handleRoute } from "@/app/_server/errors";
import { parseJsonBody } from "@/app/_server/parse";
import { clientIp } from "@/app/_server/request-info";
import { signUpBody } from "./schema";

export const POST = handleRoute(async (request) => {
  const body = await parseJsonBody(request, signUpBody);
  await signUp({ ...body, ip: clientIp(request.headers) });
  return Response.json(
    { ok: true, message: "Check your inbox: we sent a link to confirm the address." },
    { status: 202 },
  );
});
