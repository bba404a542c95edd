// Covers db/demo/notebooks/*: the demo documents must open in the editor and read as LaTeX.
import { spawnSync } from "node:child_process";
import type { JSONContent } from "@tiptap/core";
import { describe, expect, it } from "vitest";
import { buildKestrelSchwarzschildOrbits } from "@/db/demo/notebooks/kestrel-schwarzschild-orbits";
import { buildLanternDeSitterCircular } from "@/db/demo/notebooks/lantern-de-sitter-circular";
import { buildVesperReissnerNordstrom } from "@/db/demo/notebooks/vesper-reissner-nordstrom";
import { extractDerivation } from "@/editor/derivation";
import { renderLatex } from "@/editor/katex-render";
import { nodeFromJSON } from "./support/html-spec";

const notebooks: Array<[string, JSONContent]> = [
  ["Kestrel-7 (Schwarzschild)", buildKestrelSchwarzschildOrbits()],
  ["Vesper-3 (Reissner–Nordström)", buildVesperReissnerNordstrom()],
  ["Lantern (Schwarzschild–de Sitter)", buildLanternDeSitterCircular()],
];

function inlineMath(node: JSONContent): string[] {
  if (node.type === "mathInline") return [String(node.attrs?.latex ?? "")];
  return (node.content ?? []).flatMap(inlineMath);
}

describe.each(notebooks)("demo notebook %s", (_name, content) => {
  const derivation = extractDerivation(content);

  it("fits the notebook schema", () => {
    expect(() => nodeFromJSON(content).check()).not.toThrow();
  });

  it("has a full derivation of at least 15 steps with unique ids", () => {
    expect(derivation.steps.length).toBeGreaterThanOrEqual(15);
    expect(new Set(derivation.steps.map((s) => s.id)).size).toBe(derivation.steps.length);
  });

  it("cites and follows only earlier steps (nothing dropped on extraction)", () => {
    const stepNodes = (content.content ?? []).filter((n) => n.type === "step");
    for (const [i, node] of stepNodes.entries()) {
      const extracted = derivation.steps[i];
      expect(extracted.cites).toEqual(node.attrs?.cites ?? []);
      expect(extracted.followsId).toBe(node.attrs?.follows ?? null);
    }
  });

  it("writes every relation, line element, assumption and inline formula in LaTeX that KaTeX reads", () => {
    const sources = [
      ...derivation.steps.map((s) => s.relation),
      ...derivation.blocks.flatMap((b) => [b.lineElement, ...b.assumptions, ...b.constants.map((c) => c.symbol)]),
      ...inlineMath(content),
    ];
    for (const source of sources) expect(renderLatex(source, true).error, source).toBeNull();
  });
});

describe("the Vesper-3 draft", () => {
  it("carries its deliberate sign slip in step 17, which SymPy confirms is wrong", () => {
    const slip = extractDerivation(buildVesperReissnerNordstrom()).steps.find((s) => s.number === 17)!;
    expect(slip.relation).toContain("- \\frac{L^2 r_Q^2}{2\\mu r^4}");
    // Source: SymPy (Debian python3-sympy) expanding the effective potential of step 15 with f of step 3.
    const script = [
      "from sympy import symbols, expand, Rational",
      "r, mu, c, L, rs, rQ = symbols('r mu c L r_s r_Q', positive=True)",
      "f = 1 - rs/r + rQ**2/r**2",
      "V = expand(mu*c**2/2*(f - 1) + L**2*f/(2*mu*r**2))",
      "print(V.coeff(L, 2).coeff(rQ, 2))",
    ].join("\n");
    const result = spawnSync("python3", ["-c", script], { encoding: "utf8" });
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout.trim()).toBe("1/(2*mu*r**4)"); // positive: the draft's minus sign is the slip
  });
});
