import { getSchema, type AnyExtension, type JSONContent } from "@tiptap/core";
import Collaboration from "@tiptap/extension-collaboration";
import { prosemirrorJSONToYXmlFragment, yXmlFragmentToProsemirrorJSON } from "@tiptap/y-tiptap";
import * as Y from "yjs";

/** The Y.XmlFragment name that holds a notebook's document inside its Y.Doc. */
export const NOTEBOOK_FRAGMENT = "notebook";

/**
 * The Yjs binding of the notebook document (the provider — websocket, IndexedDB — is
 * attached by the caller to the same Y.Doc). With collaboration on, undo/redo come from
 * Yjs (per-client, only one's own edits), so the starter kit's own history must be off;
 * notebookExtensions() does that when given a document.
 *
 * @example
 * const ydoc = new Y.Doc();
 * new Editor({ extensions: notebookExtensions({ collaboration: { document: ydoc } }) });
 */
export function collaborationExtension(document: Y.Doc, field: string = NOTEBOOK_FRAGMENT): AnyExtension {
  return Collaboration.configure({ document, field });
}

/**
 * Writes a notebook's Tiptap JSON into an empty Y.Doc, e.g. to move a notebook saved as
 * JSON into co-editing. The extensions give the schema; pass the same list the editor uses.
 *
 * @example
 * const ydoc = new Y.Doc();
 * writeJSONToYDoc(ydoc, savedContent, notebookExtensions());
 * Y.encodeStateAsUpdate(ydoc) // the bytes to store
 */
export function writeJSONToYDoc(document: Y.Doc, content: JSONContent, extensions: AnyExtension[], field: string = NOTEBOOK_FRAGMENT): void {
  prosemirrorJSONToYXmlFragment(getSchema(extensions), content, document.getXmlFragment(field));
}

/**
 * Reads a notebook's Tiptap JSON back out of a Y.Doc (for editions, export and the checker
 * on the server).
 *
 * @example
 * extractDerivation(readJSONFromYDoc(ydoc))
 */
export function readJSONFromYDoc(document: Y.Doc, field: string = NOTEBOOK_FRAGMENT): JSONContent {
  return yXmlFragmentToProsemirrorJSON(document.getXmlFragment(field)) as JSONContent;
}
