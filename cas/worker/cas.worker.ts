/// <reference lib="webworker" />
// The Web Worker behind createBrowserChecker (browser-client.ts): runs cas verbs off the page's thread.
import { runVerb } from "../api/index";

declare const self: DedicatedWorkerGlobalScope;

self.onmessage = (event: MessageEvent<{ id: number; verb: string; input: unknown }>) => {
  const { id, verb, input } = event.data;
  self.postMessage({ id, outcome: runVerb(verb, input) });
};

// Loaded (this bundle can take a second to fetch and compile on a busy machine): the page starts
// each request's time limit from here, so a cold start is not charged to the first request.
self.postMessage({ ready: true });
