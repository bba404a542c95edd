"use client";

import { useMemo } from "react";
import { renderLatex } from "@/editor/katex-render";

/** A formula rendered with KaTeX in its safe mode; a malformed one shows its error beside it. */
export function Latex({ source, display = false }: { source: string; display?: boolean }) {
  const { html, error } = useMemo(() => renderLatex(source, display), [source, display]);
  return (
    <span title={error ?? undefined}>
      <span dangerouslySetInnerHTML={{ __html: html }} />
      {error ? <span className="ml-1 font-sans text-xs text-alarm">({error})</span> : null}
    </span>
  );
}
