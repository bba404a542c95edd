"use client";

import type { Editor } from "@tiptap/core";
import { useMemo } from "react";
import { outlineOf, type OutlineEntry } from "@/editor/outline";
import { useQuietVersion } from "./use-quiet-version";

/** The notebook's outline, recomputed a short while after the document or the verdicts stop changing. */
export function useOutline(editor: Editor | null, quietMs = 250): readonly OutlineEntry[] {
  const version = useQuietVersion(editor, "transaction", quietMs);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- version marks a settled editor state
  return useMemo(() => (editor && !editor.isDestroyed ? outlineOf(editor.state) : []), [editor, version]);
}
