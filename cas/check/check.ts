import type { CheckAnswer, CheckRequest } from "./protocol";
import { EvaluationError } from "../numeric/evaluate";
import { hashText, randomStream } from "../numeric/random";
import { dimensionReport, type TermPrinter } from "../dims/report";
import { Undecidable } from "./errors";
import { readCheckRequest } from "./read";
import { withDefinedDimensions } from "./defined-dimensions";
import { checkParsedStep } from "./verdict";
import { DEFAULT_PROBE, type ProbeSettings } from "./implication";

/**
 * Checks one step of a derivation: reads the request, decides the verdict and,
 * when the notebook declares dimensions, adds the dimension audit of the new
 * step. The random points come from a stream started from the request text,
 * so the same request always gets the same answer. Throws CasRequestError for
 * a request that cannot be read (the caller turns it into a CheckError).
 *
 * @example
 * checkStep({ context: { symbols: { r: "length", r_s: "length" }, assumptions: ["r > r_s"] },
 *             from: "\\left(1-\\frac{r_s}{r}\\right)c^2", to: "c^2-\\frac{r_s c^2}{r}" })
 * // { verdict: "verified", method: { kind: "numeric", points: 12, digits: 50, … } }
 */
export function checkStep(req: CheckRequest, settings: ProbeSettings = DEFAULT_PROBE, print?: TermPrinter): CheckAnswer {
  const { step, context } = readCheckRequest(req);
  const rng = randomStream(hashText(JSON.stringify(req)));
  let answer: CheckAnswer;
  try {
    answer = checkParsedStep(step, context.parsed, rng, settings);
  } catch (err) {
    if (!(err instanceof Undecidable) && !(err instanceof EvaluationError)) throw err;
    answer = { verdict: "undecided", method: { kind: "none", detail: "the checker stopped before probing" }, reason: err.message };
  }
  const declared = [...context.dimensions.symbols.values()].some((d) => d !== null);
  if (!declared) return answer;
  // Defined symbols (and any definition the step itself makes) take the dimension of what they stand for.
  const definitions = [...context.parsed.definitions, ...(step.to.kind === "relation" && step.justification.kind === "definition" ? [step.to] : [])];
  return { ...answer, dimensions: dimensionReport(step.to, withDefinedDimensions(context.dimensions, definitions), print) };
}
