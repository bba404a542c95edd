import { Node, mergeAttributes } from "@tiptap/core";

/** A declared symbol with its dimension, e.g. { symbol: "M", dimension: "mass" }. */
export interface DeclaredSymbol {
  /** LaTeX of the symbol: "r_s", "\\theta", "G". */
  readonly symbol: string;
  /** "length", "M L^3 T^-2", "dimensionless", … or "" when not declared. */
  readonly dimension: string;
  /** Optional plain-language note ("mass of the central object"). */
  readonly note?: string;
}

export interface SpacetimeBlockAttributes {
  readonly id: string | null;
  readonly name: string;
  readonly coordinates: readonly DeclaredSymbol[];
  /** The line element in LaTeX, e.g. "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2\\,dt^2 + …". */
  readonly lineElement: string;
  readonly constants: readonly DeclaredSymbol[];
  /** Relations in LaTeX restricting the domain: "r > r_s", "\\theta = \\frac{\\pi}{2}". */
  readonly assumptions: readonly string[];
  /** The curve parameter that dots differentiate by. */
  readonly parameter: string;
}

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    spacetimeBlock: {
      /** Inserts a spacetime block after the current top-level block. */
      insertSpacetimeBlock: (attrs?: Partial<SpacetimeBlockAttributes>) => ReturnType;
      /** Replaces some fields of the spacetime block with this id. */
      updateSpacetimeBlock: (id: string, attrs: Partial<Omit<SpacetimeBlockAttributes, "id">>) => ReturnType;
    };
  }
}

function jsonAttribute<T>(name: string, fallback: T) {
  return {
    default: fallback,
    parseHTML: (element: HTMLElement): T => {
      const raw = element.getAttribute(`data-${name}`);
      if (!raw) return fallback;
      try {
        const parsed: unknown = JSON.parse(raw);
        return Array.isArray(parsed) ? (parsed as T) : fallback;
      } catch {
        return fallback; // a damaged attribute must not make the whole paste fail
      }
    },
    renderHTML: (attributes: Record<string, unknown>) => ({ [`data-${name}`]: JSON.stringify(attributes[name] ?? fallback) }),
  };
}

function stringAttribute(name: string, fallback: string) {
  return {
    default: fallback,
    parseHTML: (element: HTMLElement) => element.getAttribute(`data-${name}`) ?? fallback,
    renderHTML: (attributes: Record<string, unknown>) => ({ [`data-${name}`]: String(attributes[name] ?? fallback) }),
  };
}

/**
 * A spacetime block: declares the coordinates, the line element, constants with their
 * dimensions and the assumptions that hold for every step below it, up to the next block.
 *
 * Contract
 * - An atom: its fields are attributes edited in the spacetime block panel, not text.
 *   Under Yjs each field is one attribute, so concurrent edits of different fields merge
 *   and concurrent edits of the same field resolve to one writer.
 * - `id` is a stable id given on insert (used to anchor the curvature sheet and orbit panel).
 * - HTML: `<div data-type="spacetime-block" data-name data-coordinates='[…]' data-line-element
 *   data-constants='[…]' data-assumptions='[…]' data-parameter>`; list fields are JSON.
 * - The checker context of a step is built from the nearest block above it (derivation.ts).
 *
 * @example
 * { type: "spacetimeBlock", attrs: { id: "sb-1", name: "Schwarzschild exterior",
 *   coordinates: [{ symbol: "t", dimension: "time" }, { symbol: "r", dimension: "length" }],
 *   lineElement: "ds^2 = …", constants: [{ symbol: "r_s", dimension: "length" }],
 *   assumptions: ["r > r_s"], parameter: "\\tau" } }
 */
export const SpacetimeBlock = Node.create({
  name: "spacetimeBlock",
  group: "block",
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return {
      id: {
        default: null,
        parseHTML: (element) => element.getAttribute("data-block-id"),
        renderHTML: (attributes) => (attributes.id ? { "data-block-id": attributes.id } : {}),
      },
      name: stringAttribute("name", ""),
      coordinates: jsonAttribute<DeclaredSymbol[]>("coordinates", []),
      lineElement: {
        default: "",
        parseHTML: (element) => element.getAttribute("data-line-element") ?? "",
        renderHTML: (attributes) => ({ "data-line-element": attributes.lineElement }),
      },
      constants: jsonAttribute<DeclaredSymbol[]>("constants", []),
      assumptions: jsonAttribute<string[]>("assumptions", []),
      parameter: stringAttribute("parameter", "\\tau"),
    };
  },

  parseHTML() {
    return [{ tag: 'div[data-type="spacetime-block"]' }];
  },

  renderHTML({ HTMLAttributes, node }) {
    return [
      "div",
      mergeAttributes(HTMLAttributes, { "data-type": "spacetime-block" }),
      ["p", node.attrs.name || "Spacetime"],
      ["pre", node.attrs.lineElement],
    ];
  },

  renderText({ node }) {
    return `[spacetime: ${node.attrs.name}] \\[${node.attrs.lineElement}\\]`;
  },

  addCommands() {
    return {
      insertSpacetimeBlock:
        (attrs = {}) =>
        ({ state, tr, dispatch }) => {
          const { $from } = state.selection;
          const after = $from.depth > 0 ? $from.after(1) : state.doc.content.size;
          const id = attrs.id ?? `sb-${globalThis.crypto.randomUUID().slice(0, 8)}`;
          if (dispatch) tr.insert(after, this.type.create({ ...attrs, id }));
          return true;
        },
      updateSpacetimeBlock:
        (id, attrs) =>
        ({ state, tr, dispatch }) => {
          let found = -1;
          state.doc.forEach((node, pos) => {
            if (found < 0 && node.type === this.type && node.attrs.id === id) found = pos;
          });
          if (found < 0) return false;
          if (dispatch) for (const [key, value] of Object.entries(attrs)) tr.setNodeAttribute(found, key, value);
          return true;
        },
    };
  },
});
