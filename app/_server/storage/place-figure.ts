import "server-only";
import * as Y from "yjs";

/**
 * An edit (for editNotebookDocument) that appends a figure node at the end of the document.
 * It inserts one element into the shared fragment — the shape the editor's Yjs binding gives
 * an atom node (element named after the node, attributes as they are) — rather than
 * rewriting the document, so co-authors' concurrent typing and remark anchors are untouched.
 *
 * @example
 * await editNotebookDocument({ db, notebookId, userId, edit: appendFigure({ attachmentId, format: "image", caption: "" }) });
 */
export function appendFigure(attrs: { attachmentId: string; format: "image" | "pdf"; caption: string }): (doc: Y.Doc) => void {
  return (doc) => {
    const fragment = doc.getXmlFragment("notebook");
    const element = new Y.XmlElement("figure");
    element.setAttribute("attachmentId", attrs.attachmentId);
    element.setAttribute("format", attrs.format);
    element.setAttribute("caption", attrs.caption);
    fragment.insert(fragment.length, [element]);
  };
}
