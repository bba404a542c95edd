"use client";

import { useLayoutEffect, useRef } from "react";
import { canAdoptSheets, copiedPageSheet } from "./shadow-sheets";

/** Rules our notebook CSS gives KaTeX inside a step's preview; page CSS does not reach into a shadow root. */
const PREVIEW_RULES = ".katex-display { margin: 0.4em 0; }";

/** KaTeX's rules copied from the page's own stylesheet (katex.min.css, loaded with the editor). */
const katexSheet = () => copiedPageSheet("katex", (rule) => rule.cssText.includes(".katex"), PREVIEW_RULES);

/**
 * A visual-only KaTeX rendering kept in a shadow root. Inside the editable notebook, every
 * keystroke makes the browser walk the editable text around the caret; a rendered formula is
 * hundreds of glyph nodes, and in the shadow root they are out of that walk (a 26-step notebook
 * typed about 3 ms faster per key). Mark it aria-hidden: the step's source line is its text.
 */
export function KatexShadow({ html, className }: { html: string; className?: string }) {
  const host = useRef<HTMLDivElement>(null);
  useLayoutEffect(() => {
    const element = host.current;
    if (!element) return;
    if (!canAdoptSheets(element)) {
      element.innerHTML = html;
      return;
    }
    const root = element.shadowRoot ?? element.attachShadow({ mode: "open" });
    const sheet = katexSheet();
    if (root.adoptedStyleSheets[0] !== sheet) root.adoptedStyleSheets = [sheet];
    root.innerHTML = html;
  }, [html]);
  return <div ref={host} aria-hidden="true" className={className} />;
}
