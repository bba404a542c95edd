/// <reference lib="webworker" />
// The Web Worker behind createBrowserChecker (browser-client.ts): runs cas verbs off the page's thread.
import { runVerb } from "../api/index";

declare const self: DedicatedWorkerGlobalScope;

self.onmessage = (event: MessageEvent<{ id: number; verb: string; input: unknown }>) => {
  const { id, verb, input } = event.data;
  self.postMessage({ id, outcome: runVerb(verb, input) });
};
