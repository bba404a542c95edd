import { describe, expect, it } from "vitest";
import { escapeText, exportLatex, sanitizeMath, stepLabel } from "@/editor/export-latex";

const doc = {
  type: "doc",
  content: [
    { type: "heading", attrs: { level: 2 }, content: [{ type: "text", text: "Energy & momentum" }] },
    { type: "paragraph", content: [{ type: "text", text: "By " }, { type: "stepRef", attrs: { stepId: "a" } }, { type: "text", text: " and " }, { type: "stepRef", attrs: { stepId: "gone" } }] },
    { type: "step", attrs: { id: "a", kind: "definition", detail: "", cites: [], follows: null }, content: [{ type: "text", text: "E = \\mu c^2 \\dot t" }] },
    { type: "step", attrs: { id: "b", kind: "differentiate", detail: "by r", cites: ["a"], follows: null }, content: [{ type: "text", text: "E' = 0" }] },
    { type: "spacetimeBlock", attrs: { name: "Flat", coordinates: [{ symbol: "t", dimension: "time" }], constants: [], lineElement: "ds^2 = -c^2 dt^2", assumptions: ["c > 0"], parameter: "\\tau" } },
  ],
};

describe("exportLatex", () => {
  const { tex, figureIds } = exportLatex(doc, { title: "Test", verdicts: new Map([["b", "verified (symbolically)"]]) });

  it("writes headings as sections and steps as numbered, labelled equations with their justification", () => {
    expect(tex).toContain("\\section{Energy \\& momentum}");
    expect(tex).toContain("\\begin{equation}\\label{step:a}\nE = \\mu c^2 \\dot t\n\\end{equation}\n\\vbjustification{definition}");
    expect(tex).toContain("\\vbjustification{differentiate by $r$; using (\\ref{step:a}) --- \\emph{verified (symbolically)}}");
    expect(figureIds).toEqual([]);
  });

  it("cites steps by reference and says so when a cited step is gone", () => {
    expect(tex).toContain("By (\\ref{step:a}) and (step removed)");
  });

  it("shows the spacetime block as a displayed line element and a list of declarations", () => {
    expect(tex).toContain("\\begin{equation*}\nds^2 = -c^2 dt^2\n\\end{equation*}");
    expect(tex).toContain("\\item Coordinates: $t$ (time)");
    expect(tex).toContain("\\item Assumptions: $c > 0$");
  });
});

describe("escaping", () => {
  it("escapes prose and turns symbols pdflatex cannot read into commands", () => {
    expect(escapeText("r_s ≈ 18 km & 50% #1 {x}")).toBe("r\\_s $\\approx$ 18 km \\& 50\\% \\#1 \\{x\\}");
    expect(escapeText("a\\b ~ ^")).toBe("a\\textbackslash{}b \\textasciitilde{} \\textasciicircum{}");
    expect(escapeText("雪")).toBe("[U+96EA]");
  });

  it("keeps math but escapes comment and alignment characters", () => {
    expect(sanitizeMath("a % b & c")).toBe("a \\% b \\& c");
    expect(sanitizeMath("\\% stays")).toBe("\\% stays");
    expect(sanitizeMath("θ → ∞")).toBe("\\theta   \\to   \\infty");
  });

  it("makes labels from any step id", () => {
    expect(stepLabel("st-ab_c{1}")).toBe("step:st-ab-c-1-");
  });
});
