import { getSchema, type JSONContent } from "@tiptap/core";
import type { DOMOutputSpec, Node as PMNode, Schema, TagParseRule } from "@tiptap/pm/model";
import { notebookExtensions } from "@/editor/notebook-extensions";

/** The notebook schema, built once. */
export const schema: Schema = getSchema(notebookExtensions());

export function nodeFromJSON(json: JSONContent): PMNode {
  return schema.nodeFromJSON(json);
}

/** A stand-in for the one DOM call our parse rules make, since tests run without a DOM. */
interface FakeElement {
  readonly tag: string;
  readonly attributes: Record<string, string>;
  getAttribute(name: string): string | null;
}

/** Renders a node with its `toDOM` and returns the outer element as a fake. */
export function renderOuter(node: PMNode): FakeElement {
  const spec = node.type.spec.toDOM!(node) as DOMOutputSpec;
  if (!Array.isArray(spec)) throw new Error("expected an array DOM spec");
  const [tag, maybeAttrs] = spec as [string, unknown];
  const attributes: Record<string, string> = {};
  if (maybeAttrs && typeof maybeAttrs === "object" && !Array.isArray(maybeAttrs)) {
    for (const [key, value] of Object.entries(maybeAttrs as Record<string, unknown>)) {
      if (value !== null && value !== undefined) attributes[key] = String(value);
    }
  }
  return { tag, attributes, getAttribute: (name) => (name in attributes ? attributes[name] : null) };
}

/** Finds the node type whose parse rule matches the fake element and returns the parsed attrs. */
export function parseOuter(element: FakeElement): { type: string; attrs: Record<string, unknown> } | null {
  for (const type of Object.values(schema.nodes)) {
    for (const rule of (type.spec.parseDOM ?? []) as TagParseRule[]) {
      const match = /^(\w+)(?:\[data-type="([^"]+)"\])?$/.exec(rule.tag ?? "");
      if (!match || match[1] !== element.tag) continue;
      if (match[2] && element.getAttribute("data-type") !== match[2]) continue;
      if (!match[2] && element.getAttribute("data-type")) continue;
      const attrs = rule.getAttrs ? rule.getAttrs(element as unknown as HTMLElement) : {};
      if (attrs === false) continue;
      const defaults = Object.fromEntries(Object.entries(type.spec.attrs ?? {}).map(([key, spec]) => [key, spec.default]));
      return { type: type.name, attrs: { ...defaults, ...(attrs ?? {}) } };
    }
  }
  return null;
}
