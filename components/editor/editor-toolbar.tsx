"use client";

import type { Editor } from "@tiptap/core";
import { memo } from "react";
import { MATH_SHORTCUTS } from "@/editor/math-shortcuts";

const shortcutKeys = (keys: string) => keys.replace("Mod", typeof navigator !== "undefined" && /Mac/.test(navigator.platform) ? "⌘" : "Ctrl");

/** Insert buttons for the blocks of a notebook, and the math shortcuts in words (memoised: they change with nothing on the page). */
export const EditorToolbar = memo(function EditorToolbar({ editor }: { editor: Editor }) {
  const button = "rounded border border-paper-edge bg-paper px-2 py-1 hover:bg-paper-deep";
  return (
    <div className="flex flex-wrap items-center gap-1.5 font-sans text-xs" role="toolbar" aria-label="Insert">
      <button type="button" className={button} onClick={() => editor.chain().focus().toggleHeading({ level: 2 }).run()}>
        Section
      </button>
      <button type="button" className={button} onClick={() => editor.chain().focus().toggleHeading({ level: 3 }).run()}>
        Subsection
      </button>
      <button type="button" className={button} onClick={() => editor.chain().focus().insertStep().run()}>
        Step
      </button>
      <button type="button" className={button} onClick={() => editor.chain().focus().insertMathDisplay("").run()}>
        Display math
      </button>
      <button type="button" className={button} onClick={() => editor.chain().focus().insertMathInline("x").run()}>
        Inline math
      </button>
      <button
        type="button"
        className={button}
        onClick={() =>
          editor
            .chain()
            .focus()
            .insertSpacetimeBlock({
              name: "",
              coordinates: [
                { symbol: "t", dimension: "time" },
                { symbol: "r", dimension: "length" },
                { symbol: "\\theta", dimension: "dimensionless" },
                { symbol: "\\phi", dimension: "dimensionless" },
              ],
            })
            .run()
        }
      >
        Spacetime block
      </button>
      <details className="relative">
        <summary className="cursor-pointer rounded px-2 py-1 text-ink-muted hover:bg-paper-deep">Math keys</summary>
        <div className="absolute right-0 z-20 mt-1 w-72 rounded-md border border-paper-edge bg-paper p-3 shadow-sm">
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
            {MATH_SHORTCUTS.map((s) => (
              <div key={s.keys} className="contents">
                <dt>
                  <kbd className="font-mono">{shortcutKeys(s.keys)}</kbd>
                </dt>
                <dd>{s.does}</dd>
              </div>
            ))}
          </dl>
          <p className="mt-2 text-ink-muted">
            In prose: <code>$…$</code> makes inline math, <code>\alpha</code> and a space a Greek letter, <code>$$</code> and a space display math, <code>#3</code> and
            a space cites step 3. Paste LaTeX with <code>equation</code> or <code>align</code> to get steps.
          </p>
        </div>
      </details>
    </div>
  );
});
