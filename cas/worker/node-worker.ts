// Runs inside a worker thread (see node-entry.mjs): answers one verb request at a time.
import { parentPort } from "node:worker_threads";
import { runVerb } from "../api/index";

export interface WorkerRequest { readonly id: number; readonly verb: string; readonly input: unknown }

if (!parentPort) throw new Error("cas/worker/node-worker.ts must run in a worker thread");
const port = parentPort;
port.on("message", (message: WorkerRequest) => {
  port.postMessage({ id: message.id, outcome: runVerb(message.verb, message.input) });
});
port.postMessage({ ready: true });
