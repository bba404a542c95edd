// Runs every benchmark script in this folder, one after another so they do not
// compete for the two cores, and prints their figures. Each *.bench.ts is a
// standalone script that prints its own figures and ratios.
import { readdirSync } from "node:fs";
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import path from "node:path";

const here = path.dirname(fileURLToPath(import.meta.url));
const only = process.argv.slice(2);
const scripts = readdirSync(here)
  .filter((f) => f.endsWith(".bench.ts"))
  .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
  .sort();

let failed = 0;
for (const script of scripts) {
  console.log(`\n=== ${script}`);
  // The server-only hook lets scripts load server modules outside Next, as server.ts does.
  const hook = path.join(here, "../../app/_server/server-only-hook.mjs");
  const run = spawnSync(process.execPath, ["--import", "tsx", "--import", hook, path.join(here, script)], { stdio: "inherit" });
  if (run.status !== 0) {
    failed += 1;
    console.log(`(${script} exited with ${run.status ?? run.signal})`);
  }
}
process.exit(failed === 0 ? 0 : 1);
