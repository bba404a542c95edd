"use client";

import type { Editor } from "@tiptap/react";
import { createContext, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import { stepNumberingKey } from "@/editor/step-numbering";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { RemarkActionsContext, type RemarkActions } from "./remark-actions";
import { bindingOf, encodeSpan, findStep, resolveSpan, stepAround } from "./remark-anchor";
import { RemarkForm } from "./remark-form";
import { RemarkThreadView } from "./remark-thread";
import { RemarksTable, type RemarkRow } from "./remarks-table";
import { ReviewRequestForm } from "./review-request-form";
import { useQuietVersion } from "@/components/editor/use-quiet-version";
import { useChangeRemark, useCreateRemark, useRemarks, type RemarkAnchor, type RemarkThread } from "./use-remarks";

type PanelState = {
  notebookId: string;
  editor: Editor;
  draft: RemarkAnchor | null;
  setDraft: (anchor: RemarkAnchor | null) => void;
};
const PanelContext = createContext<PanelState | null>(null);

/**
 * Holds the remarks of one notebook for the editor's step buttons (through
 * RemarkActionsContext) and for the side list. Wrap the editor and the panel in it.
 */
export function RemarksProvider({ notebookId, editor, children }: { notebookId: string; editor: Editor; children: ReactNode }) {
  const remarks = useRemarks(notebookId);
  const [draft, setDraft] = useState<RemarkAnchor | null>(null);
  const canRemark = remarks.data?.permissions.remark ?? false;

  const actions = useMemo<RemarkActions>(() => {
    const openByStep = new Map<string, number>();
    for (const thread of remarks.data?.threads ?? []) {
      if (!thread.settled && thread.anchor.stepId) openByStep.set(thread.anchor.stepId, (openByStep.get(thread.anchor.stepId) ?? 0) + 1);
    }
    return { canRemark, openByStep, remarkOnStep: (stepId) => setDraft({ stepId }) };
  }, [remarks.data, canRemark]);

  return (
    <RemarkActionsContext.Provider value={actions}>
      <PanelContext.Provider value={{ notebookId, editor, draft, setDraft }}>{children}</PanelContext.Provider>
    </RemarkActionsContext.Provider>
  );
}

/** Where a thread points, in words, and whether its anchor is still in the text. */
function locate(editor: Editor, thread: RemarkThread): { order: number; where: string; range: { from: number; to: number } | null; found: boolean } {
  const numbers = stepNumberingKey.getState(editor.state)?.numbers;
  const binding = bindingOf(editor.state);
  const span = thread.anchor.span && binding ? resolveSpan(binding, thread.anchor.span) : null;
  const stepId = thread.anchor.stepId ?? (span ? stepAround(editor.state.doc, span.from) : null);
  const number = stepId ? numbers?.get(stepId) : undefined;
  const step = stepId ? findStep(editor.state.doc, stepId) : null;
  const range = span ?? (step ? { from: step.pos + 1, to: step.pos + step.node.nodeSize - 1 } : null);
  const where = number ? `step ${number}` : thread.anchor.span ? "the text" : "a deleted step";
  return { order: number ?? Number.MAX_SAFE_INTEGER, where, range, found: Boolean(range) };
}

/** The side list: new remark form, the threads table, the opened thread, and the review request form. */
export function RemarksPanel({ canRequestReview }: { canRequestReview: boolean }) {
  const panel = useContext(PanelContext);
  if (!panel) throw new Error("RemarksPanel needs a RemarksProvider around it.");
  const { notebookId, editor, draft, setDraft } = panel;
  const remarks = useRemarks(notebookId);
  const create = useCreateRemark(notebookId);
  const change = useChangeRemark(notebookId);
  const [openId, setOpenId] = useState<string | null>(null);
  const [hint, setHint] = useState<string | null>(null);
  const draftRef = useRef<HTMLDivElement>(null);
  const threads = useMemo(() => remarks.data?.threads ?? [], [remarks.data]);
  const permissions = remarks.data?.permissions ?? { remark: false, settle: false };

  // Where each thread is depends on the live text; recomputed when threads change or the text
  // has been still for a moment (not per keystroke).
  const docVersion = useQuietVersion(editor, "update", 300);
  const located = useMemo(() => new Map(threads.map((t) => [t.id, locate(editor, t)])), [threads, editor, docVersion]); // eslint-disable-line react-hooks/exhaustive-deps

  const rows: RemarkRow[] = useMemo(
    () =>
      threads.map((t) => ({
        id: t.id,
        order: located.get(t.id)?.order ?? Number.MAX_SAFE_INTEGER,
        where: located.get(t.id)?.where ?? "",
        excerpt: t.body.length > 90 ? `${t.body.slice(0, 90)}…` : t.body,
        authorId: t.author?.id ?? "",
        authorName: t.author?.name || t.author?.email || "a former member",
        status: t.settled ? "settled" : "open",
        replies: t.replies.length,
        updatedAt: t.updatedAt,
      })),
    [threads, located],
  );

  useEffect(() => {
    if (draft) draftRef.current?.scrollIntoView({ block: "nearest" });
  }, [draft]);

  const remarkOnSelection = () => {
    const { from, to } = editor.state.selection;
    const binding = bindingOf(editor.state);
    if (from === to || !binding) {
      setHint("Select some text in the notebook first, or use a step's remark button.");
      return;
    }
    setHint(null);
    const quote = editor.state.doc.textBetween(from, to, " ").slice(0, 500);
    setDraft({ stepId: stepAround(editor.state.doc, from) ?? undefined, span: encodeSpan(binding, from, to), quote });
  };

  const show = (id: string) => {
    const range = located.get(id)?.range;
    if (!range) return;
    editor.chain().setTextSelection(range).scrollIntoView().run();
  };

  const draftWhere = draft ? (draft.stepId ? `step ${stepNumberingKey.getState(editor.state)?.numbers.get(draft.stepId) ?? "?"}` : "the selected text") : "";
  const openThread = threads.find((t) => t.id === openId) ?? null;

  return (
    <section id="remarks" aria-labelledby="remarks-title" className="space-y-3 font-sans">
      <div className="flex items-baseline justify-between gap-2">
        <h2 id="remarks-title" className="font-serif text-lg font-semibold">
          Remarks
        </h2>
        {permissions.remark ? (
          <Button tone="quiet" className="px-2 py-1 text-xs" onMouseDown={(event) => event.preventDefault()} onClick={remarkOnSelection}>
            Remark on the selected text
          </Button>
        ) : null}
      </div>
      {hint ? <Notice>{hint}</Notice> : null}
      {remarks.isError ? <Notice kind="problem">{remarks.error.message}</Notice> : null}

      {draft && permissions.remark ? (
        <div ref={draftRef} className="rounded-md border border-accent bg-accent-wash/40 p-3">
          <p className="mb-1 text-sm font-medium">New remark on {draftWhere}</p>
          {draft.quote ? <blockquote className="mb-2 border-l-2 border-paper-edge pl-2 font-mono text-xs text-ink-soft">{draft.quote}</blockquote> : null}
          <RemarkForm
            label="Remark"
            formLabel="New remark"
            submitLabel="Post the remark"
            problem={create.error?.message ?? null}
            onCancel={() => setDraft(null)}
            onSubmit={async (body) => {
              const thread = await create.mutateAsync({ body, anchor: draft });
              setDraft(null);
              setOpenId(thread.id);
            }}
          />
        </div>
      ) : null}

      {remarks.isPending ? <p role="status" className="text-sm text-ink-muted">Loading remarks…</p> : <RemarksTable rows={rows} selectedId={openId} onOpen={setOpenId} />}

      {openThread ? (
        <RemarkThreadView
          thread={openThread}
          where={located.get(openThread.id)?.where ?? "the text"}
          anchorFound={located.get(openThread.id)?.found ?? false}
          canReply={permissions.remark}
          canSettle={permissions.settle}
          busy={change.isPending}
          problem={change.error?.message ?? null}
          onShow={() => show(openThread.id)}
          onClose={() => setOpenId(null)}
          onReply={(body) => change.mutateAsync({ id: openThread.id, action: "reply", body })}
          onSettle={(settle) => change.mutate({ id: openThread.id, action: settle ? "settle" : "reopen" })}
        />
      ) : null}

      {canRequestReview ? <ReviewRequestForm notebookId={notebookId} /> : null}
    </section>
  );
}
