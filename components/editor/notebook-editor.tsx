"use client";

import "katex/dist/katex.min.css";
import "./notebook-editor.css";

import { getSchema, type JSONContent } from "@tiptap/core";
import { EditorContent, ReactNodeViewRenderer, useEditor, useEditorState } from "@tiptap/react";
import { useEffect, useMemo, useState } from "react";
import { notebookExtensions } from "@/editor/notebook-extensions";
import { outlineOf } from "@/editor/outline";
import { SpacetimeBlock } from "@/editor/spacetime-block";
import { Step } from "@/editor/step";
import { stepVerdictsKey, tallyVerdicts } from "@/editor/step-verdicts";
import { EditorToolbar } from "./editor-toolbar";
import { NotebookOutline, jumpTo } from "./notebook-outline";
import type { NotebookEditorLoaderProps } from "./notebook-editor-loader";
import { SaveIndicator } from "./save-indicator";
import { SpacetimeBlockView } from "./spacetime-block-view";
import { createNotebookChecker, type NotebookChecker } from "./step-checker-client";
import { StepView } from "./step-view";
import { useAutosave } from "./use-autosave";
import { useStepChecks } from "./use-step-checks";
import { VerdictSummary } from "./verdict-summary";

const EMPTY_NOTEBOOK: JSONContent = { type: "doc", content: [{ type: "paragraph" }] };

function withViews() {
  return notebookExtensions({
    step: Step.extend({
      addNodeView: () =>
        ReactNodeViewRenderer(StepView, {
          // The default re-renders only when the node changes; numbers and verdicts arrive as decorations.
          update: ({ oldNode, newNode, updateProps }) => {
            if (newNode.type !== oldNode.type) return false;
            updateProps();
            return true;
          },
        }),
    }),
    spacetimeBlock: SpacetimeBlock.extend({ addNodeView: () => ReactNodeViewRenderer(SpacetimeBlockView) }),
  });
}

/** Checks stored content against the schema before the editor sees it, so a damaged document is never overwritten. */
function openContent(initial: unknown): { content: JSONContent; problem: string | null } {
  if (initial === undefined || initial === null) return { content: EMPTY_NOTEBOOK, problem: null };
  try {
    getSchema(notebookExtensions()).nodeFromJSON(initial).check();
    return { content: initial as JSONContent, problem: null };
  } catch (cause) {
    return { content: EMPTY_NOTEBOOK, problem: cause instanceof Error ? cause.message : "unreadable content" };
  }
}

/**
 * The notebook editor: the reading column with steps and their verdict margin, the outline,
 * the verdict summary and the saved state. Readers and reviewers get it read-only.
 */
export function NotebookEditor({ notebookId, readOnly, initialContent, title }: NotebookEditorLoaderProps) {
  const opened = useMemo(() => openContent(initialContent), [initialContent]);
  const locked = readOnly || opened.problem !== null;
  // Made in an effect (not a memo) so a remount under React's strict mode gets a live worker.
  const [checker, setChecker] = useState<NotebookChecker | null>(null);
  useEffect(() => {
    const created = createNotebookChecker();
    setChecker(created);
    return () => created.dispose();
  }, []);
  const extensions = useMemo(() => withViews(), []);

  const editor = useEditor({
    extensions,
    content: opened.content,
    editable: !locked,
    immediatelyRender: false,
    editorProps: {
      attributes: {
        class: "notebook-prose prose-paper",
        "aria-label": title ? `Notebook text: ${title}` : "Notebook text",
        "aria-readonly": String(locked),
      },
    },
  });

  useStepChecks(editor, checker);
  const { state: saveState, saveNow } = useAutosave(editor, notebookId, !locked);

  const view = useEditorState({
    editor,
    selector: ({ editor: current }) => {
      if (!current) return null;
      const verdicts = stepVerdictsKey.getState(current.state)?.verdicts;
      let probabilistic = 0;
      for (const verdict of verdicts?.values() ?? []) {
        if (verdict.state === "answered" && verdict.answer.verdict === "verified" && verdict.answer.method.kind === "numeric") probabilistic += 1;
      }
      return { outline: outlineOf(current.state), tally: tallyVerdicts(current.state), probabilistic };
    },
  });

  if (!editor || !view) {
    return <p role="status" className="py-12 text-sm text-ink-muted">Opening the notebook…</p>;
  }

  const firstRefuted = view.outline.find((entry) => entry.kind === "step" && entry.verdict === "refuted");

  return (
    <div className="grid gap-6 lg:grid-cols-[12rem_minmax(0,1fr)]">
      <nav aria-label="Outline" className="lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
        <details className="lg:hidden">
          <summary className="cursor-pointer font-sans text-sm font-medium text-ink-soft">Outline</summary>
          <div className="mt-2">
            <NotebookOutline editor={editor} entries={view.outline} />
          </div>
        </details>
        <div className="hidden lg:block">
          <p className="mb-1 font-sans text-xs font-semibold uppercase tracking-wide text-ink-muted">Outline</p>
          <NotebookOutline editor={editor} entries={view.outline} />
        </div>
      </nav>

      <div className="min-w-0">
        <div className="sticky top-0 z-10 -mx-2 mb-4 space-y-2 border-b border-paper-edge bg-paper/95 px-2 py-2 backdrop-blur">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <VerdictSummary
              tally={view.tally}
              probabilistic={view.probabilistic}
              onJumpToRefuted={firstRefuted ? () => jumpTo(editor, firstRefuted.pos) : null}
            />
            {locked ? (
              <p className="font-sans text-xs text-ink-muted">{readOnly ? "Read-only: you can read and follow the verdicts." : "Opened read-only."}</p>
            ) : (
              <SaveIndicator state={saveState} onRetry={() => void saveNow()} />
            )}
          </div>
          {!locked ? <EditorToolbar editor={editor} /> : null}
        </div>

        {opened.problem ? (
          <p role="alert" className="mb-4 rounded-md border border-alarm bg-alarm-wash px-3 py-2 font-sans text-sm text-alarm">
            The stored text of this notebook does not fit the editor ({opened.problem}). It has been left untouched on the server and is not shown; nothing will be saved
            over it from this page.
          </p>
        ) : null}

        <EditorContent editor={editor} />
      </div>
    </div>
  );
}
