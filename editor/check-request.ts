import type { CheckContext, CheckRequest, Justification } from "@/cas/check/protocol";
import type { Derivation, DerivationBlock, DerivationStep } from "./derivation";

/** Either a request to send to the checker, or why the step is not checked. */
export type StepCheckPlan = { readonly request: CheckRequest } | { readonly notChecked: string };

const LIMIT_ARROW = /\s*(?:\\to|\\rightarrow|->|→)\s*/;

function stripLead(detail: string, word: string): string {
  return detail.trim().replace(new RegExp(`^${word}\\s+`, "i"), "").trim();
}

/**
 * Turns a step's justification (kind + free-text detail) into the checker's shape.
 * Substitutions are the cited steps' relations followed by the relations written in the
 * detail, separated by ";". Returns a message instead when the detail is missing.
 *
 * @example
 * toProtocolJustification("limit", "c \\to \\infty", [], "\\tau") // { kind: "limit", symbol: "c", to: "\\infty" }
 * toProtocolJustification("euler-lagrange", "in r", [], "\\tau")  // { kind: "euler-lagrange", coordinate: "r", parameter: "\\tau" }
 */
export function toProtocolJustification(
  kind: DerivationStep["kind"],
  detail: string,
  citedRelations: readonly string[],
  parameter: string,
): Justification | { readonly problem: string } {
  switch (kind) {
    case "algebra":
      return { kind };
    case "definition":
      return { kind };
    case "substitute": {
      const written = detail.split(/;|\n/).map((r) => r.trim()).filter(Boolean);
      const relations = [...citedRelations, ...written];
      return relations.length ? { kind, relations } : { problem: "Say what is substituted: cite a step or write the relation." };
    }
    case "differentiate": {
      const by = stripLead(detail, "by");
      return by ? { kind, by } : { problem: "Say which variable is differentiated by." };
    }
    case "euler-lagrange": {
      const coordinate = stripLead(detail, "in");
      return coordinate ? { kind, coordinate, parameter } : { problem: "Say which coordinate the Euler–Lagrange equation is in." };
    }
    case "limit": {
      const [symbol, to] = detail.replace(/∞/g, "\\infty").split(LIMIT_ARROW).map((part) => part?.trim());
      return symbol && to ? { kind, symbol, to } : { problem: "Write the limit as 'c \\to \\infty'." };
    }
  }
}

/**
 * The checker context of a spacetime block plus the definitions made above a step:
 * coordinates and constants become `symbols` (with their dimensions), assumptions pass
 * through, and steps justified as "definition" become `definitions`. An undeclared τ is
 * proper time, and the interval `s` of `ds^2 = …` is a length when a coordinate is one.
 *
 * @example
 * blockContext(block, ["E = \\mu c^2 \\dot t"]).symbols // { t: "time", r: "length", … }
 */
export function blockContext(block: DerivationBlock | null, definitions: readonly string[]): CheckContext {
  if (!block) return { symbols: {}, definitions: [...definitions], assumptions: [] };
  const symbols: Record<string, string | null> = {};
  for (const s of [...block.coordinates, ...block.constants]) symbols[s.symbol] = s.dimension.trim() || null;
  // Conventions the block implies without declaring: τ is proper time, and the interval s of
  // `ds^2 = …` is measured like the spatial coordinates (c²dt² and dr² are both lengths squared).
  if (block.parameter.trim() === "\\tau" && !(block.parameter in symbols)) symbols[block.parameter] = "time";
  const interval = /^d\s*([a-zA-Z])\s*\^\s*\{?2\}?$/.exec(definedSymbol(block.lineElement));
  const spatial = block.coordinates.find((c) => c.dimension.trim() === "length");
  if (interval && spatial && !(interval[1] in symbols)) symbols[interval[1]] = "length";
  return { symbols, definitions: [...definitions], assumptions: [...block.assumptions], parameter: block.parameter };
}

/** The left-hand side of `symbol = expression`, without spaces ("" when there is no "="). */
function definedSymbol(relation: string): string {
  const equals = relation.indexOf("=");
  return equals > 0 ? relation.slice(0, equals).replace(/\s+/g, "") : "";
}

/**
 * True when a substitution written in `detail` replaces the line element's left side (`ds^2`)
 * and `previous` does not contain it: "substitute ds² = −c² dτ²" then works on the line element.
 *
 * @example
 * substitutesIntoLineElement("ds^2 = -c^2\\,d\\tau^2", block, "\\frac{d}{d\\tau}(\\mu r^2\\dot\\phi) = 0") // true
 */
export function substitutesIntoLineElement(detail: string, block: DerivationBlock | null, previous: string): boolean {
  const side = definedSymbol(block?.lineElement ?? "");
  if (!side) return false;
  const written = detail.split(/;|\n/).map(definedSymbol);
  return written.includes(side) && !previous.replace(/\s+/g, "").includes(side);
}

/**
 * The definitions made above a step under the same spacetime block, as the checker's context
 * takes them: steps justified as "definition", except definitions of declared constants
 * through velocities (constants of motion such as E and L).
 *
 * @example
 * definitionsBefore(extractDerivation(doc), 3) // ["r_s = \\frac{2GM}{c^2}"]
 */
export function definitionsBefore(derivation: Derivation, index: number): string[] {
  const step = derivation.steps[index];
  const block = step.blockIndex === null ? null : derivation.blocks[step.blockIndex];
  const declaredConstants = new Set((block?.constants ?? []).map((c) => c.symbol.replace(/\s+/g, "")));
  return derivation.steps
    .slice(0, index)
    .filter((s) => s.kind === "definition" && s.blockIndex === step.blockIndex && s.relation)
    // A declared constant defined through velocities (E, L) is a constant of motion: its
    // definition is used when cited, never as a rewrite rule, or "differentiate by r" would
    // see L = μr²φ̇ vary with r. Definitions such as r_s = 2GM/c² stay in the context.
    .filter((s) => !(declaredConstants.has(definedSymbol(s.relation)) && /\\d?dot\b/.test(s.relation)))
    .map((s) => s.relation);
}

/**
 * Plans the check of one step. `from` is the relation of the step it explicitly follows
 * (`follows`); otherwise of the first cited step — except for a substitution, whose cited
 * steps are what is substituted — otherwise of the previous non-definition step, and for
 * the first derived step under a block, the block's line element (also for a substitution
 * for the line element's left side, ds², when the previous step has none). `to` is the step's own
 * relation; the context is the nearest spacetime block above plus the definitions made
 * before it under that block, except definitions of declared constants through velocities
 * (constants of motion such as E and L).
 *
 * @example
 * planStepCheck(extractDerivation(doc), "st-b") // { request: { context, from, to, justification } }
 */
export function planStepCheck(derivation: Derivation, stepId: string): StepCheckPlan {
  const index = derivation.steps.findIndex((s) => s.id === stepId);
  if (index < 0) return { notChecked: "This step is not in the notebook." };
  const step = derivation.steps[index];
  if (!step.relation) return { notChecked: "The step is empty." };

  const byId = new Map(derivation.steps.map((s) => [s.id, s]));
  const block = step.blockIndex === null ? null : derivation.blocks[step.blockIndex];
  const definitions = definitionsBefore(derivation, index);
  const cited = step.cites.map((id) => byId.get(id)).filter((s): s is DerivationStep => s !== undefined);
  const previous = step.previousId ? byId.get(step.previousId) : undefined;

  const justification = toProtocolJustification(step.kind, step.detail, cited.map((s) => s.relation), block?.parameter ?? "\\tau");
  if ("problem" in justification) return { notChecked: justification.problem };

  const follows = step.followsId ? byId.get(step.followsId) : undefined;
  const source = follows ?? (step.kind === "substitute" ? previous : (cited[0] ?? previous));
  // The first derived step under a block starts from the block's line element, and so does a
  // substitution for the line element's left side (ds² = −c²dτ²) when the step before has no ds².
  const fromLineElement = !source || (!follows && step.kind === "substitute" && substitutesIntoLineElement(step.detail, block, source.relation));
  const from = fromLineElement ? (block?.lineElement.trim() || null) : source.relation;
  if (from === null && step.kind !== "definition") {
    return { notChecked: "Nothing precedes this step: no earlier step and no line element above. Cite a step to check it against." };
  }
  return {
    request: {
      context: blockContext(block, definitions),
      from: from ?? step.relation,
      to: step.relation,
      justification,
    },
  };
}

/**
 * Plans every step of a derivation, keyed by step id, in document order.
 *
 * @example
 * scheduler.schedule(() => planAllChecks(extractDerivation(editor.getJSON())));
 */
export function planAllChecks(derivation: Derivation): Map<string, StepCheckPlan> {
  return new Map(derivation.steps.map((step) => [step.id, planStepCheck(derivation, step.id)]));
}
