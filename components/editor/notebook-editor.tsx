"use client";

import "katex/dist/katex.min.css";
import "./notebook-editor.css";

import type { NodeViewRenderer } from "@tiptap/core";
import { EditorContent, ReactNodeViewRenderer, useEditor } from "@tiptap/react";
import { useEffect, useMemo, useState } from "react";
import { notebookExtensions } from "@/editor/notebook-extensions";
import { Figure } from "@/editor/figure";
import { SpacetimeBlock } from "@/editor/spacetime-block";
import { Step } from "@/editor/step";
import { EditorToolbar } from "./editor-toolbar";
import { NotebookOutline, jumpTo } from "./notebook-outline";
import type { NotebookEditorLoaderProps } from "./notebook-editor-loader";
import { CoAuthorList } from "./co-author-list";
import { LinkIndicator } from "./link-indicator";
import { FigureView } from "./figure-view";
import { SpacetimeBlockView } from "./spacetime-block-view";
import { createNotebookChecker, type NotebookChecker } from "./step-checker-client";
import { StepView } from "./step-view";
import { startedInStepChrome } from "./shadow-chrome";
import { updateStepView } from "./step-view-update";
import { useCollaboration, type Collaboration } from "./use-collaboration";
import { colorForUser } from "@/editor/collaboration";
import { useMediaQuery } from "@/components/ui/use-media-query";
import { useOutline } from "./use-outline";
import { useStepChecks } from "./use-step-checks";
import { useVerdictSummary } from "./use-verdict-summary";
import { VerdictSummary } from "./verdict-summary";
import { RemarksPanel, RemarksProvider } from "@/components/remarks/remarks-panel";

/**
 * The step's node view. Its default re-renders only when the node changes; numbers and
 * verdicts arrive as decorations, so every update goes through ours (see updateStepView).
 * Events from the step's controls reach ProseMirror retargeted to their shadow host, where the
 * default cannot tell a select from a margin; those are the controls' own.
 */
const renderStep = ReactNodeViewRenderer(StepView, { update: updateStepView });
const stepNodeView: NodeViewRenderer = (props) => {
  const view = renderStep(props);
  const ownStopEvent = view.stopEvent?.bind(view);
  view.stopEvent = (event: Event) => startedInStepChrome(event) || (ownStopEvent?.(event) ?? false);
  return view;
};

function withViews(session: Collaboration, me: { name: string; color: string }) {
  return notebookExtensions({
    collaboration: { document: session.doc },
    presence: { provider: session.provider, user: { ...me, status: "active" } },
    step: Step.extend({ addNodeView: () => stepNodeView }),
    spacetimeBlock: SpacetimeBlock.extend({ addNodeView: () => ReactNodeViewRenderer(SpacetimeBlockView) }),
    figure: Figure.extend({ addNodeView: () => ReactNodeViewRenderer(FigureView) }),
  });
}

/**
 * The notebook editor: the reading column with steps and their verdict margin, the outline,
 * the verdict summary and the saved state. Readers and reviewers get it read-only.
 */
export function NotebookEditor({ notebookId, readOnly, title, me }: NotebookEditorLoaderProps) {
  const myself = useMemo(() => ({ name: me.name || me.email, color: colorForUser(me.id) }), [me.id, me.name, me.email]);
  const session = useCollaboration(notebookId, myself);
  if (!session) return <p role="status" className="py-12 text-sm text-ink-muted">Opening the notebook…</p>;
  return <SharedNotebookEditor notebookId={notebookId} session={session} readOnly={readOnly} title={title} myself={myself} />;
}

/** The editor bound to an open shared document (see {@link useCollaboration}). */
function SharedNotebookEditor({
  notebookId,
  session,
  readOnly,
  title,
  myself,
}: {
  notebookId: string;
  session: Collaboration;
  readOnly: boolean;
  title?: string;
  myself: { name: string; color: string };
}) {
  const locked = readOnly || session.link.kind === "refused";
  // Made in an effect (not a memo) so a remount under React's strict mode gets a live worker.
  const [checker, setChecker] = useState<NotebookChecker | null>(null);
  useEffect(() => {
    const created = createNotebookChecker();
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the worker is an external resource made once per mount
    setChecker(created);
    return () => created.dispose();
  }, []);
  const { doc, provider } = session;
  // eslint-disable-next-line react-hooks/exhaustive-deps -- the document and provider identify the session
  const extensions = useMemo(() => withViews(session, myself), [doc, provider, myself]);

  const editor = useEditor({
    extensions,
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

  useEffect(() => {
    if (editor && !editor.isDestroyed && editor.isEditable === locked) editor.setEditable(!locked);
  }, [editor, locked]);
  useStepChecks(editor, checker);

  const summary = useVerdictSummary(editor);
  const outline = useOutline(editor);
  const wide = useMediaQuery("(min-width: 1024px)"); // Tailwind's lg

  if (!editor || !summary || !session.loaded) {
    return <p role="status" className="py-12 text-sm text-ink-muted">Opening the notebook…</p>;
  }

  const firstRefuted = outline.find((entry) => entry.kind === "step" && entry.verdict === "refuted");

  return (
    // Remarks: the side list beside the text on very wide screens, below it otherwise.
    <RemarksProvider notebookId={notebookId} editor={editor}>
      <div className="grid gap-6 lg:grid-cols-[12rem_minmax(0,1fr)] 2xl:grid-cols-[12rem_minmax(0,1fr)_22rem]">
        {/* One copy of the outline, not one per layout hidden by CSS: a long notebook's outline is thousands of elements. */}
        <nav aria-label="Outline" className="lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
          {wide ? (
            <div>
              <p className="mb-1 font-sans text-xs font-semibold uppercase tracking-wide text-ink-muted">Outline</p>
              <NotebookOutline editor={editor} entries={outline} />
            </div>
          ) : (
            <details>
              <summary className="cursor-pointer font-sans text-sm font-medium text-ink-soft">Outline</summary>
              <div className="mt-2">
                <NotebookOutline editor={editor} entries={outline} />
              </div>
            </details>
          )}
        </nav>

        <div className="min-w-0">
          <div className="sticky top-0 z-10 -mx-2 mb-4 space-y-2 border-b border-paper-edge bg-paper/95 px-2 py-2 backdrop-blur">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <VerdictSummary
                tally={summary.tally}
                probabilistic={summary.probabilistic}
                onJumpToRefuted={firstRefuted ? () => jumpTo(editor, firstRefuted.pos) : null}
              />
              <div className="flex flex-col items-end gap-1">
                {locked ? <p className="font-sans text-xs text-ink-muted">Read-only: you can read and follow the verdicts.</p> : null}
                <LinkIndicator link={session.link} stored={session.stored} readOnly={locked} />
              </div>
            </div>
            <CoAuthorList coAuthors={session.coAuthors} />
            {!locked ? <EditorToolbar editor={editor} /> : null}
          </div>

          <EditorContent editor={editor} />
        </div>
        <div className="lg:col-start-2 2xl:col-start-3 2xl:sticky 2xl:top-4 2xl:max-h-[calc(100vh-2rem)] 2xl:self-start 2xl:overflow-y-auto">
          <RemarksPanel canRequestReview={!locked} />
        </div>
      </div>
    </RemarksProvider>
  );
}
