import "server-only";

type HeaderSource = Headers | Record<string, string | string[] | undefined> | undefined;

/**
 * The client's address. server.ts overwrites x-forwarded-for with the socket address
 * (unless TRUST_PROXY is set), so the value here cannot be chosen by the client.
 */
export function clientIp(headers: HeaderSource): string {
  const raw = headers instanceof Headers ? headers.get("x-forwarded-for") : headers?.["x-forwarded-for"];
  const value = Array.isArray(raw) ? raw[0] : raw;
  return value?.split(",")[0]?.trim() || "unknown";
}
