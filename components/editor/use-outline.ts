"use client";

import type { Editor } from "@tiptap/core";
import { useEffect, useState } from "react";
import { outlineOf, type OutlineEntry } from "@/editor/outline";

/**
 * The notebook's outline, recomputed a short while after the document or the verdicts stop
 * changing. Not per keystroke: each React commit with the caret in the editor makes React walk
 * the whole editable DOM to save and restore the selection, which in a long notebook costs more
 * than the keystroke itself.
 */
export function useOutline(editor: Editor | null, quietMs = 250): readonly OutlineEntry[] {
  const [entries, setEntries] = useState<readonly OutlineEntry[]>(() => (editor ? outlineOf(editor.state) : []));
  useEffect(() => {
    if (!editor) return;
    let timer: ReturnType<typeof setTimeout> | null = null;
    const refresh = () => {
      timer = null;
      if (!editor.isDestroyed) setEntries(outlineOf(editor.state));
    };
    const onTransaction = () => {
      if (timer !== null) clearTimeout(timer);
      timer = setTimeout(refresh, quietMs);
    };
    refresh();
    editor.on("transaction", onTransaction);
    return () => {
      editor.off("transaction", onTransaction);
      if (timer !== null) clearTimeout(timer);
    };
  }, [editor, quietMs]);
  return entries;
}
