import type { JSONContent } from "@tiptap/core";
import type { JustificationKind } from "@/editor/step";
import type { SpacetimeBlockAttributes } from "@/editor/spacetime-block";

/** Builders for demo notebook documents (Tiptap JSON in the editor's schema; see editor/INTERNALS.md). */

type Inline = string | { readonly math: string } | { readonly ref: string };

export function heading(level: 2 | 3, text: string): JSONContent {
  return { type: "heading", attrs: { level }, content: [{ type: "text", text }] };
}

/** A paragraph; `{ math }` is inline math, `{ ref }` cites a step by id. */
export function para(...parts: Inline[]): JSONContent {
  return {
    type: "paragraph",
    content: parts.map((part) =>
      typeof part === "string"
        ? { type: "text", text: part }
        : "math" in part
          ? { type: "mathInline", attrs: { latex: part.math } }
          : { type: "stepRef", attrs: { stepId: part.ref } },
    ),
  };
}

export function display(latex: string): JSONContent {
  return { type: "mathDisplay", content: [{ type: "text", text: latex }] };
}

export function step(
  id: string,
  relation: string,
  kind: JustificationKind = "algebra",
  detail = "",
  links: { cites?: string[]; follows?: string } = {},
): JSONContent {
  return {
    type: "step",
    attrs: { id, kind, detail, cites: links.cites ?? [], follows: links.follows ?? null },
    content: [{ type: "text", text: relation }],
  };
}

export function spacetime(attrs: SpacetimeBlockAttributes): JSONContent {
  return { type: "spacetimeBlock", attrs: { ...attrs } };
}

export function notebook(...content: JSONContent[]): JSONContent {
  return { type: "doc", content };
}

/** Coordinates of a static, spherically symmetric spacetime in Schwarzschild-like form. */
export const SPHERICAL_COORDINATES = [
  { symbol: "t", dimension: "time" },
  { symbol: "r", dimension: "length" },
  { symbol: "\\theta", dimension: "dimensionless" },
  { symbol: "\\phi", dimension: "dimensionless" },
] as const;

/** Constants every orbit notebook declares. */
export const ORBIT_CONSTANTS = [
  { symbol: "G", dimension: "M^-1 L^3 T^-2", note: "Newton's constant" },
  { symbol: "M", dimension: "mass", note: "mass of the central object" },
  { symbol: "c", dimension: "velocity", note: "speed of light" },
  { symbol: "\\mu", dimension: "mass", note: "rest mass of the test particle" },
  { symbol: "r_s", dimension: "length", note: "Schwarzschild radius" },
  { symbol: "E", dimension: "M L^2 T^-2", note: "conserved energy" },
  { symbol: "L", dimension: "M L^2 T^-1", note: "conserved angular momentum" },
] as const;
