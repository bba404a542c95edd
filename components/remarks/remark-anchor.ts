import type { Node as PMNode } from "@tiptap/pm/model";
import type { EditorState } from "@tiptap/pm/state";
import { absolutePositionToRelativePosition, relativePositionToAbsolutePosition, ySyncPluginKey } from "@tiptap/y-tiptap";
import * as Y from "yjs";

// Remark anchors. A span is kept as two Yjs relative positions, which name characters of
// the shared text rather than offsets, so the span follows its words when co-authors type
// before it or inside it; if its text is deleted, it collapses and resolves to nothing.

// atob/btoa exist in browsers and in Node ≥ 16, so the same code runs in the editor and in tests.
const toBase64 = (bytes: Uint8Array) => btoa(String.fromCharCode(...bytes));
const fromBase64 = (text: string) => Uint8Array.from(atob(text), (c) => c.charCodeAt(0));

/** A span as the API stores it: Yjs relative positions, base64. */
export type SpanAnchor = { from: string; to: string };

/** What is needed to translate between ProseMirror positions and Yjs positions. */
export interface YBinding {
  readonly doc: Y.Doc;
  readonly type: Y.XmlFragment;
  /** y-tiptap's map from Yjs types to ProseMirror nodes. */
  readonly mapping: Map<Y.AbstractType<unknown>, PMNode | PMNode[]>;
}

/** The live binding of a collaborative editor's state, or null when it is not bound to Yjs. */
export function bindingOf(state: EditorState): YBinding | null {
  const sync = ySyncPluginKey.getState(state) as { doc?: Y.Doc; type?: Y.XmlFragment; binding?: { mapping: YBinding["mapping"] } } | undefined;
  if (!sync?.doc || !sync.type || !sync.binding) return null;
  return { doc: sync.doc, type: sync.type, mapping: sync.binding.mapping };
}

/** Anchors the ProseMirror range from..to. */
export function encodeSpan(binding: YBinding, from: number, to: number): SpanAnchor {
  const encode = (pos: number) => toBase64(Y.encodeRelativePosition(absolutePositionToRelativePosition(pos, binding.type, binding.mapping as never)));
  return { from: encode(from), to: encode(to) };
}

/** Where a span is now, or null when its text was deleted (or the anchor is not from this document). */
export function resolveSpan(binding: YBinding, span: SpanAnchor): { from: number; to: number } | null {
  try {
    const resolve = (encoded: string) =>
      relativePositionToAbsolutePosition(binding.doc, binding.type, Y.decodeRelativePosition(fromBase64(encoded)), binding.mapping as never);
    const from = resolve(span.from);
    const to = resolve(span.to);
    if (from === null || to === null || to <= from) return null;
    return { from, to };
  } catch {
    return null; // a damaged or foreign anchor is "not found", never a crash
  }
}

/** Position of the step with this id, or null. */
export function findStep(doc: PMNode, stepId: string): { pos: number; node: PMNode } | null {
  let found: { pos: number; node: PMNode } | null = null;
  doc.descendants((node, pos) => {
    if (found) return false;
    if (node.type.name === "step" && node.attrs.id === stepId) {
      found = { pos, node };
      return false;
    }
    return true;
  });
  return found;
}

/** The id of the step containing a position, if any (a span chosen inside a step's LaTeX). */
export function stepAround(doc: PMNode, pos: number): string | null {
  const $pos = doc.resolve(pos);
  for (let depth = $pos.depth; depth > 0; depth--) {
    const node = $pos.node(depth);
    if (node.type.name === "step") return (node.attrs.id as string | null) ?? null;
  }
  return null;
}
