// POST /api/cas/<verb> — runs one cas verb (check, dims, and the spacetime verbs) in the Node worker pool.
// 200 with the verb's JSON answer; otherwise {error: {code, message, position?, field?}} with
// 400 malformed/unreadable, 404 unknown verb, 413 body over the byte cap, 415 not JSON,
// 422 over the checker's limits or its time limit (2 s), 429 over 120 requests a minute from one
// address, 503 busy, 500 internal.
import "server-only";
import { isVerb, validateVerbInput } from "@/cas/api/index";
import { sharedCasPool } from "@/cas/worker/node-pool";
import { MAX_REQUEST_BYTES } from "@/cas/worker/limits";
import { casRequestAllowed } from "@/app/_server/rate-limit";
import { clientIp } from "@/app/_server/request-info";
import { STATUS_BY_CODE, verbParamsSchema } from "./schema";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type Refusal = { code: string; message: string; position?: number; field?: string };

function refuse(error: Refusal, status = STATUS_BY_CODE[error.code] ?? 500): Response {
  return Response.json({ error }, { status });
}

export async function POST(request: Request, context: { params: Promise<{ verb: string }> }): Promise<Response> {
  try {
    const params = verbParamsSchema.safeParse(await context.params);
    if (!params.success || !isVerb(params.data.verb)) return refuse({ code: "unknown_verb", message: "no such cas verb" });
    const verb = params.data.verb;
    if (!(await casRequestAllowed({ ip: clientIp(request.headers) }))) {
      return refuse({ code: "rate_limited", message: "too many engine requests from your network address; wait a minute and try again" }, 429);
    }

    const type = request.headers.get("content-type");
    if (type && !/^application\/(.+\+)?json\b/i.test(type)) return refuse({ code: "malformed", message: "send the request as JSON (Content-Type: application/json)" }, 415);
    if (Number(request.headers.get("content-length") || 0) > MAX_REQUEST_BYTES) return refuse({ code: "too_large", message: `the request is larger than ${MAX_REQUEST_BYTES} bytes` }, 413);
    const text = await request.text();
    if (Buffer.byteLength(text) > MAX_REQUEST_BYTES) return refuse({ code: "too_large", message: `the request is larger than ${MAX_REQUEST_BYTES} bytes` }, 413);
    let body: unknown;
    try {
      body = JSON.parse(text);
    } catch {
      return refuse({ code: "malformed", message: "the request body is not valid JSON" });
    }
    // Validate here too, so a malformed request is refused without a trip to the worker.
    const invalid = validateVerbInput(verb, body);
    if (invalid) return refuse(invalid);

    const outcome = await sharedCasPool().run(verb, body);
    if (!outcome.ok) return refuse(outcome.error);
    return Response.json(outcome.value);
  } catch (error) {
    console.error("[api] POST /api/cas failed", error);
    return refuse({ code: "internal", message: "the checker failed on this request; nothing was changed" });
  }
}
