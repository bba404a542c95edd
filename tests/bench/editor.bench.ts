// The notebook editor's cost in Debian Chromium, on a production build: time to open the
// largest demo notebook (first render, then every verdict settled), and, in a 300-step
// notebook, the latency of each keystroke (keydown to the next animation frame) and how
// long after typing stops the verdicts settle. Prints figures; asserts nothing.
//
// Builds into BENCH_NEXT_DIST_DIR (default .next-bench) unless that folder already holds a
// build and BENCH_SKIP_BUILD=1; starts its own server on a free port with a temp DATA_DIR.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import type { JSONContent } from "@tiptap/core";
import { chromium, type Page } from "playwright-core";
import { closeDb, getDbHandle } from "@/db/client";
import { loadDemo } from "@/db/demo/load";
import { demoNotebooks } from "@/db/demo/notebooks";
import { threeHundredSteps } from "./long-notebook";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const distDir = process.env.BENCH_NEXT_DIST_DIR ?? ".next-bench";
const percentile = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))];
const ms = (x: number) => `${x.toFixed(1)} ms`;
const AUTHOR = "author@vierbein.test";
const PASSWORD = "relativity"; // the demo-only password (db/demo/people.ts)

const countSteps = (node: JSONContent): number => (node.type === "step" ? 1 : 0) + (node.content ?? []).reduce((n, c) => n + countSteps(c), 0);

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.listen(0, () => {
      const port = (s.address() as { port: number }).port;
      s.close(() => resolve(port));
    });
    s.on("error", reject);
  });
}

async function startServer(dataDir: string, port: number): Promise<ChildProcess> {
  const proc = spawn(process.execPath, ["--import", "tsx", "--import", "./app/_server/server-only-hook.mjs", "server.ts"], {
    cwd: root,
    env: { ...process.env, NODE_ENV: "production", PORT: String(port), DATA_DIR: dataDir, DATABASE_URL: "", NEXT_DIST_DIR: distDir, NEXTAUTH_URL: `http://localhost:${port}`, NEXTAUTH_SECRET: "bench-only-secret" },
    stdio: ["ignore", "ignore", "inherit"],
  });
  for (let i = 0; i < 600; i += 1) {
    try {
      if ((await fetch(`http://localhost:${port}/api/health`)).ok) return proc;
    } catch { /* not up yet */ }
    await new Promise((r) => setTimeout(r, 250));
  }
  proc.kill("SIGTERM");
  throw new Error("the server did not come up");
}

async function signIn(page: Page, base: string) {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel("E-mail", { exact: true }).fill(AUTHOR);
  await page.getByLabel("Password", { exact: true }).fill(PASSWORD);
  const submit = page.getByRole("button", { name: "Sign in", exact: true });
  await submit.waitFor();
  await page.waitForFunction(() => !(document.querySelector("button[type=submit]") as HTMLButtonElement | null)?.disabled);
  await submit.click();
  await page.getByRole("heading", { name: "Dashboard", level: 1 }).waitFor();
}

/** ms from navigation start to the editor's first render, and to every step's verdict settled. */
async function openNotebook(page: Page, url: string): Promise<{ firstRender: number; settled: number; steps: number }> {
  await page.goto(url, { waitUntil: "commit" });
  await page.getByLabel(/^Notebook text/).waitFor({ timeout: 120_000 });
  const firstRender = await page.evaluate(() => performance.now());
  await page.waitForFunction(() => {
    const steps = document.querySelectorAll(".step-view");
    return steps.length > 0 && document.querySelectorAll('.step-view[data-verdict="pending"]').length === 0;
  }, undefined, { timeout: 300_000, polling: 20 });
  const settled = await page.evaluate(() => performance.now());
  const steps = await page.locator(".step-view").count();
  return { firstRender, settled, steps };
}

async function typingLatency(page: Page, keystrokes: string): Promise<{ latencies: number[]; frameDone: number[]; settleAfterStop: number | null; commits: number }> {
  // keydown → next animation frame, measured in the page for every key
  await page.evaluate(() => {
    const w = window as unknown as { __lat: number[]; __frameDone: number[]; __pendingSeen: number | null; __settled: number | null; __lastKey: number };
    w.__lat = [];
    w.__frameDone = [];
    w.__pendingSeen = null;
    w.__settled = null;
    document.addEventListener("keydown", (event) => {
      const t0 = event.timeStamp;
      w.__lastKey = t0;
      requestAnimationFrame(() => w.__lat.push(performance.now() - t0));
      const channel = new MessageChannel();
      channel.port1.onmessage = () => (w as unknown as { __frameDone: number[] }).__frameDone.push(performance.now() - t0);
      channel.port2.postMessage(0);
    }, { capture: true });
    new MutationObserver(() => {
      const pending = document.querySelectorAll('.step-view[data-verdict="pending"]').length;
      const now = performance.now();
      if (pending > 0 && w.__pendingSeen === null) w.__pendingSeen = now;
      if (pending === 0 && w.__pendingSeen !== null) w.__settled = now;
    }).observe(document.body, { subtree: true, attributes: true, attributeFilter: ["data-verdict"] });
  });
  const source = page.getByLabel("LaTeX source of step 150", { exact: true });
  await source.click();
  await page.keyboard.press("End");
  // let the End key's own frame pass, or its latency lands among the typed keys'
  await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 50))));
  await page.evaluate(() => {
    const w = window as unknown as { __lat: number[]; __frameDone: number[]; __pendingSeen: number | null; __settled: number | null };
    w.__lat = [];
    w.__frameDone = [];
    w.__pendingSeen = null;
    w.__settled = null;
    (window as unknown as { __commits: number }).__commits = 0;
  });
  // BENCH_CPU_PROFILE=file.cpuprofile records the page's main thread while typing (open it in Chromium's DevTools).
  const profiling = process.env.BENCH_CPU_PROFILE ? await page.context().newCDPSession(page) : null;
  if (profiling) {
    await profiling.send("Profiler.enable");
    await profiling.send("Profiler.start");
  }
  // BENCH_TRACE=file.json records a Chromium performance trace (style, layout, paint) while typing.
  if (process.env.BENCH_TRACE) await page.context().browser()!.startTracing(page, { path: process.env.BENCH_TRACE, screenshots: false });
  await page.keyboard.type(keystrokes, { delay: 60 });
  if (process.env.BENCH_TRACE) await page.context().browser()!.stopTracing();
  const commits = await page.evaluate(() => (window as unknown as { __commits: number }).__commits);
  if (profiling) {
    const { profile } = await profiling.send("Profiler.stop");
    writeFileSync(process.env.BENCH_CPU_PROFILE!, JSON.stringify(profile));
  }
  // the checker waits 400 ms of quiet before it starts; give it 5 s in all
  await page.waitForTimeout(5000);
  const after = await page.evaluate(() => {
    const w = window as unknown as { __lat: number[]; __frameDone: number[]; __settled: number | null; __lastKey: number };
    return { latencies: w.__lat, frameDone: w.__frameDone, settleAfterStop: w.__settled === null ? null : w.__settled - w.__lastKey };
  });
  return { ...after, commits };
}

async function main() {
  const largest = [...demoNotebooks].sort((a, b) => countSteps((b.content ?? {}) as JSONContent) - countSteps((a.content ?? {}) as JSONContent))[0];
  const long = threeHundredSteps();

  if (!(process.env.BENCH_SKIP_BUILD && existsSync(path.join(root, distDir, "BUILD_ID")))) {
    console.log(`building into ${distDir} …`);
    const build = spawnSync("npx", ["next", "build"], { cwd: root, env: { ...process.env, NEXT_DIST_DIR: distDir }, stdio: "ignore" });
    if (build.status !== 0) throw new Error(`next build failed (${build.status})`);
  }
  const dataDir = mkdtempSync(path.join(tmpdir(), "vierbein-bench-editor-"));
  process.env.DATA_DIR = dataDir;
  process.env.DATABASE_URL = "";
  const { db } = await getDbHandle();
  await loadDemo({ db, notebooks: [...demoNotebooks, long] });
  await closeDb();

  const port = await freePort();
  const base = `http://localhost:${port}`;
  const server = await startServer(dataDir, port);
  const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"] });
  try {
    const context = await browser.newContext({ viewport: { width: 1280, height: 860 } });
    // React calls a dev-tools hook on every commit, production builds too: count commits with it.
    // (a string, not a function: tsx's name-keeping helpers do not exist in the page)
    await context.addInitScript(`
      window.__commits = 0;
      window.__REACT_DEVTOOLS_GLOBAL_HOOK__ = {
        supportsFiber: true, renderers: new Map(), inject: function () { return 1; }, checkDCE: function () {},
        onCommitFiberRoot: function () { window.__commits += 1; }, onCommitFiberUnmount: function () {}, onPostCommitFiberRoot: function () {},
      };`);
    const page = await context.newPage();
    await signIn(page, base);

    // a warm-up open, so the figures are of a warm server (route compiled, worker bundle cached)
    await openNotebook(page, `${base}/notebooks/${largest.id}`);
    const opens: { firstRender: number; settled: number; steps: number }[] = [];
    for (let i = 0; i < 3; i += 1) opens.push(await openNotebook(page, `${base}/notebooks/${largest.id}`));
    const med = (xs: number[]) => percentile(xs, 50);
    console.log(`open "${largest.title}" (${opens[0].steps} steps), median of 3: first render ${ms(med(opens.map((o) => o.firstRender)))}, all verdicts settled ${ms(med(opens.map((o) => o.settled)))}`);

    const big = await openNotebook(page, `${base}/notebooks/${long.id}`);
    console.log(`open "${long.title}" (${big.steps} steps): first render ${ms(big.firstRender)}, all verdicts settled ${ms(big.settled)}`);
    const { latencies, frameDone, settleAfterStop, commits } = await typingLatency(page, " + 0".repeat(30));
    // BENCH_DUMP=file.json keeps every keystroke's two figures, in typing order.
    if (process.env.BENCH_DUMP) writeFileSync(process.env.BENCH_DUMP, JSON.stringify({ latencies, frameDone }));
    console.log(`typing in step 150 of 300 (${latencies.length} keystrokes, 60 ms apart): keydown→next frame p50 ${ms(percentile(latencies, 50))}, p90 ${ms(percentile(latencies, 90))}, p95 ${ms(percentile(latencies, 95))}, max ${ms(Math.max(...latencies))} (target p95 ≤ 16 ms); React commits while typing: ${commits}`);
    console.log(`  keydown→that frame's main-thread work done (a message posted at keydown runs after it): p50 ${ms(percentile(frameDone, 50))}, p95 ${ms(percentile(frameDone, 95))}, max ${ms(Math.max(...frameDone))}`);
    console.log(`verdicts settled ${settleAfterStop === null ? "(no re-check seen)" : ms(settleAfterStop)} after the last keystroke (target ≤ 1000 ms; includes the checker's 400 ms quiet period)`);
  } finally {
    await browser.close();
    server.kill("SIGTERM");
    await new Promise((r) => server.once("exit", r));
    rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
