// `npm run -s cas -- <verb> [--time-limit=ms]`: one JSON request on stdin, one JSON answer on stdout.
// Exit codes: 0 an answer (whatever the verdict); 2 a refused request (malformed JSON or shape,
// unreadable LaTeX, unknown verb, over the size limits) with {"error": …}; 3 the time limit ran out;
// 1 an internal failure. The verb runs in a worker thread under the same limits as the API route.
import { NodeCasPool } from "../worker/node-pool";
import { DEFAULT_TIME_LIMIT_MS, MAX_REQUEST_BYTES } from "../worker/limits";
import type { VerbOutcome } from "../api/index";

const USAGE = "usage: npm run -s cas -- <check|dims|…> [--time-limit=ms] < request.json";

function exitCodeOf(outcome: VerbOutcome): number {
  if (outcome.ok) return 0;
  if (outcome.error.code === "timeout") return 3;
  if (outcome.error.code === "internal" || outcome.error.code === "busy") return 1;
  return 2;
}

async function readStdin(limit: number): Promise<string | null> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of process.stdin) {
    size += (chunk as Buffer).length;
    if (size > limit) return null;
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks).toString("utf8");
}

function print(value: unknown): void {
  process.stdout.write(`${JSON.stringify(value)}\n`);
}

async function main(): Promise<number> {
  const args = process.argv.slice(2);
  const verb = args.find((a) => !a.startsWith("--"));
  const limitArg = args.find((a) => a.startsWith("--time-limit="));
  const timeLimit = limitArg ? Number(limitArg.split("=")[1]) : DEFAULT_TIME_LIMIT_MS;
  if (!verb || !Number.isFinite(timeLimit) || timeLimit <= 0) {
    print({ error: { code: "malformed", message: USAGE } });
    return 2;
  }
  const text = await readStdin(MAX_REQUEST_BYTES);
  if (text === null) {
    print({ error: { code: "too_large", message: `the request is larger than ${MAX_REQUEST_BYTES} bytes` } });
    return 2;
  }
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (err) {
    print({ error: { code: "malformed", message: `stdin is not one JSON value: ${err instanceof Error ? err.message : String(err)}` } });
    return 2;
  }
  const pool = new NodeCasPool({ size: 1, timeLimitMs: timeLimit });
  try {
    const outcome = await pool.run(verb, input);
    print(outcome.ok ? outcome.value : { error: outcome.error });
    return exitCodeOf(outcome);
  } finally {
    await pool.close();
  }
}

main().then((code) => { process.exitCode = code; }, (err) => {
  console.error(err);
  print({ error: { code: "internal", message: "the cas command failed" } });
  process.exitCode = 1;
});
