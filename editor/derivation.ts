import type { JSONContent } from "@tiptap/core";
import type { DeclaredSymbol } from "./spacetime-block";
import { isJustificationKind, type JustificationKind } from "./step";

/** A spacetime block as the checker and exporters see it. */
export interface DerivationBlock {
  readonly id: string | null;
  readonly name: string;
  readonly coordinates: readonly DeclaredSymbol[];
  readonly lineElement: string;
  readonly constants: readonly DeclaredSymbol[];
  readonly assumptions: readonly string[];
  readonly parameter: string;
}

export interface DerivationStep {
  readonly id: string;
  /** Current number, 1-based, in document order over the whole notebook. */
  readonly number: number;
  /** The relation's LaTeX source. */
  readonly relation: string;
  readonly kind: JustificationKind;
  readonly detail: string;
  /** Ids of the earlier steps it cites (unknown ids dropped, order kept). */
  readonly cites: readonly string[];
  /** The earlier step it explicitly follows from (`follows`), or null. */
  readonly followsId: string | null;
  /**
   * The nearest earlier step under the same spacetime block that is not a definition
   * (definitions go into the context instead), or null when there is none.
   */
  readonly previousId: string | null;
  /** Index into `blocks` of the nearest spacetime block above, or null when there is none. */
  readonly blockIndex: number | null;
  /** Text of the nearest heading above, or null. */
  readonly section: string | null;
}

export interface Derivation {
  readonly blocks: readonly DerivationBlock[];
  readonly steps: readonly DerivationStep[];
}

function textOf(node: JSONContent): string {
  if (node.type === "text") return node.text ?? "";
  return (node.content ?? []).map(textOf).join("");
}

function symbols(value: unknown): DeclaredSymbol[] {
  if (!Array.isArray(value)) return [];
  return value
    .filter((s): s is DeclaredSymbol => typeof s === "object" && s !== null && typeof (s as DeclaredSymbol).symbol === "string")
    .map((s) => ({ symbol: s.symbol, dimension: typeof s.dimension === "string" ? s.dimension : "", ...(s.note ? { note: s.note } : {}) }));
}

function toBlock(attrs: Record<string, unknown>): DerivationBlock {
  return {
    id: typeof attrs.id === "string" ? attrs.id : null,
    name: typeof attrs.name === "string" ? attrs.name : "",
    coordinates: symbols(attrs.coordinates),
    lineElement: typeof attrs.lineElement === "string" ? attrs.lineElement : "",
    constants: symbols(attrs.constants),
    assumptions: Array.isArray(attrs.assumptions) ? attrs.assumptions.filter((a): a is string => typeof a === "string") : [],
    parameter: typeof attrs.parameter === "string" && attrs.parameter ? attrs.parameter : "\\tau",
  };
}

/**
 * Extracts the derivation from a notebook's Tiptap JSON: its spacetime blocks and its steps
 * in order, with ids, numbers, justifications, citations and the step each one follows.
 * Pure and DOM-free, so the checker, the check ledger of an edition and the LaTeX export
 * all read a notebook the same way.
 *
 * Rules: steps are numbered over the whole notebook; a step's context is the nearest
 * spacetime block above it; a step's `previousId` is the nearest earlier non-definition step
 * under the same block (a new block starts a new chain); citations and `follows` of unknown
 * or later steps are dropped.
 *
 * @example
 * const { steps } = extractDerivation(editor.getJSON());
 * steps[1] // { id: "st-b", number: 2, relation: "…", kind: "algebra", previousId: "st-a", … }
 */
export function extractDerivation(doc: JSONContent): Derivation {
  const blocks: DerivationBlock[] = [];
  const steps: DerivationStep[] = [];
  const seen = new Set<string>();
  let previousId: string | null = null;
  let section: string | null = null;

  const visit = (node: JSONContent) => {
    if (node.type === "spacetimeBlock") {
      blocks.push(toBlock(node.attrs ?? {}));
      previousId = null;
      return;
    }
    if (node.type === "heading") {
      section = textOf(node).trim() || null;
      return;
    }
    if (node.type === "step") {
      const attrs = node.attrs ?? {};
      const id = typeof attrs.id === "string" && attrs.id ? attrs.id : null;
      const cites = Array.isArray(attrs.cites) ? attrs.cites.filter((c): c is string => typeof c === "string" && seen.has(c)) : [];
      if (id === null || seen.has(id)) return; // step-ids.ts repairs these in the editor
      const followsId = typeof attrs.follows === "string" && seen.has(attrs.follows) ? attrs.follows : null;
      steps.push({
        id,
        number: steps.length + 1,
        relation: textOf(node).trim(),
        kind: isJustificationKind(attrs.kind) ? attrs.kind : "algebra",
        detail: typeof attrs.detail === "string" ? attrs.detail : "",
        cites,
        followsId,
        previousId,
        blockIndex: blocks.length ? blocks.length - 1 : null,
        section,
      });
      seen.add(id);
      if (steps[steps.length - 1].kind !== "definition") previousId = id;
      return;
    }
    for (const child of node.content ?? []) visit(child);
  };
  visit(doc);
  return { blocks, steps };
}
