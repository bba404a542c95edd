import "server-only";
import type * as Y from "yjs";
import type { JSONContent } from "@tiptap/core";
import { readJSONFromYDoc, writeJSONToYDoc } from "@/editor/collaboration";
import { notebookExtensions } from "@/editor/notebook-extensions";

/** Converts between a notebook's Tiptap JSON and its Y.Doc (the schema comes from the editor). */
export interface JsonDocumentCodec {
  readJson(doc: Y.Doc): Record<string, unknown>;
  writeJson(doc: Y.Doc, content: Record<string, unknown>): void;
}

/** The codec for the notebook editor's schema. */
export function notebookJsonCodec(): JsonDocumentCodec {
  const extensions = notebookExtensions();
  return {
    readJson: (doc) => readJSONFromYDoc(doc) as Record<string, unknown>,
    writeJson: (doc, content) => writeJSONToYDoc(doc, content as JSONContent, extensions),
  };
}
