// Time to the full curvature sheet (Christoffel, Riemann, Ricci, scalar,
// Einstein, Kretschmann — simplified, every component verified numerically
// against the unsimplified value), ours vs SymPy on the same machine in the
// same run. Standalone: `node --import tsx tests/bench/curvature.bench.ts`,
// or through `npm run bench`.
import { spawnSync } from "node:child_process";
import { computeCurvatureSync } from "../../cas/spacetime/curvature-sheet";
import * as M from "../cas/spacetime/metrics";

const SYMPY_CAP_SECONDS = Number(process.env.SYMPY_CAP ?? 60);

// The same sheet in SymPy: inverse, Γ, Riemann, Ricci, R, G, K, each simplified.
const SYMPY = String.raw`
import json, re, signal, sys, time
import sympy as sp
req = json.load(sys.stdin)
cap = req["cap"]
def on_alarm(*_):
    print(json.dumps({"seconds": None}))
    sys.exit(0)
signal.signal(signal.SIGALRM, on_alarm)
signal.alarm(cap)
coords = [sp.Symbol(c) for c in req["coordinates"]]
n = len(coords)
ns = {c.name: c for c in coords}
for s in re.findall(r"[A-Za-z][A-Za-z0-9_]*", " ".join(x for row in req["components"] for x in row)):
    if s not in ("sin", "cos", "tan", "exp", "log", "sqrt", "pi") and s not in ns:
        ns[s] = sp.Symbol(s)
start = time.perf_counter()
g = sp.Matrix(n, n, lambda i, j: sp.sympify(req["components"][i][j].replace("^", "**"), locals=ns))
ginv = sp.simplify(g.inv())
gamma = [[[sp.simplify(sum(ginv[a, d] * (sp.diff(g[d, c], coords[b]) + sp.diff(g[d, b], coords[c]) - sp.diff(g[b, c], coords[d])) for d in range(n)) / 2)
           for c in range(n)] for b in range(n)] for a in range(n)]
riem = [[[[sp.simplify(sp.diff(gamma[a][d][b], coords[c]) - sp.diff(gamma[a][c][b], coords[d])
           + sum(gamma[a][c][e] * gamma[e][d][b] - gamma[a][d][e] * gamma[e][c][b] for e in range(n)))
           for d in range(n)] for c in range(n)] for b in range(n)] for a in range(n)]
ric = [[sp.simplify(sum(riem[a][b][a][d] for a in range(n))) for d in range(n)] for b in range(n)]
scal = sp.simplify(sum(ginv[b, d] * ric[b][d] for b in range(n) for d in range(n)))
ein = [[sp.simplify(ric[a][b] - scal * g[a, b] / 2) for b in range(n)] for a in range(n)]
down = [[[[sum(g[a, e] * riem[e][b][c][d] for e in range(n)) for d in range(n)] for c in range(n)] for b in range(n)] for a in range(n)]
up = down
for slot in range(4):
    prev = up
    def raised(idx, slot=slot, prev=prev):
        total = 0
        for y in range(n):
            if ginv[idx[slot], y] == 0: continue
            j = list(idx); j[slot] = y
            total += ginv[idx[slot], y] * prev[j[0]][j[1]][j[2]][j[3]]
        return total
    up = [[[[raised((a, b, c, d)) for d in range(n)] for c in range(n)] for b in range(n)] for a in range(n)]
K = sp.simplify(sum(down[a][b][c][d] * up[a][b][c][d] for a in range(n) for b in range(n) for c in range(n) for d in range(n)))
print(json.dumps({"seconds": time.perf_counter() - start}))
`;

function sympySeconds(c: M.MetricCase): number | null | "error" {
  const run = spawnSync("python3", ["-c", SYMPY], {
    input: JSON.stringify({ coordinates: c.coordinates, components: c.components, cap: SYMPY_CAP_SECONDS }),
    encoding: "utf8",
    timeout: (SYMPY_CAP_SECONDS + 30) * 1000,
  });
  if (run.status !== 0) return "error";
  return (JSON.parse(run.stdout.trim().split("\n").pop()!) as { seconds: number | null }).seconds;
}

function oursMs(c: M.MetricCase): { ms: number; checked: number } {
  const metric = M.metricOf(c);
  computeCurvatureSync(metric); // warm-up (JIT)
  const times: number[] = [];
  let checked = 0;
  const runs = c === M.KERR ? 3 : 9;
  for (let i = 0; i < runs; i += 1) {
    const t = performance.now();
    checked = computeCurvatureSync(metric).verification.checked;
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  return { ms: times[Math.floor(times.length / 2)], checked };
}

const rows: string[][] = [["metric", "ours (median)", "components verified", "SymPy (simplify)", "SymPy / ours"]];
for (const c of [M.SCHWARZSCHILD, M.REISSNER_NORDSTROM, M.SCHWARZSCHILD_DE_SITTER, M.KERR]) {
  const ours = oursMs(c);
  const sympy = sympySeconds(c);
  const sympyText = sympy === "error" ? "error" : sympy === null ? `> ${SYMPY_CAP_SECONDS} s (cap)` : `${(sympy * 1000).toFixed(0)} ms`;
  const ratio = typeof sympy === "number" ? `${((sympy * 1000) / ours.ms).toFixed(1)}×` : sympy === null ? `> ${((SYMPY_CAP_SECONDS * 1000) / ours.ms).toFixed(0)}×` : "-";
  rows.push([c.name, `${ours.ms.toFixed(1)} ms`, String(ours.checked), sympyText, ratio]);
}
const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => r[i].length)));
console.log("Curvature sheet: time to all components, simplified and verified (targets: ≤ 50 ms Schwarzschild/RN, < 5 s Kerr)");
for (const r of rows) console.log(r.map((cell, i) => cell.padEnd(widths[i])).join("  "));
