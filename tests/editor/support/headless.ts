import { Editor, type JSONContent } from "@tiptap/core";
import { notebookExtensions } from "@/editor/notebook-extensions";

/**
 * A notebook editor without a DOM. Tiptap 3 runs unmounted with `element: null`, but only
 * installs the extensions' ProseMirror plugins when a view is mounted, so we install them.
 */
export function headlessEditor(content: JSONContent): Editor {
  // Node 20 has no `navigator`; ProseMirror's keymap reads the platform from it.
  if (typeof globalThis.navigator === "undefined") {
    Object.defineProperty(globalThis, "navigator", { value: { platform: "Linux", userAgent: "node" }, configurable: true });
  }
  const editor = new Editor({ element: null, extensions: notebookExtensions(), content });
  editor.view.updateState(editor.state.reconfigure({ plugins: editor.extensionManager.plugins }));
  return editor;
}

export function step(id: string | null, relation: string, attrs: Record<string, unknown> = {}): JSONContent {
  return { type: "step", attrs: { id, kind: "algebra", detail: "", cites: [], follows: null, ...attrs }, content: relation ? [{ type: "text", text: relation }] : [] };
}

export function paragraph(...content: JSONContent[]): JSONContent {
  return { type: "paragraph", content };
}

export function doc(...content: JSONContent[]): JSONContent {
  return { type: "doc", content };
}

/** Position of the top-level block with this index. */
export function blockPos(editor: Editor, index: number): number {
  let pos = 0;
  for (let i = 0; i < index; i++) pos += editor.state.doc.child(i).nodeSize;
  return pos;
}
