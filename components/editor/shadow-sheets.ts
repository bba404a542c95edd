/**
 * Page CSS does not reach into a shadow root, so the notebook's shadow roots adopt copies of
 * the page's own rules. One sheet per kind is shared by every root that adopts it.
 */

interface CopiedSheet {
  sheet: CSSStyleSheet;
  filled: boolean;
}

const copies = new Map<string, CopiedSheet>();

/** True where an element can host a shadow root styled by adopted sheets. */
export function canAdoptSheets(element: Element): boolean {
  return typeof element.attachShadow === "function" && typeof CSSStyleSheet !== "undefined" && "adoptedStyleSheets" in Document.prototype;
}

function pageRules(keep: (rule: CSSRule) => boolean): string[] {
  const rules: string[] = [];
  for (const sheet of Array.from(document.styleSheets)) {
    let cssRules: CSSRuleList;
    try {
      cssRules = sheet.cssRules;
    } catch {
      continue; // a cross-origin sheet; ours are same-origin
    }
    // @font-face stays in the page, where it applies; inside a shadow root it would not
    for (const rule of Array.from(cssRules)) if (!(rule instanceof CSSFontFaceRule) && keep(rule)) rules.push(rule.cssText);
  }
  return rules;
}

/**
 * The shared copy named `name` of the page rules that `keep` selects, plus `extra`. If the
 * page's stylesheets have not arrived yet the copy is filled on a later call, and every root
 * adopting it picks the rules up.
 */
export function copiedPageSheet(name: string, keep: (rule: CSSRule) => boolean, extra = ""): CSSStyleSheet {
  let copy = copies.get(name);
  if (!copy) {
    copy = { sheet: new CSSStyleSheet(), filled: false };
    copies.set(name, copy);
  }
  if (!copy.filled) {
    const rules = pageRules(keep);
    if (rules.length) {
      copy.sheet.replaceSync(`${rules.join("\n")}\n${extra}`);
      copy.filled = true;
    }
  }
  return copy.sheet;
}
