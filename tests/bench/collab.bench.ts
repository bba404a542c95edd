// Co-editing on loopback: remote-echo latency (a keystroke in client A until client B's
// Yjs doc has it) with 2 and 20 clients, sustained updates per second the server stores,
// server RSS with 50 open notebooks, and the load time of a notebook with 100,000 stored
// updates before and after compaction. Prints figures against the targets; asserts nothing.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import * as Y from "yjs";
import { openDatabase } from "@/db/client";
import { notebookUpdates, notebooks } from "@/db/schema";
import { compactNotebookDocument, getStoredNotebookDocument } from "@/db/queries/notebook-updates";
import { connectClient, createFixture, synced, waitFor } from "../app/_server/collab/harness";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const percentile = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))];
const ms = (x: number) => `${x.toFixed(2)} ms`;

function startServer(dataDir: string): Promise<{ proc: ChildProcess; port: number }> {
  return new Promise((resolve, reject) => {
    const proc = spawn(process.execPath, ["--import", "tsx", "--import", "./app/_server/server-only-hook.mjs", "tests/app/_server/collab/support/standalone-server.ts"], {
      cwd: root,
      env: { ...process.env, DATA_DIR: dataDir, PORT: "0", DATABASE_URL: "" },
      stdio: ["ignore", "pipe", "inherit"],
    });
    proc.stdout!.on("data", (chunk: Buffer) => {
      const match = /ready (\d+)/.exec(chunk.toString());
      if (match) resolve({ proc, port: Number(match[1]) });
    });
    proc.on("exit", (code) => reject(new Error(`server exited with ${code}`)));
  });
}

// y-websocket's provider adds a process "exit" listener in Node; this script holds up to 100
// clients in one process on purpose, which is not the leak Node's warning guesses at.
process.setMaxListeners(120);

const rssMb = (pid: number) => Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, "utf8"))![1]) / 1024;

async function echoLatency(url: string, notebookId: string, users: string[], clients: number, samples: number): Promise<number[]> {
  const server = { url } as never;
  const peers = Array.from({ length: clients }, (_, i) => connectClient(server, notebookId, users[i % users.length]));
  await Promise.all(peers.map((p) => synced(p.provider)));
  const [a, b] = peers;
  const text = `echo-${clients}`;
  const out: number[] = [];
  for (let i = 0; i < samples; i++) {
    const target = a.doc.getText(text).length + 1;
    const started = performance.now();
    a.doc.getText(text).insert(target - 1, "x");
    await new Promise<void>((resolve) => {
      const check = () => (b.doc.getText(text).length >= target ? resolve() : setImmediate(check));
      check();
    });
    out.push(performance.now() - started);
  }
  peers.forEach((p) => p.provider.destroy());
  return out;
}

async function main() {
  const dataDir = mkdtempSync(path.join(tmpdir(), "vierbein-bench-collab-"));
  try {
    const setup = await openDatabase({ kind: "pglite", dataDir });
    const fixture = await createFixture(setup.db);
    const extra: string[] = [];
    for (let i = 0; i < 50; i++) {
      const [n] = await setup.db.insert(notebooks).values({ groupId: fixture.groupId, title: `Bench ${i}` }).returning();
      extra.push(n.id);
    }
    await setup.close();

    const { proc, port } = await startServer(dataDir);
    const url = `ws://127.0.0.1:${port}/yjs`;
    const writers = [fixture.users.author, fixture.users.coauthor, fixture.users.lead];
    for (const clients of [2, 20]) {
      const lat = await echoLatency(url, fixture.notebookId, writers, clients, 200);
      console.log(`remote echo, ${clients} clients: median ${ms(percentile(lat, 50))}, p95 ${ms(percentile(lat, 95))} (target p95 ≤ 50 ms with 20)`);
    }

    // Sustained: one writer sends as fast as the socket takes; count what the server stored.
    const w = connectClient({ url } as never, fixture.notebookId, fixture.users.author);
    const r = connectClient({ url } as never, fixture.notebookId, fixture.users.reader);
    await Promise.all([synced(w.provider), synced(r.provider)]);
    const burst = 3000;
    const started = performance.now();
    for (let i = 0; i < burst; i++) {
      w.doc.getText("sustained").insert(i, "y");
      if (i % 100 === 0) await new Promise((res) => setImmediate(res));
    }
    await waitFor(() => r.doc.getText("sustained").length === burst, 120_000, "the burst to echo");
    const seconds = (performance.now() - started) / 1000;
    console.log(`sustained: ${burst} updates stored and echoed in ${seconds.toFixed(2)} s = ${(burst / seconds).toFixed(0)} updates/s`);
    w.provider.destroy();
    r.provider.destroy();

    // 50 open notebooks, one reader and one writer in each, each with a little text.
    const open = extra.flatMap((id) => [connectClient({ url } as never, id, fixture.users.author), connectClient({ url } as never, id, fixture.users.reader)]);
    await Promise.all(open.map((c) => synced(c.provider)));
    open.forEach((c, i) => i % 2 === 0 && c.doc.getText("t").insert(0, "A circular orbit at r = 6GM/c^2. ".repeat(20)));
    await waitFor(() => open.every((c) => c.doc.getText("t").length > 0), 60_000, "50 notebooks to fill");
    console.log(`server RSS with 50 open notebooks (100 sockets): ${rssMb(proc.pid!).toFixed(0)} MB`);
    open.forEach((c) => c.provider.destroy());
    proc.kill("SIGTERM");
    await new Promise((res) => proc.once("exit", res));

    // 100,000 stored single-keystroke updates, loaded before and after compaction.
    const db = await openDatabase({ kind: "pglite", dataDir });
    const [big] = await db.db.insert(notebooks).values({ groupId: fixture.groupId, title: "Big" }).returning();
    const source = new Y.Doc();
    const updates: Uint8Array[] = [];
    source.on("update", (u: Uint8Array) => updates.push(u));
    for (let i = 0; i < 100_000; i++) source.getText("t").insert(i, String.fromCharCode(97 + (i % 26)));
    for (let i = 0; i < updates.length; i += 2000) {
      await db.db.insert(notebookUpdates).values(updates.slice(i, i + 2000).map((data) => ({ notebookId: big.id, data })));
    }
    const load = async () => {
      const t0 = performance.now();
      const stored = (await getStoredNotebookDocument({ db: db.db, notebookId: big.id }))!;
      const doc = new Y.Doc();
      Y.transact(doc, () => {
        if (stored.snapshot) Y.applyUpdate(doc, stored.snapshot);
        for (const u of stored.updates) Y.applyUpdate(doc, u.data);
      });
      const elapsed = performance.now() - t0;
      if (doc.getText("t").length !== 100_000) throw new Error("load lost text");
      return { elapsed, doc, lastId: stored.updates.at(-1)?.id ?? 0 };
    };
    const before = await load();
    await compactNotebookDocument({ db: db.db, notebookId: big.id, snapshot: Y.encodeStateAsUpdate(before.doc), throughId: before.lastId, content: null });
    const after = await load();
    console.log(`load of a notebook with 100,000 stored updates: ${ms(before.elapsed)} before compaction, ${ms(after.elapsed)} after (target ≤ 200 ms after); ratio ${(before.elapsed / after.elapsed).toFixed(1)}×`);
    await db.close();
  } finally {
    rmSync(dataDir, { recursive: true, force: true });
  }
  process.exit(0);
}

void main();
