// Loaded with `node --import` before server.ts. The "server-only" marker throws unless the
// react-server export condition is set, which only Next's bundler sets; server.ts loads
// server modules (database, co-editing) directly, so resolve the marker to an empty module.
import { register } from "node:module";

const loader = `
export async function resolve(specifier, context, next) {
  if (specifier === "server-only") return { url: "data:text/javascript,", shortCircuit: true };
  return next(specifier, context);
}`;
register(`data:text/javascript,${encodeURIComponent(loader)}`);
