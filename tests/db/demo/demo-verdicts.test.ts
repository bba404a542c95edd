// Covers db/demo/notebooks/* through the editor's own planning and the real checker:
// every correct demo step is verified and dimensionally consistent; only Vesper-3's deliberate slip is refuted.
// Bug covered: in the browser Kestrel-7 showed 2 correct Euler–Lagrange steps refuted and 8 plain steps undecided.
import { spawnSync } from "node:child_process";
import type { JSONContent } from "@tiptap/core";
import { describe, expect, it } from "vitest";
import { runVerb } from "@/cas/api";
import type { CheckAnswer } from "@/cas/check/protocol";
import { buildKestrelSchwarzschildOrbits } from "@/db/demo/notebooks/kestrel-schwarzschild-orbits";
import { buildLanternDeSitterCircular } from "@/db/demo/notebooks/lantern-de-sitter-circular";
import { buildVesperReissnerNordstrom } from "@/db/demo/notebooks/vesper-reissner-nordstrom";
import { planStepCheck } from "@/editor/check-request";
import { extractDerivation } from "@/editor/derivation";

interface Expected {
  readonly name: string;
  readonly content: JSONContent;
  readonly steps: number;
  /** Step ids that must be refuted with a witness: the deliberate slips, nothing else. */
  readonly refuted: readonly string[];
}

const notebooks: Expected[] = [
  { name: "Kestrel-7 (Schwarzschild)", content: buildKestrelSchwarzschildOrbits(), steps: 26, refuted: [] },
  // vr17 is step 17: −L²r_Q²/(2μr⁴) where the expansion gives + (SymPy check below).
  { name: "Vesper-3 (Reissner–Nordström)", content: buildVesperReissnerNordstrom(), steps: 25, refuted: ["vr17"] },
  { name: "Lantern (Schwarzschild–de Sitter)", content: buildLanternDeSitterCircular(), steps: 20, refuted: [] },
];

// No step is expected undecided: every demo step is decidable by numeric probing (the list stays empty on purpose).
const EXPECTED_UNDECIDED: readonly string[] = [];

function verdicts(content: JSONContent): { id: string; number: number; answer: CheckAnswer }[] {
  const derivation = extractDerivation(content);
  return derivation.steps.map((step) => {
    const plan = planStepCheck(derivation, step.id);
    if ("notChecked" in plan) throw new Error(`step ${step.number} (${step.id}) is not checked: ${plan.notChecked}`);
    const outcome = runVerb("check", plan.request);
    if (!outcome.ok) throw new Error(`step ${step.number} (${step.id}): ${outcome.error.code} ${outcome.error.message}`);
    return { id: step.id, number: step.number, answer: outcome.value as CheckAnswer };
  });
}

describe.each(notebooks)("demo notebook $name, checked as the editor plans it", ({ content, steps, refuted }) => {
  const results = verdicts(content);

  it(`has ${steps} steps`, () => {
    expect(results).toHaveLength(steps);
  });

  it("verifies every correct step and refutes only the deliberate slip, with a witness", () => {
    for (const { id, number, answer } of results) {
      const where = `step ${number} (${id}): ${answer.reason ?? answer.method.detail}`;
      if (refuted.includes(id)) {
        expect(answer.verdict, where).toBe("refuted");
        expect(Object.keys(answer.witness ?? {}).length, where).toBeGreaterThan(0);
        expect(answer.witnessSides, where).toBeDefined();
      } else if (EXPECTED_UNDECIDED.includes(id)) {
        expect(answer.verdict, where).toBe("undecided");
      } else {
        expect(answer.verdict, where).toBe("verified");
      }
    }
  });

  it("passes the dimension audit on every step, with no odd term", () => {
    for (const { id, number, answer } of results) {
      const where = `step ${number} (${id}): ${JSON.stringify(answer.dimensions)}`;
      expect(answer.dimensions?.status, where).toBe("consistent");
      expect(answer.dimensions?.odd, where).toBeUndefined();
    }
  });
});

describe("the demo's physics, cross-checked with SymPy (Debian python3-sympy)", () => {
  // Each relation is typed into SymPy by hand from the notebook, so this does not share the checker's reader.
  // Sources: Schwarzschild — Hartle, Gravity (2003) ch. 9 (effective potential, ISCO 6GM/c², photon sphere 3GM/c²);
  // Reissner–Nordström — Carroll, Spacetime and Geometry (2004) §6.4 (f = 1 − r_s/r + r_Q²/r², horizons r±);
  // Schwarzschild–de Sitter — Rindler, Relativity (2006) ch. 15 (f = 1 − r_s/r − Λr²/3; static radius from memory).
  const script = String.raw`
from sympy import symbols, Function, simplify, diff, sqrt, Rational, limit, oo, solve, expand, factor
r, rs, rQ, c, G, M, mu, L, E, Lam, tau = symbols('r r_s r_Q c G M mu L E Lambda tau', positive=True)
t, ph, R = Function('t')(tau), Function('phi')(tau), Function('r')(tau)
ok = []
def check(name, zero):
    ok.append((name, simplify(zero) == 0))

def veff(f):
    return mu*c**2/2*(f - 1) + L**2*f/(2*mu*r**2)

# Euler-Lagrange for t and phi of the geodesic Lagrangian (Kestrel 6, 8): d/dtau of mu f c^2 tdot and mu r^2 phidot
F = 1 - rs/R
Lg = mu/2*(-F*c**2*diff(t, tau)**2 + diff(R, tau)**2/F + R**2*diff(ph, tau)**2)
el_t = diff(diff(Lg, diff(t, tau)), tau) - diff(Lg, t)
check('kestrel EL t', el_t + diff(mu*F*c**2*diff(t, tau), tau))
el_phi = diff(diff(Lg, diff(ph, tau)), tau) - diff(Lg, ph)
check('kestrel EL phi', el_phi - diff(mu*R**2*diff(ph, tau), tau))

# Kestrel 15-16, 19, 21-22, 24, 27: Schwarzschild potential, circular orbits, ISCO
f = 1 - rs/r
V = -G*M*mu/r + L**2/(2*mu*r**2) - G*M*L**2/(mu*c**2*r**3)
check('kestrel V_eff', (veff(f) - V).subs(rs, 2*G*M/c**2))
check('kestrel dV/dr', diff(V, r) - (G*M*mu/r**2 - L**2/(mu*r**3) + 3*G*M*L**2/(mu*c**2*r**4)))
X = symbols('X')  # L^2 as one unknown
L2 = solve(diff(V.subs(L**2, X), r), X)[0]
check('kestrel circular L^2', L2 - G*M*mu**2*r**2/(r - 3*G*M/c**2))
L2s = mu**2*c**2*rs*r**2/(2*r - 3*rs)
check('kestrel circular L^2 in r_s', L2.subs(G, rs*c**2/(2*M)) - L2s)
check('kestrel d(L^2)/dr', diff(L2s, r) - 2*mu**2*c**2*rs*r*(r - 3*rs)/(2*r - 3*rs)**2)
check('kestrel ISCO', diff(L2s, r).subs(r, 3*rs))
check('kestrel ISCO 6GM/c^2', (3*rs).subs(rs, 2*G*M/c**2) - 6*G*M/c**2)

# Vesper 6, 15-17 (the slip), 18-20, 22-23, 24-25: Reissner-Nordstrom
f = 1 - rs/r + rQ**2/r**2
rp = rs/2 + sqrt(rs**2/4 - rQ**2)
check('vesper horizon', f.subs(r, rp))
Vrn = expand(veff(f).subs(rs, 2*G*M/c**2))
right = -G*M*mu/r + mu*c**2*rQ**2/(2*r**2) + L**2/(2*mu*r**2) - G*M*L**2/(mu*c**2*r**3) + L**2*rQ**2/(2*mu*r**4)
check('vesper V_eff (correct sign)', Vrn - right)
ok.append(('vesper slip is wrong', simplify(Vrn - (right - L**2*rQ**2/(mu*r**4))) != 0))
check('vesper dV/dr', diff(right, r) - (G*M*mu/r**2 - mu*c**2*rQ**2/r**3 - L**2/(mu*r**3) + 3*G*M*L**2/(mu*c**2*r**4) - 2*L**2*rQ**2/(mu*r**5)))
L2 = solve(diff(right.subs(L**2, X), r), X)[0]
check('vesper circular L^2', L2 - mu**2*r**2*(G*M*r - c**2*rQ**2)/(r**2 - 3*G*M*r/c**2 + 2*rQ**2))
L2s = mu**2*c**2*r**2*(rs*r - 2*rQ**2)/(2*r**2 - 3*rs*r + 4*rQ**2)
check('vesper circular L^2 in r_s', L2.subs(G, rs*c**2/(2*M)) - L2s)
rph = 3*rs/4 + sqrt(9*rs**2/16 - 2*rQ**2)
check('vesper photon sphere', 2*rph**2 - 3*rs*rph + 4*rQ**2)
check('vesper d(L^2)/dr', diff(L2s, r) - 2*mu**2*c**2*r*(rs*r**3 - 3*rs**2*r**2 + 9*rs*rQ**2*r - 8*rQ**4)/(2*r**2 - 3*rs*r + 4*rQ**2)**2)
check('vesper uncharged L^2', limit(L2s, rQ, 0) - mu**2*c**2*rs*r**2/(2*r - 3*rs))
check('vesper uncharged photon sphere', limit(rph, rQ, 0) - 3*rs/2)

# Lantern 11-13, 15, 17-20: Schwarzschild-de Sitter
f = 1 - rs/r - Lam*r**2/3
Vsd = -G*M*mu/r - mu*c**2*Lam*r**2/6 + L**2/(2*mu*r**2) - G*M*L**2/(mu*c**2*r**3) - Lam*L**2/(6*mu)
check('lantern V_eff', expand(veff(f).subs(rs, 2*G*M/c**2)) - Vsd)
check('lantern dV/dr', diff(Vsd, r) - (G*M*mu/r**2 - mu*c**2*Lam*r/3 - L**2/(mu*r**3) + 3*G*M*L**2/(mu*c**2*r**4)))
L2 = solve(diff(Vsd.subs(L**2, X), r), X)[0]
check('lantern circular L^2', L2 - mu**2*r**2*(G*M - Lam*c**2*r**3/3)/(r - 3*G*M/c**2))
E2 = mu**2*c**4*f*(1 + L2/(mu**2*c**2*r**2))
check('lantern circular E^2', (E2 - mu**2*c**4*f**2*r/(r - 3*G*M/c**2)).subs(rs, 2*G*M/c**2))
rstat = (3*G*M/(Lam*c**2))**Rational(1, 3)
check('lantern static radius', L2.subs(r, rstat))
check('lantern Lambda -> 0', limit(L2, Lam, 0) - G*M*mu**2*r**2/(r - 3*G*M/c**2))
check('lantern c -> oo (Kepler)', limit(G*M*mu**2*r**2/(r - 3*G*M/c**2), c, oo) - G*M*mu**2*r)
for name, good in ok:
    print(('ok ' if good else 'FAIL ') + name)
`;

  it("agrees with every relation the demo derives, and with the slip being wrong", () => {
    const result = spawnSync("python3", ["-c", script], { encoding: "utf8" });
    expect(result.status, result.stderr).toBe(0);
    const lines = result.stdout.trim().split("\n");
    expect(lines.length).toBeGreaterThanOrEqual(25);
    for (const line of lines) expect(line).toMatch(/^ok /);
  });
});
