import { InputRule, Node, mergeAttributes } from "@tiptap/core";
import { renderLatex } from "./katex-render";

/** The Greek letters (and variants) that `\name` followed by a space turns into inline math in prose. */
export const GREEK_COMMANDS = [
  "alpha", "beta", "gamma", "delta", "epsilon", "varepsilon", "zeta", "eta", "theta", "vartheta",
  "iota", "kappa", "lambda", "mu", "nu", "xi", "pi", "rho", "sigma", "tau", "upsilon", "phi",
  "varphi", "chi", "psi", "omega", "Gamma", "Delta", "Theta", "Lambda", "Xi", "Pi", "Sigma",
  "Upsilon", "Phi", "Psi", "Omega",
] as const;

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    mathInline: {
      /** Inserts inline math at the selection. */
      insertMathInline: (latex: string) => ReturnType;
    };
  }
}

/**
 * Inline math inside prose: an atom whose only state is its LaTeX source (`latex`).
 *
 * Contract
 * - HTML: `<span data-type="math-inline" data-latex="…">` (the rendered KaTeX inside is
 *   decoration, never parsed back).
 * - Typing `$…$` in prose, or `\alpha` (any Greek command) followed by a space, creates one.
 * - The view renders with KaTeX (`trust: false`, `throwOnError: false`); a source that does not
 *   parse shows the raw source marked as an error, with the message as its title, and the
 *   document stays valid. Double-click (or Enter while selected) edits the source in place.
 * - Being an atom, concurrent edits of the same formula by two co-authors resolve to one of
 *   them (last writer wins on the attribute); formulas are short, so this is acceptable.
 *
 * @example
 * { type: "mathInline", attrs: { latex: "r_s = 2GM/c^2" } }
 */
export const MathInline = Node.create({
  name: "mathInline",
  group: "inline",
  inline: true,
  atom: true,
  selectable: true,

  addAttributes() {
    return {
      latex: {
        default: "",
        parseHTML: (element) => element.getAttribute("data-latex") ?? "",
        renderHTML: (attributes) => ({ "data-latex": attributes.latex }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'span[data-type="math-inline"]' }];
  },

  renderHTML({ HTMLAttributes, node }) {
    return ["span", mergeAttributes(HTMLAttributes, { "data-type": "math-inline" }), `$${node.attrs.latex}$`];
  },

  renderText({ node }) {
    return `$${node.attrs.latex}$`;
  },

  addCommands() {
    return {
      insertMathInline:
        (latex) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs: { latex } }),
    };
  },

  addInputRules() {
    const type = this.type;
    const toMath = (pattern: RegExp, latexOf: (match: RegExpMatchArray) => string) =>
      new InputRule({
        find: pattern,
        handler: ({ state, range, match }) => {
          const latex = latexOf(match);
          if (!latex.trim()) return null;
          state.tr.replaceWith(range.from, range.to, type.create({ latex }));
        },
      });
    return [
      // `$r_s$` — but not `$$`, which starts display math.
      toMath(/(?<!\$)\$([^$\n]+)\$$/, (m) => m[1]),
      toMath(new RegExp(`\\\\(${GREEK_COMMANDS.join("|")}) $`), (m) => `\\${m[1]}`),
    ];
  },

  addNodeView() {
    return ({ node, editor, getPos }) => {
      const dom = document.createElement("span");
      dom.dataset.type = "math-inline";
      dom.className = "math-inline";
      let current = node;

      const show = () => {
        const { html, error } = renderLatex(current.attrs.latex, false);
        dom.innerHTML = html;
        dom.classList.toggle("math-error", error !== null);
        dom.title = error ?? current.attrs.latex;
        dom.setAttribute("aria-label", error ? `formula with an error: ${error}` : `formula ${current.attrs.latex}`);
      };

      const edit = () => {
        if (!editor.isEditable) return;
        const input = document.createElement("input");
        input.value = current.attrs.latex;
        input.className = "math-inline-input";
        input.setAttribute("aria-label", "LaTeX source of the formula");
        input.size = Math.max(4, current.attrs.latex.length);
        dom.replaceChildren(input);
        input.focus();
        const commit = (save: boolean) => {
          const pos = typeof getPos === "function" ? getPos() : undefined;
          if (save && typeof pos === "number" && input.value !== current.attrs.latex) {
            editor.view.dispatch(editor.state.tr.setNodeMarkup(pos, undefined, { latex: input.value }));
          } else {
            show();
          }
          editor.commands.focus();
        };
        input.addEventListener("keydown", (event) => {
          if (event.key === "Enter") { event.preventDefault(); commit(true); }
          if (event.key === "Escape") { event.preventDefault(); commit(false); }
        });
        input.addEventListener("input", () => { input.size = Math.max(4, input.value.length); });
        input.addEventListener("blur", () => commit(true), { once: true });
      };

      dom.addEventListener("dblclick", edit);
      show();

      return {
        dom,
        update: (updated) => {
          if (updated.type !== current.type) return false;
          current = updated;
          show();
          return true;
        },
        selectNode: () => dom.classList.add("is-selected"),
        deselectNode: () => dom.classList.remove("is-selected"),
        stopEvent: (event) => event.target instanceof HTMLInputElement,
        ignoreMutation: () => true,
      };
    };
  },

  addKeyboardShortcuts() {
    return {
      Enter: ({ editor }) => {
        const { selection } = editor.state;
        if (!("node" in selection) || (selection as { node?: { type: unknown } }).node?.type !== this.type) return false;
        const dom = editor.view.nodeDOM(selection.from);
        if (dom instanceof HTMLElement) dom.dispatchEvent(new MouseEvent("dblclick"));
        return true;
      },
    };
  },
});
