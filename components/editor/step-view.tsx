"use client";

import { NodeViewContent, NodeViewWrapper, type ReactNodeViewProps } from "@tiptap/react";
import { useMemo, useRef, useState } from "react";
import { renderLatex } from "@/editor/katex-render";
import { JUSTIFICATION_DETAIL_HINT, JUSTIFICATION_KINDS, type JustificationKind } from "@/editor/step";
import { stepNumberingFromDecorations, stepNumberingKey } from "@/editor/step-numbering";
import { verdictFromDecorations, verdictWord } from "@/editor/step-verdicts";
import { VerdictMark } from "./verdict-mark";
import { StepRemarkButton } from "@/components/remarks/remark-actions";
import { LimitProbe } from "./limit-probe";
import { KatexShadow } from "./katex-shadow";
import { ShadowChrome } from "./shadow-chrome";
import { useNearViewport } from "./use-near-viewport";

const KIND_LABEL: Record<JustificationKind, string> = {
  algebra: "algebra",
  substitute: "substitute",
  differentiate: "differentiate by",
  "euler-lagrange": "Euler–Lagrange in",
  limit: "limit",
  definition: "definition",
};

/** "3 5" → "(3), (5)". */
function citationList(numbers: string): string {
  return numbers.split(" ").filter(Boolean).map((n) => `(${n})`).join(", ");
}

/** Reads typed step numbers ("3, 5") into ids using the numbering of this moment. */
function idsForNumbers(text: string, numbers: ReadonlyMap<string, number>): { ids: string[]; unknown: string[] } {
  const byNumber = new Map([...numbers].map(([id, n]) => [n, id]));
  const ids: string[] = [];
  const unknown: string[] = [];
  for (const token of text.split(/[\s,;()]+/).filter(Boolean)) {
    const id = byNumber.get(Number(token));
    if (id) ids.push(id);
    else unknown.push(token);
  }
  return { ids, unknown };
}

/**
 * A step in the editor: its number, the KaTeX rendering of its relation above the LaTeX
 * source, its justification (editable by authors), and the verdict margin beside it.
 * Far from the screen the preview and the justification controls wait (useNearViewport); the
 * number, source, verdict and margin buttons are always there.
 */
export function StepView({ node, decorations, editor, updateAttributes }: ReactNodeViewProps) {
  const wrapper = useRef<HTMLDivElement>(null);
  const near = useNearViewport(wrapper);
  const numbering = stepNumberingFromDecorations(decorations);
  const verdict = verdictFromDecorations(decorations);
  const word = verdictWord(verdict ?? undefined);
  const relation = node.textContent;
  // The source line below is the step's readable text, so the preview is a visual copy only.
  const rendered = useMemo(() => (near && relation.trim() ? renderLatex(relation, true, { visualOnly: true }) : null), [near, relation]);
  const editable = editor.isEditable;
  const kind = node.attrs.kind as JustificationKind;
  const id = node.attrs.id as string | null;
  const [citeText, setCiteText] = useState<string | null>(null);
  const [citeProblem, setCiteProblem] = useState<string | null>(null);

  const commitCites = (field: "cites" | "follows", text: string) => {
    const numbers = stepNumberingKey.getState(editor.state)?.numbers ?? new Map<string, number>();
    const { ids, unknown } = idsForNumbers(text, numbers);
    const own = numbering.stepNumber;
    const earlier = ids.filter((citedId) => (numbers.get(citedId) ?? Infinity) < (own ?? Infinity));
    setCiteProblem(unknown.length || earlier.length < ids.length ? "Only earlier step numbers can be cited." : null);
    if (field === "cites") updateAttributes({ cites: earlier });
    else updateAttributes({ follows: earlier[0] ?? null });
  };

  const detailHtml = useMemo(() => (near && node.attrs.detail ? renderLatex(node.attrs.detail, false).html : null), [near, node.attrs.detail]);
  const justificationTail = [
    numbering.citedNumbers ? ` using ${citationList(numbering.citedNumbers)}` : "",
    numbering.followsNumber ? ` from (${numbering.followsNumber})` : "",
  ].join("");

  return (
    <NodeViewWrapper
      ref={wrapper}
      as="div"
      id={id ? `step-${id}` : undefined}
      data-verdict={word}
      className="step-view group relative my-3 grid grid-cols-[2.75rem_minmax(0,1fr)] gap-x-3 rounded-md py-1 md:grid-cols-[2.75rem_minmax(0,1fr)_12rem]"
      aria-label={`Step ${numbering.stepNumber ?? ""}, ${word}`}
    >
      <div contentEditable={false} className="select-none pt-2 text-right font-serif text-ink-muted tabular-nums">
        ({numbering.stepNumber ?? "?"})
      </div>

      <div className={`min-w-0 border-l-2 pl-3 ${word === "refuted" ? "border-alarm" : "border-paper-edge"}`}>
        <div contentEditable={false} className={near ? "math-preview overflow-x-auto" : "math-preview-waiting"}>
          {rendered ? (
            <KatexShadow html={rendered.html} />
          ) : near || !relation.trim() ? (
            <p className="py-2 font-sans text-sm italic text-ink-muted">Empty step — type a relation in LaTeX below.</p>
          ) : null}
          {rendered?.error ? (
            <p role="status" className="font-sans text-xs text-alarm">
              LaTeX error: {rendered.error}
            </p>
          ) : null}
        </div>
        <NodeViewContent<"pre"> as="pre" className="math-source" spellCheck={false} aria-label={`LaTeX source of step ${numbering.stepNumber ?? ""}`} />

        <ShadowChrome className="mt-1 font-sans text-xs text-ink-soft">
          {editable && near ? (
            <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
              <label className="flex items-center gap-1">
                <span className="text-ink-muted">by</span>
                <select
                  value={kind}
                  onChange={(event) => updateAttributes({ kind: event.target.value })}
                  className="rounded border border-paper-edge bg-paper px-1 py-0.5"
                  aria-label={`Justification of step ${numbering.stepNumber ?? ""}`}
                >
                  {JUSTIFICATION_KINDS.map((k) => (
                    <option key={k} value={k}>
                      {KIND_LABEL[k]}
                    </option>
                  ))}
                </select>
              </label>
              {JUSTIFICATION_DETAIL_HINT[kind] ? (
                <input
                  value={node.attrs.detail}
                  onChange={(event) => updateAttributes({ detail: event.target.value })}
                  placeholder={JUSTIFICATION_DETAIL_HINT[kind]}
                  aria-label={`Justification detail of step ${numbering.stepNumber ?? ""}`}
                  className="min-w-[10rem] flex-1 rounded border border-paper-edge bg-paper px-1.5 py-0.5 font-mono"
                />
              ) : null}
              <label className="flex items-center gap-1">
                <span className="text-ink-muted">cites</span>
                <input
                  value={citeText ?? numbering.citedNumbers.replace(/ /g, ", ")}
                  onFocus={() => setCiteText(numbering.citedNumbers.replace(/ /g, ", "))}
                  onChange={(event) => setCiteText(event.target.value)}
                  onBlur={(event) => {
                    commitCites("cites", event.target.value);
                    setCiteText(null);
                  }}
                  onKeyDown={(event) => {
                    if (event.key === "Enter") event.currentTarget.blur();
                  }}
                  placeholder="3, 5"
                  size={6}
                  aria-label={`Steps cited by step ${numbering.stepNumber ?? ""} (numbers)`}
                  className="rounded border border-paper-edge bg-paper px-1.5 py-0.5 tabular-nums"
                />
              </label>
              <label className="flex items-center gap-1">
                <span className="text-ink-muted">from</span>
                <input
                  key={numbering.followsNumber ?? "previous"}
                  defaultValue={numbering.followsNumber ?? ""}
                  onBlur={(event) => commitCites("follows", event.target.value)}
                  onKeyDown={(event) => {
                    if (event.key === "Enter") event.currentTarget.blur();
                  }}
                  placeholder="prev."
                  size={4}
                  aria-label={`Step that step ${numbering.stepNumber ?? ""} follows from (number; empty for the previous step)`}
                  className="rounded border border-paper-edge bg-paper px-1.5 py-0.5 tabular-nums"
                />
              </label>
              {citeProblem ? <span className="text-alarm">{citeProblem}</span> : null}
            </div>
          ) : (
            <p className="italic">
              by {KIND_LABEL[kind]}
              {detailHtml ? (
                <>
                  {" "}
                  <span className="not-italic" dangerouslySetInnerHTML={{ __html: detailHtml }} />
                </>
              ) : null}
              {justificationTail}
            </p>
          )}
        </ShadowChrome>
      </div>

      <ShadowChrome as="aside" className="col-start-2 mt-1 border-l border-dashed border-paper-edge pl-3 md:col-start-3 md:mt-0 md:pt-2" label={`Verdict of step ${numbering.stepNumber ?? ""}`}>
        <VerdictMark verdict={verdict} stepNumber={numbering.stepNumber} />
        <StepRemarkButton stepId={id} stepNumber={numbering.stepNumber} />
        <LimitProbe editor={editor} stepId={id} stepNumber={numbering.stepNumber} kind={kind} detail={node.attrs.detail} />
      </ShadowChrome>
    </NodeViewWrapper>
  );
}
