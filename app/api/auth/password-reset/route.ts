// POST /api/auth/password-reset
//   {"email"}                        → 202 {"ok": true, "message"} (same answer for unknown addresses)
//   {"token", "password", "email"?}  → 200 {"ok": true}; 400 bad_request:token for a used/expired link
//   → 400 bad_request:body, 429 rate_limited:mail
import { requestPasswordReset, resetPassword } from "@/app/_server/account";
import { handleRoute } from "@/app/_server/errors";
import { parseJsonBody } from "@/app/_server/parse";
import { clientIp } from "@/app/_server/request-info";
import { passwordResetBody } from "./schema";

export const POST = handleRoute(async (request) => {
  const body = await parseJsonBody(request, passwordResetBody);
  if ("token" in body) {
    await resetPassword({ token: body.token, password: body.password });
    return Response.json({ ok: true });
  }
  await requestPasswordReset({ email: body.email, ip: clientIp(request.headers) });
  return Response.json(
    { ok: true, message: "If that address has an account, a link to reset the password is on its way." },
    { status: 202 },
  );
});
