import { describe, expect, it } from "vitest";
import { renderToStaticMarkup } from "react-dom/server";
import { LimitProbeResult } from "@/components/editor/limit-probe";
import { runVerb } from "@/cas/api";
import type { LimitProbeAnswer } from "@/cas/limit/protocol";

function answerFor(input: Record<string, unknown>): LimitProbeAnswer {
  const out = runVerb("limit", { context: {}, ...input });
  if (!out.ok) throw new Error(out.error.message);
  return out.value as LimitProbeAnswer;
}

const text = (html: string) => html.replace(/<annotation[^>]*>.*?<\/annotation>/g, "").replace(/<[^>]+>/g, "");

describe("LimitProbeResult", () => {
  // Schwarzschild V_eff per unit mass, Hartle (2003) §9.3 (from memory) → Newtonian (Goldstein (2002) §3.3).
  const answer = answerFor({ expression: "-\\frac{GM}{r} + \\frac{\\ell^2}{2r^2} - \\frac{GM\\ell^2}{c^2 r^3}", parameter: "c", target: "infinity" });
  const html = renderToStaticMarkup(<LimitProbeResult answer={answer} />);

  it("says per term in words what happens, with a glyph beside each word (no colour-only signal)", () => {
    const words = text(html);
    expect(words).toMatch(/↓0 vanishes/);
    expect(words.match(/= stays/g)).toHaveLength(2);
    expect(words).toMatch(/vanishes, like/);
    expect(words).toMatch(/does not involve/);
    expect(html).toContain("katex");
  });

  it("writes the limit down when it can, and always says it is an estimate along a finite sequence, not a proof", () => {
    expect(text(html)).toMatch(/In the limit:/);
    expect(text(html)).toMatch(/Estimate, not proof: .*finite sequence.*not a proof/);
  });

  it("shows whether both sides of an equation agree, and the witness when they do not (ours: a factor 2 too many)", () => {
    const bad = answerFor({ expression: "c^2\\left(\\sqrt{1-\\frac{2GM}{rc^2}}-1\\right) = -\\frac{2GM}{r}", parameter: "c", target: "infinity" });
    const words = text(renderToStaticMarkup(<LimitProbeResult answer={bad} />));
    expect(words).toMatch(/✕ Both sides: different limits/);
    expect(words).toMatch(/r= /);
  });
});
