import { getSchema, type AnyExtension, type JSONContent } from "@tiptap/core";
import Collaboration from "@tiptap/extension-collaboration";
import CollaborationCaret from "@tiptap/extension-collaboration-caret";
import { prosemirrorJSONToYXmlFragment, yXmlFragmentToProsemirrorJSON } from "@tiptap/y-tiptap";
import * as Y from "yjs";
import type { Awareness } from "y-protocols/awareness";
import { pacedAwareness } from "./paced-awareness";

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

/** Who a co-author is, as their caret and the presence list show them. */
export interface CoAuthor {
  readonly name: string;
  readonly color: string;
  /** "active", "idle" (no input for a while) or "away" (tab hidden). */
  readonly status?: "active" | "idle" | "away";
}

/**
 * Our own palette for co-authors' carets: muted inks that stay readable on the paper
 * background and differ in lightness as well as hue.
 */
export const CO_AUTHOR_PALETTE = ["#8a3b12", "#1f5f5b", "#5b3f8c", "#7a6a12", "#2f4f8f", "#8c2f4f", "#3f6b2a", "#6b4a2f"] as const;

/** A stable colour for a user id, so a co-author keeps their colour across sessions. */
export function colorForUser(userId: string): string {
  let hash = 0;
  for (const ch of userId) hash = (hash * 31 + ch.charCodeAt(0)) >>> 0;
  return CO_AUTHOR_PALETTE[hash % CO_AUTHOR_PALETTE.length];
}

/**
 * Co-authors' carets and selections, drawn from the provider's awareness. The caret is a
 * thin bar with the author's name in a small tab above it. Our own caret is published when
 * typing pauses (pacedAwareness), so co-authors see it move up to half a second late.
 *
 * @example
 * presenceExtension(websocketProvider, { name: "A. Author", color: colorForUser(id) })
 */
export function presenceExtension(provider: { awareness: Awareness }, user: CoAuthor): AnyExtension {
  // The caret plugin reads only `awareness` from the provider.
  return CollaborationCaret.configure({
    provider: { awareness: pacedAwareness(provider.awareness, "cursor") },
    user,
    render: (peer: Record<string, unknown>) => {
      const caret = document.createElement("span");
      caret.className = "vb-coauthor-caret";
      caret.style.setProperty("--coauthor", String(peer.color ?? "#555"));
      const tab = document.createElement("span");
      tab.className = "vb-coauthor-tab";
      tab.textContent = String(peer.name ?? "co-author");
      caret.append(tab);
      return caret;
    },
    selectionRender: (peer: Record<string, unknown>) => ({
      class: "vb-coauthor-selection",
      style: `--coauthor: ${String(peer.color ?? "#555")}`,
    }),
  });
}
