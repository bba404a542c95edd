// Cross-check: SymPy (Debian python3-sympy) computes, for the limit verb's physics cases, each
// additive term's leading power of the parameter and the limit of the whole expression; the
// verb's numeric estimate must agree term by term, and must accept SymPy's limit (its own LaTeX)
// as the expected form. Independent of the textbook forms quoted in tests/cas/api/limit.test.ts.
import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { runVerb } from "@/cas/api";
import type { LimitProbeAnswer } from "@/cas/limit/protocol";

const sympyAvailable = spawnSync("python3", ["-c", "import sympy"]).status === 0;

interface Case {
  readonly name: string;
  /** What the author types (LaTeX), for the verb. */
  readonly latex: string;
  /** The same expression for SymPy; `ell` prints as \ell. */
  readonly sympy: string;
  readonly parameter: "c" | "Q";
  readonly target: "oo" | "0";
}

const CASES: readonly Case[] = [
  {
    name: "Schwarzschild effective potential per unit mass, c → ∞",
    latex: "-\\frac{GM}{r} + \\frac{\\ell^2}{2r^2} - \\frac{GM\\ell^2}{c^2 r^3}",
    sympy: "-G*M/r + ell**2/(2*r**2) - G*M*ell**2/(c**2*r**3)",
    parameter: "c",
    target: "oo",
  },
  {
    name: "with a test mass μ, c → ∞",
    latex: "-\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3}",
    sympy: "-G*M*mu/r + L**2/(2*mu*r**2) - G*M*L**2/(mu*c**2*r**3)",
    parameter: "c",
    target: "oo",
  },
  {
    name: "gravitational redshift factor minus one, c → ∞",
    latex: "\\sqrt{1 - \\frac{2GM}{rc^2}} - 1",
    sympy: "sqrt(1 - 2*G*M/(r*c**2)) - 1",
    parameter: "c",
    target: "oo",
  },
  {
    name: "c² times that correction, c → ∞",
    latex: "c^2\\left(\\sqrt{1 - \\frac{2GM}{rc^2}} - 1\\right)",
    sympy: "c**2*(sqrt(1 - 2*G*M/(r*c**2)) - 1)",
    parameter: "c",
    target: "oo",
  },
  {
    name: "rest energy plus kinetic energy, c → ∞",
    latex: "\\mu c^2 + \\frac{1}{2}\\mu v^2",
    sympy: "mu*c**2 + mu*v**2/2",
    parameter: "c",
    target: "oo",
  },
  {
    name: "Reissner–Nordström g_tt, Q → 0",
    latex: "-1 + \\frac{2M}{r} - \\frac{Q^2}{r^2}",
    sympy: "-1 + 2*M/r - Q**2/r**2",
    parameter: "Q",
    target: "0",
  },
];

/** Per case: the leading power of each term (SymPy's order of terms) and the limit as LaTeX, or null if it diverges. */
function sympyReference(cases: readonly Case[]): { powers: number[]; limit: string | null }[] {
  const script = `
import json, sys
from sympy import symbols, sympify, limit, log, Abs, oo, latex, Add, nsimplify
G, M, r, ell, mu, L, v, Q = symbols('G M r ell mu L v Q', positive=True)
c = symbols('c', positive=True)
names = dict(G=G, M=M, r=r, ell=ell, mu=mu, L=L, v=v, Q=Q, c=c)
out = []
for case in json.load(sys.stdin):
    expr = sympify(case['sympy'], locals=names)
    p = names[case['parameter']]
    at = oo if case['target'] == 'oo' else 0
    side = '-' if at == 0 else None
    powers = []
    for term in Add.make_args(expr):
        # the exponent k with |term| ~ p^k: lim log|term| / log p (SymPy's own limit)
        k = limit(log(Abs(term)) / log(p), p, at) if at == oo else limit(log(Abs(term)) / log(p), p, 0, '+')
        powers.append(float(nsimplify(k)))
    value = limit(expr, p, at) if at == oo else limit(expr, p, 0, '+')
    out.append(dict(powers=powers, limit=None if value.has(oo, -oo) else latex(value)))
print(json.dumps(out))
`;
  const run = spawnSync("python3", ["-c", script], { input: JSON.stringify(cases), encoding: "utf8", timeout: 120_000 });
  if (run.status !== 0) throw new Error(`SymPy failed: ${run.stderr}`);
  return JSON.parse(run.stdout) as { powers: number[]; limit: string | null }[];
}

function probe(input: Record<string, unknown>): LimitProbeAnswer {
  const out = runVerb("limit", { context: {}, ...input });
  if (!out.ok) throw new Error(`limit refused: ${JSON.stringify(out.error)}`);
  return out.value as LimitProbeAnswer;
}

/** What a term with leading power k does as the parameter goes to the target. */
function fateFor(k: number, target: Case["target"]): "remains" | "vanishes" | "diverges" {
  if (k === 0) return "remains";
  const grows = target === "oo" ? k > 0 : k < 0;
  return grows ? "diverges" : "vanishes";
}

describe.skipIf(!sympyAvailable)("limit verb against SymPy's limit()", () => {
  const reference = sympyAvailable ? sympyReference(CASES) : [];

  it.each(CASES.map((c, i) => [c.name, i] as const))("%s: term fates and the limit agree", (_name, i) => {
    const c = CASES[i];
    const ref = reference[i];
    const a = probe({ expression: c.latex, parameter: c.parameter, target: c.target === "oo" ? "infinity" : "0" });
    const side = a.sides[0];
    // SymPy may order the terms differently: compare the fates as multisets.
    const ours = side.terms.map((t) => t.fate).sort();
    const theirs = ref.powers.map((k) => fateFor(k, c.target)).sort();
    expect(ours).toEqual(theirs);
    // The whole expression: vanishing like p^k, converging, or diverging, as SymPy finds.
    if (ref.limit === null) {
      expect(side.limit).toBeUndefined();
    } else {
      const checked = probe({ expression: c.latex, parameter: c.parameter, target: c.target === "oo" ? "infinity" : "0", expected: ref.limit });
      expect(checked.expected?.same, `expected ${ref.limit}`).toBe("yes");
    }
  });

  it("finds the relativistic term's power c^-2 where SymPy does", () => {
    const [veff] = reference;
    expect([...veff.powers].sort((x, y) => x - y)).toEqual([-2, 0, 0]);
    const a = probe({ expression: CASES[0].latex, parameter: "c", target: "infinity" });
    const vanishing = a.sides[0].terms.find((t) => t.fate === "vanishes");
    expect(vanishing?.estimate).toMatchObject({ kind: "vanishes", power: -2 });
  });
});
