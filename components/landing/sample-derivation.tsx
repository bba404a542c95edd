import { Tex } from "./tex";

type SampleStep = {
  tex: string;
  justification: string;
  verdict: "verified" | "refuted";
  note?: string;
};

// A hand-written illustration of how a notebook reads. The refuted step drops the
// 3 r_s ℓ²/r⁴ term of dV/dr; the witness values were computed with SymPy (V' = 3/16 at the point).
const steps: SampleStep[] = [
  { tex: "\\ell = r^2\\,\\dot\\varphi", justification: "Euler–Lagrange in φ", verdict: "verified" },
  {
    tex: "V_{\\mathrm{eff}}(r) = \\Bigl(1-\\frac{r_s}{r}\\Bigr)\\Bigl(c^2+\\frac{\\ell^2}{r^2}\\Bigr)",
    justification: "substitute ℓ and E into the line element",
    verdict: "verified",
  },
  {
    tex: "\\frac{dV_{\\mathrm{eff}}}{dr} = \\frac{r_s c^2}{r^2} - \\frac{2\\ell^2}{r^3}",
    justification: "differentiate by r",
    verdict: "refuted",
    note: "witness r = 2, r_s = 1, ℓ = 1, c = 1: left side 3/16, right side 0",
  },
];

const verdictMarks = {
  verified: { glyph: "✓", box: "border-accent text-accent-deep bg-accent-wash" },
  refuted: { glyph: "✕", box: "border-alarm text-alarm bg-alarm-wash" },
} as const;

export function SampleDerivation() {
  return (
    <figure className="rounded-lg border border-paper-edge bg-white/70 p-5 shadow-sm">
      <figcaption className="mb-3 text-xs uppercase tracking-wider text-ink-muted">
        An illustration of a notebook page (not a live check)
      </figcaption>
      <ol className="space-y-4">
        {steps.map((step, index) => {
          const mark = verdictMarks[step.verdict];
          return (
            <li key={index} className="grid grid-cols-[2rem_1fr] gap-x-3 gap-y-1 sm:grid-cols-[2rem_1fr_8rem]">
              <span className="pt-1 font-mono text-sm text-ink-muted">({index + 1})</span>
              <div className="overflow-x-auto">
                <Tex source={step.tex} display />
                <p className="text-sm italic text-ink-soft">{step.justification}</p>
              </div>
              <div className="col-start-2 sm:col-start-3">
                <span className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-xs font-semibold ${mark.box}`}>
                  <span aria-hidden="true">{mark.glyph}</span>
                  {step.verdict}
                </span>
                {step.note && <p className="mt-1 text-xs text-ink-soft">{step.note}</p>}
              </div>
            </li>
          );
        })}
      </ol>
    </figure>
  );
}
