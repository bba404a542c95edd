import "server-only";
import { ZodError } from "zod";

/**
 * The one error type of the app. `code` is `kind:surface` (e.g. `forbidden:notebook`):
 * the kind decides the HTTP status, the surface says what was touched. The message is
 * safe to show; the cause is for the log only.
 */
export const statusByKind = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  method_not_allowed: 405,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  internal: 500,
} as const;

export type ErrorKind = keyof typeof statusByKind;
export type ErrorCode = `${ErrorKind}:${string}`;

export class AppError extends Error {
  readonly kind: ErrorKind;
  readonly surface: string;

  constructor(code: ErrorCode, message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = "AppError";
    const [kind, ...rest] = code.split(":");
    this.kind = kind as ErrorKind;
    this.surface = rest.join(":");
  }

  get code(): ErrorCode {
    return `${this.kind}:${this.surface}`;
  }

  get status(): number {
    return statusByKind[this.kind];
  }

  toResponse(init?: { headers?: HeadersInit }): Response {
    return Response.json({ error: { code: this.code, message: this.message } }, { status: this.status, headers: init?.headers });
  }
}

/** Turns a zod failure into a readable one-line message naming the fields. */
export function describeZodError(error: ZodError): string {
  return error.issues
    .slice(0, 5)
    .map((issue) => (issue.path.length ? `${issue.path.join(".")}: ${issue.message}` : issue.message))
    .join("; ");
}

/** Anything thrown → AppError. Unknown errors become a generic 500 and are logged with their cause. */
export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) return new AppError("bad_request:input", describeZodError(error), { cause: error });
  const wrapped = new AppError("internal:server", "Something went wrong on our side. Nothing was changed.", { cause: error });
  return wrapped;
}

type RouteContext<P> = { params: Promise<P> };
type Handler<P> = (request: Request, context: RouteContext<P>) => Promise<Response>;

/**
 * Wraps a route handler: any error becomes JSON `{error: {code, message}}` with its status.
 * Internals (stack, SQL, cause) go to the server log only.
 */
export function handleRoute<P = Record<string, never>>(handler: Handler<P>): Handler<P> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      const appError = toAppError(error);
      if (appError.status >= 500) {
        console.error(`[api] ${request.method} ${new URL(request.url).pathname} failed`, error);
      }
      return appError.toResponse();
    }
  };
}
