import type { JSONContent } from "@tiptap/core";
import { extractDerivation } from "@/editor/derivation";
import type { SpacetimeBlockAttributes } from "@/editor/spacetime-block";

/** The fields every spacetime verb takes (see cas/spacetime/request.ts), read from a spacetime block. */
export interface SpacetimeRequest {
  readonly coordinates: string[];
  readonly metric: string;
  readonly symbols: string[];
  readonly definitions?: Record<string, string>;
}

/** What is missing before a block can be sent to the spacetime verbs, or null. */
export function missingForRequest(block: SpacetimeBlockAttributes): string | null {
  if (!block.lineElement.trim()) return "This block has no line element yet.";
  if (block.coordinates.length < 2 || block.coordinates.length > 4) return "Declare two to four coordinates in this block.";
  return null;
}

export function spacetimeRequest(block: SpacetimeBlockAttributes, definitions?: Record<string, string>): SpacetimeRequest {
  return {
    coordinates: block.coordinates.map((c) => c.symbol),
    metric: block.lineElement,
    symbols: block.constants.map((c) => c.symbol),
    ...(definitions && Object.keys(definitions).length ? { definitions } : {}),
  };
}

/**
 * The "definition" steps under this block that give one of its constants in terms of
 * others (r_s = 2GM/c²), so the effective potential can be split into its Newtonian,
 * centrifugal and relativistic terms. Definitions through velocities (E = μc²A ṫ) are
 * constants of motion, not rewrites, and are left out.
 */
export function blockDefinitions(doc: JSONContent, blockId: string | null): Record<string, string> {
  const derivation = extractDerivation(doc);
  const index = derivation.blocks.findIndex((b) => b.id === blockId);
  if (index < 0) return {};
  const constants = new Set(derivation.blocks[index].constants.map((c) => c.symbol.replace(/\s+/g, "")));
  const out: Record<string, string> = {};
  for (const step of derivation.steps) {
    if (step.blockIndex !== index || step.kind !== "definition" || /\\d?dot\b/.test(step.relation)) continue;
    const eq = step.relation.indexOf("=");
    if (eq <= 0) continue;
    const name = step.relation.slice(0, eq).replace(/\s+/g, "");
    if (constants.has(name) && !(name in out)) out[name] = step.relation.slice(eq + 1).trim();
  }
  return out;
}

/** A refusal from a cas verb (the CheckError shape), told apart from an answer. */
export function isRefusal(value: unknown): value is { error: { code: string; message: string } } {
  return typeof value === "object" && value !== null && "error" in value && typeof (value as { error: unknown }).error === "object";
}
