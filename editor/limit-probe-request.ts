import type { LimitProbeRequest } from "@/cas/limit/protocol";
import type { Derivation } from "./derivation";
import { blockContext, definitionsBefore } from "./check-request";

/** Either the limit probe request for a step, or why it cannot be probed. */
export type LimitProbePlan = { readonly request: LimitProbeRequest } | { readonly notProbed: string };

/** What the reader asked for: the parameter and where it goes ("infinity" or a number). */
export interface LimitChoice {
  readonly parameter: string;
  readonly target: string;
}

const LIMIT_ARROW = /\s*(?:\\to|\\rightarrow|->|→)\s*/;
const INFINITY = /^\+?(?:\\infty|∞|infinity|inf)$/;

/**
 * The parameter and target to start the form with: those of a step justified as
 * "limit c \to \infty", else c → ∞, the Newtonian limit most steps are probed for.
 *
 * @example
 * defaultLimitChoice("limit", "Q \\to 0") // { parameter: "Q", target: "0" }
 * defaultLimitChoice("algebra", "")       // { parameter: "c", target: "infinity" }
 */
export function defaultLimitChoice(kind: string, detail: string): LimitChoice {
  if (kind === "limit") {
    const [parameter, target] = detail.split(LIMIT_ARROW).map((part) => part?.trim());
    if (parameter && target) return { parameter, target: INFINITY.test(target) ? "infinity" : target };
  }
  return { parameter: "c", target: "infinity" };
}

/**
 * Plans the limit probe of one step's own relation, with the context its check
 * gets: the nearest spacetime block above and the definitions made before it.
 * Probing changes nothing in the document, so any role may ask for it.
 *
 * @example
 * planLimitProbe(extractDerivation(doc), "st-b", { parameter: "c", target: "infinity" })
 * // { request: { context, expression: "V = …", parameter: "c", target: "infinity" } }
 */
export function planLimitProbe(derivation: Derivation, stepId: string, choice: LimitChoice): LimitProbePlan {
  const index = derivation.steps.findIndex((s) => s.id === stepId);
  if (index < 0) return { notProbed: "This step is not in the notebook." };
  const step = derivation.steps[index];
  if (!step.relation.trim()) return { notProbed: "The step is empty." };
  const parameter = choice.parameter.trim();
  if (!parameter) return { notProbed: "Say which symbol goes to the limit, e.g. c." };
  const target = choice.target.trim();
  if (!target) return { notProbed: "Say where it goes: ∞ or a number such as 0." };
  const block = step.blockIndex === null ? null : derivation.blocks[step.blockIndex];
  return {
    request: {
      context: blockContext(block, definitionsBefore(derivation, index)),
      expression: step.relation,
      parameter,
      target: INFINITY.test(target) ? "infinity" : target,
    },
  };
}
