"use client";

import { NodeViewWrapper, type ReactNodeViewProps } from "@tiptap/react";

/** A figure in the reading column: the attachment's image (or a link to its PDF) and its caption, editable by writers. */
export function FigureView({ node, updateAttributes, editor }: ReactNodeViewProps) {
  const { attachmentId, format, caption } = node.attrs as { attachmentId: string | null; format: "image" | "pdf"; caption: string };
  const source = attachmentId ? `/api/attachments/${attachmentId}` : null;
  return (
    <NodeViewWrapper as="figure" data-type="figure" className="my-4 rounded-md border border-paper-edge bg-white/60 p-3">
      {!source ? (
        <p className="text-sm text-ink-muted">This figure has lost its attachment.</p>
      ) : format === "pdf" ? (
        <a href={source} className="text-sm text-accent underline">
          Open the PDF figure
        </a>
      ) : (
        // eslint-disable-next-line @next/next/no-img-element -- served by our own download route with its own headers
        <img src={source} alt={caption || "Figure"} className="mx-auto max-h-96" />
      )}
      <figcaption className="mt-2 text-center text-sm">
        {editor.isEditable ? (
          <input
            aria-label="Figure caption"
            value={caption}
            placeholder="Caption"
            onChange={(event) => updateAttributes({ caption: event.target.value })}
            className="w-full rounded border border-paper-edge bg-transparent px-2 py-1 text-center"
          />
        ) : (
          caption
        )}
      </figcaption>
    </NodeViewWrapper>
  );
}
