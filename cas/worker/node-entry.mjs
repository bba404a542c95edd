// Entry of a cas worker thread on Node: teach this thread TypeScript (tsx), then
// load the worker itself. Node 20 cannot run the .ts file directly.
import { register } from "tsx/esm/api";

register();
await import("./node-worker.ts");
