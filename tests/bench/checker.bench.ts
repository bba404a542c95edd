// Step checker speed on the step corpus, in-process, beside SymPy (Debian
// python3-sympy) deciding the same steps in one python process in the same run.
// Prints median and 95th-percentile verdict times and the ratio. Targets (issue 3):
// median ≤ 20 ms, p95 ≤ 100 ms, faster than SymPy. Figures only; nothing here fails on time.
import { checkStep } from "../../cas/check/check";
import { STEP_CORPUS } from "../cas/check/step-corpus";
import { runSympy, sympyJob } from "../cas/reference/sympy-reference";

const ROUNDS = 3;

function percentile(sorted: number[], p: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil(p * sorted.length) - 1));
  return sorted[i];
}

function summary(times: number[]) {
  const sorted = [...times].sort((a, b) => a - b);
  return { median: percentile(sorted, 0.5), p95: percentile(sorted, 0.95), max: sorted[sorted.length - 1], total: times.reduce((a, b) => a + b, 0) };
}

const fmt = (ms: number) => ms.toFixed(1).padStart(8);

// Warm-up: the first pass pays for JIT compilation and decimal.js constants.
for (const s of STEP_CORPUS) checkStep(s.request);

const ours: number[] = [];
const perStep = new Map<string, number[]>();
let wrong = 0;
for (let round = 0; round < ROUNDS; round += 1) {
  for (const s of STEP_CORPUS) {
    const t0 = performance.now();
    const answer = checkStep(s.request);
    const ms = performance.now() - t0;
    if (round === 0 && answer.verdict !== s.expected) wrong += 1;
    ours.push(ms);
    perStep.set(s.id, [...(perStep.get(s.id) ?? []), ms]);
  }
}

const jobs = STEP_CORPUS.map(sympyJob).filter((j): j is Record<string, unknown> => j !== null);
const sympy = runSympy(jobs);
const sympyTimes = sympy.map((r) => r.ms);
const sympyWrong = sympy.filter((r) => r.verdict !== STEP_CORPUS.find((s) => s.id === r.id)!.expected).length;

const a = summary(ours);
const b = summary(sympyTimes);
console.log(`step corpus: ${STEP_CORPUS.length} steps × ${ROUNDS} rounds in-process; SymPy on ${jobs.length} of them`);
console.log(`                      median      p95      max    total`);
console.log(`checker (ms)      ${fmt(a.median)} ${fmt(a.p95)} ${fmt(a.max)} ${fmt(a.total / ROUNDS)}  (total per round)`);
console.log(`SymPy (ms)        ${fmt(b.median)} ${fmt(b.p95)} ${fmt(b.max)} ${fmt(b.total)}`);
console.log(`SymPy / checker   ${(b.median / a.median).toFixed(1).padStart(8)}× ${(b.p95 / a.p95).toFixed(1).padStart(7)}×          ${(b.total / (a.total / ROUNDS)).toFixed(1).padStart(7)}×`);
console.log(`targets: median ≤ 20 ms, p95 ≤ 100 ms — ${a.median <= 20 ? "met" : "missed"} / ${a.p95 <= 100 ? "met" : "missed"}`);
console.log(`verdicts differing from the corpus: checker ${wrong}, SymPy ${sympyWrong}`);
const slowest = [...perStep.entries()].map(([id, t]) => [id, Math.min(...t)] as const).sort((x, y) => y[1] - x[1]).slice(0, 5);
console.log(`slowest steps (best of ${ROUNDS}): ${slowest.map(([id, t]) => `${id} ${t.toFixed(0)} ms`).join(", ")}`);
