import { Node, mergeAttributes, textblockTypeInputRule } from "@tiptap/core";
import { renderLatex } from "./katex-render";

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    mathDisplay: {
      /** Inserts a display formula after the current block. */
      insertMathDisplay: (latex: string) => ReturnType;
    };
  }
}

/**
 * Display math: a block whose text content is its LaTeX source.
 *
 * Contract
 * - Content is plain text (no marks): the LaTeX source itself, so co-authors typing in the
 *   same formula merge character by character under Yjs.
 * - HTML: `<div data-type="math-display"><pre>source</pre></div>`.
 * - Typing `$$` and a space at the start of an empty paragraph turns it into display math.
 * - The view shows the KaTeX rendering (`trust: false`, `throwOnError: false`) with the source
 *   beneath it while the caret is inside; a parse error is shown as a message under the
 *   formula, the document stays valid.
 * - Display math is not checked; a relation that should be checked is a `step`.
 *
 * @example
 * { type: "mathDisplay", content: [{ type: "text", text: "r_s = \\frac{2GM}{c^2}" }] }
 */
export const MathDisplay = Node.create({
  name: "mathDisplay",
  group: "block",
  content: "text*",
  marks: "",
  code: true,
  defining: true,

  parseHTML() {
    return [{ tag: 'div[data-type="math-display"]', preserveWhitespace: "full", contentElement: "pre" }];
  },

  renderHTML({ HTMLAttributes }) {
    return ["div", mergeAttributes(HTMLAttributes, { "data-type": "math-display" }), ["pre", 0]];
  },

  renderText({ node }) {
    return `\\[${node.textContent}\\]`;
  },

  addCommands() {
    return {
      insertMathDisplay:
        (latex) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, content: latex ? [{ type: "text", text: latex }] : [] }),
    };
  },

  addInputRules() {
    return [textblockTypeInputRule({ find: /^\$\$\s$/, type: this.type })];
  },

  addNodeView() {
    return ({ node }) => {
      const dom = document.createElement("div");
      dom.dataset.type = "math-display";
      dom.className = "math-display";
      const preview = document.createElement("div");
      preview.className = "math-preview";
      preview.contentEditable = "false";
      const message = document.createElement("p");
      message.className = "math-error-message";
      message.contentEditable = "false";
      message.setAttribute("role", "status");
      const source = document.createElement("pre");
      source.className = "math-source";
      source.spellcheck = false;
      source.setAttribute("aria-label", "LaTeX source of the display formula");
      dom.append(preview, message, source);

      let shown: string | null = null;
      const show = (latex: string) => {
        if (latex === shown) return;
        shown = latex;
        const { html, error } = renderLatex(latex || "\\square", true);
        preview.innerHTML = html;
        message.textContent = error ?? "";
        message.hidden = error === null;
        dom.classList.toggle("math-error", error !== null);
      };
      show(node.textContent);

      return {
        dom,
        contentDOM: source,
        update: (updated) => {
          if (updated.type !== node.type) return false;
          show(updated.textContent);
          return true;
        },
        ignoreMutation: (mutation) => !source.contains(mutation.target),
      };
    };
  },
});
