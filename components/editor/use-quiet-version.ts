"use client";

import type { Editor } from "@tiptap/core";
import { useEffect, useState } from "react";
import { QuietTimer } from "@/editor/quiet-timer";

/**
 * A counter that moves once the editor has had no `event` for `quietMs`: for views derived from
 * the document (outline, remark positions) that need not follow every keystroke. Each React
 * commit with the caret in the editor makes React walk the whole editable DOM to save and
 * restore the selection, which in a long notebook costs more than the keystroke itself.
 */
export function useQuietVersion(editor: Editor | null, event: "update" | "transaction", quietMs: number): number {
  const [version, setVersion] = useState(0);
  useEffect(() => {
    if (!editor) return;
    const quiet = new QuietTimer(quietMs, () => {
      if (!editor.isDestroyed) setVersion((v) => v + 1);
    });
    const onEvent = () => quiet.poke();
    editor.on(event, onEvent);
    return () => {
      editor.off(event, onEvent);
      quiet.cancel();
    };
  }, [editor, event, quietMs]);
  return version;
}
