// kill -9 of the co-editing server in the middle of a burst of edits: every update that a
// second client saw (so the server had broadcast it) must be there after a restart, and the
// writer's reconnect must re-sync without duplicating text. Loopback only, bounded loops.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import * as Y from "yjs";
import { openDatabase } from "@/db/client";
import { connectClient, createFixture, synced, waitFor, type Fixture } from "./harness";

const dataDir = mkdtempSync(path.join(tmpdir(), "vierbein-crash-"));
const root = path.resolve(__dirname, "../../../..");
let child: ChildProcess | undefined;

function startServer(port: number): Promise<{ process: ChildProcess; port: number }> {
  return new Promise((resolve, reject) => {
    const proc = spawn(process.execPath, ["--import", "tsx", "--import", "./app/_server/server-only-hook.mjs", "tests/app/_server/collab/support/standalone-server.ts"], {
      cwd: root,
      env: { ...process.env, DATA_DIR: dataDir, PORT: String(port), DATABASE_URL: "" },
      stdio: ["ignore", "pipe", "inherit"],
    });
    let out = "";
    const slow = setTimeout(() => reject(new Error(`server did not say "ready" within 30 s; it printed: ${out}`)), 30_000);
    proc.stdout!.on("data", (chunk: Buffer) => {
      out += chunk.toString();
      const match = /ready (\d+)/.exec(out);
      if (match) {
        clearTimeout(slow);
        resolve({ process: proc, port: Number(match[1]) });
      }
    });
    proc.on("exit", (code) => {
      clearTimeout(slow);
      reject(new Error(`server exited early with ${code}`));
    });
  });
}

afterAll(() => {
  child?.kill("SIGKILL");
  rmSync(dataDir, { recursive: true, force: true });
});

describe("co-editing server crash", () => {
  it("loses no update a peer saw when killed with SIGKILL mid-burst", async () => {
    let fixture: Fixture;
    {
      const handle = await openDatabase({ kind: "pglite", dataDir });
      fixture = await createFixture(handle.db);
      await handle.close();
    }
    const first = await startServer(0);
    child = first.process;
    const server = { url: `ws://127.0.0.1:${first.port}/yjs` } as never;
    const writer = connectClient(server, fixture.notebookId, fixture.users.author);
    const watcher = connectClient(server, fixture.notebookId, fixture.users.reader);
    await Promise.all([synced(writer.provider), synced(watcher.provider)]);

    const typed = 400;
    let killedAt = -1;
    // Listen before killing: the exit can arrive while the burst is still awaiting a tick.
    const exited = new Promise<void>((resolve) => child!.once("exit", () => resolve()));
    for (let i = 0; i < typed; i++) {
      writer.doc.getText("burst").insert(writer.doc.getText("burst").length, String(i % 10));
      if (i === 250) {
        child.kill("SIGKILL");
        killedAt = i;
      }
      if (i % 25 === 0) await new Promise((r) => setTimeout(r, 5));
    }
    await exited;
    const seenByWatcher = Y.encodeStateVector(watcher.doc);
    const seenText = watcher.doc.getText("burst").toString();
    expect(killedAt).toBe(250);
    expect(seenText.length).toBeGreaterThan(0);

    // Restart on the same port so both providers reconnect by themselves.
    const second = await startServer(first.port);
    child = second.process;
    const fresh = connectClient(server, fixture.notebookId, fixture.users.reader);
    await synced(fresh.provider);
    // Everything the watcher saw before the crash is in the restarted server's store.
    const freshVector = Y.decodeStateVector(Y.encodeStateVector(fresh.doc));
    for (const [clientId, clock] of Y.decodeStateVector(seenByWatcher)) {
      expect(freshVector.get(clientId) ?? 0).toBeGreaterThanOrEqual(clock);
    }
    expect(fresh.doc.getText("burst").toString().startsWith(seenText)).toBe(true);

    // The writer re-syncs what the crash lost, once: no duplicated text.
    await waitFor(() => fresh.doc.getText("burst").length === typed, 20_000, "the writer to re-sync");
    expect(fresh.doc.getText("burst").toString()).toBe(writer.doc.getText("burst").toString());
    expect(writer.doc.getText("burst").length).toBe(typed);
    [writer, watcher, fresh].forEach((c) => c.provider.destroy());
  }, 90_000);
});
