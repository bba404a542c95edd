/** An API answer that was not 2xx, with the server's message kept for display. */
export class ApiError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly code?: string,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

const fallbackMessages: Record<number, string> = {
  400: "The request was not accepted; check the fields and try again.",
  401: "You are signed out. Sign in again to continue.",
  403: "Your role in this group does not allow that.",
  404: "That record no longer exists.",
  409: "That conflicts with something that already exists.",
  429: "Too many attempts. Wait a minute and try again.",
};

/** Fetches JSON from our own API; a failure becomes an ApiError carrying the server's message. */
export async function fetchJson<T>(url: string, init?: RequestInit & { json?: unknown }): Promise<T> {
  const { json, ...rest } = init ?? {};
  const response = await fetch(url, {
    ...rest,
    headers: { accept: "application/json", ...(json !== undefined ? { "content-type": "application/json" } : {}), ...rest.headers },
    body: json !== undefined ? JSON.stringify(json) : rest.body,
  });
  const text = await response.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (!response.ok) {
    const { message, code } = readError(body);
    throw new ApiError(message ?? fallbackMessages[response.status] ?? `The server answered ${response.status}.`, response.status, code);
  }
  return body as T;
}

// Accepts `{ error: "text" }`, `{ error: { message, code } }` and `{ message }`.
function readError(body: unknown): { message?: string; code?: string } {
  if (!body || typeof body !== "object") return {};
  const record = body as Record<string, unknown>;
  const error = record.error;
  if (typeof error === "string") return { message: typeof record.message === "string" ? record.message : error, code: stringOr(record.code) };
  if (error && typeof error === "object") {
    const inner = error as Record<string, unknown>;
    return { message: stringOr(inner.message), code: stringOr(inner.code) ?? stringOr(inner.kind) };
  }
  return { message: stringOr(record.message), code: stringOr(record.code) };
}

function stringOr(value: unknown): string | undefined {
  return typeof value === "string" ? value : undefined;
}
