"use client";

import type { Editor } from "@tiptap/core";
import { useEffect, useState } from "react";
import { followVerdictSummary, type VerdictSummaryFigures } from "@/editor/verdict-summary";

/** The counts of the summary line, following the editor (see followVerdictSummary for when). */
export function useVerdictSummary(editor: Editor | null): VerdictSummaryFigures | null {
  const [summary, setSummary] = useState<VerdictSummaryFigures | null>(null);
  useEffect(() => (editor ? followVerdictSummary(editor, setSummary) : undefined), [editor]);
  return summary;
}
