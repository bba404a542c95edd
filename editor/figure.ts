import { Node, mergeAttributes } from "@tiptap/core";

export interface FigureAttributes {
  /** The notebook attachment shown (its id); the bytes live in file storage, never in the document. */
  readonly attachmentId: string | null;
  /** "image" for PNG/JPEG, "pdf" for a PDF figure (shown as a link in the editor, embedded on export). */
  readonly format: "image" | "pdf";
  readonly caption: string;
}

/**
 * A figure: an uploaded attachment placed in the document, with a caption.
 *
 * Contract
 * - Attributes: `attachmentId` (uuid of a notebook attachment), `format` ("image" | "pdf"),
 *   `caption` (plain text). An atom: no content; edited as a whole.
 * - HTML: `<figure data-type="figure" data-attachment-id data-format><figcaption>…</figcaption></figure>`.
 * - The LaTeX export writes it as a `figure` environment with `\includegraphics` of the
 *   attachment, shipped beside the .tex in a zip.
 *
 * @example
 * { type: "figure", attrs: { attachmentId: "5b0e…", format: "image", caption: "Effective potential" } }
 */
export const Figure = Node.create({
  name: "figure",
  group: "block",
  atom: true,
  draggable: true,

  addAttributes() {
    return {
      attachmentId: {
        default: null,
        parseHTML: (element) => element.getAttribute("data-attachment-id"),
        renderHTML: (attributes) => (attributes.attachmentId ? { "data-attachment-id": attributes.attachmentId } : {}),
      },
      format: {
        default: "image",
        parseHTML: (element) => (element.getAttribute("data-format") === "pdf" ? "pdf" : "image"),
        renderHTML: (attributes) => ({ "data-format": attributes.format }),
      },
      caption: {
        default: "",
        parseHTML: (element) => element.querySelector("figcaption")?.textContent ?? "",
        renderHTML: () => ({}),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'figure[data-type="figure"]' }];
  },

  renderHTML({ node, HTMLAttributes }) {
    return ["figure", mergeAttributes(HTMLAttributes, { "data-type": "figure" }), ["figcaption", {}, node.attrs.caption ?? ""]];
  },

  renderText({ node }) {
    return `[Figure: ${node.attrs.caption || "untitled"}]`;
  },
});

/** A document (or any part of one) in Tiptap's JSON form, as stored and exchanged. */
interface JsonNode {
  readonly type?: string;
  readonly attrs?: Record<string, unknown> | null;
  readonly content?: readonly JsonNode[];
}

/**
 * Whether a figure anywhere in this document shows the attachment. Removing an attachment a
 * figure still shows would leave an empty frame in the notebook, so the server asks first.
 *
 * @example
 * placesAttachment({ type: "doc", content: [{ type: "figure", attrs: { attachmentId: "a1" } }] }, "a1") // true
 */
export function placesAttachment(node: JsonNode, attachmentId: string): boolean {
  if (node.type === "figure" && node.attrs?.attachmentId === attachmentId) return true;
  return (node.content ?? []).some((child) => placesAttachment(child, attachmentId));
}
