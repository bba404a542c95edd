"use client";

import { useEffect, useId, useRef, useState, type FormEvent, type KeyboardEvent } from "react";
import type { Editor } from "@tiptap/core";
import type { LimitAgreement, LimitEstimateWire, LimitProbeAnswer, LimitSideReport, TermFate } from "@/cas/limit/protocol";
import { extractDerivation } from "@/editor/derivation";
import { defaultLimitChoice, planLimitProbe } from "@/editor/limit-probe-request";
import { Latex } from "@/components/spacetime/latex";
import { createNotebookChecker, type NotebookChecker } from "./step-checker-client";

// One checker for every open probe form, made on first use and let go when the last form closes,
// so probing a few steps does not start a worker each.
let shared: { checker: NotebookChecker; users: number } | null = null;

function acquireChecker(): NotebookChecker {
  shared ??= { checker: createNotebookChecker(), users: 0 };
  shared.users += 1;
  return shared.checker;
}

function releaseChecker(checker: NotebookChecker): void {
  if (!shared || shared.checker !== checker) return;
  shared.users -= 1;
  if (shared.users <= 0) {
    shared.checker.dispose();
    shared = null;
  }
}

/** One estimate in words, with the parameter and the scale in KaTeX. */
export function EstimateWords({ estimate, parameter }: { estimate: LimitEstimateWire; parameter: string }) {
  switch (estimate.kind) {
    case "converges":
      if (estimate.free) return <>does not involve <Latex source={parameter} />: stays as it is</>;
      if (estimate.constant) return <>tends to <Latex source={estimate.value} /></>;
      return <>tends to a finite value that depends on the other symbols (≈ {estimate.value} at the first sample point)</>;
    case "vanishes":
      return <>vanishes, like <Latex source={estimate.like} /></>;
    case "diverges":
      return <>grows without bound, like <Latex source={estimate.like} /></>;
    case "unclear":
      return <>unclear: {estimate.reason}</>;
  }
}

/** Each fate has a glyph as well as a word, so it reads without colour. */
const FATE: Record<TermFate, { glyph: string; word: string }> = {
  vanishes: { glyph: "↓0", word: "vanishes" },
  remains: { glyph: "=", word: "stays" },
  diverges: { glyph: "↑∞", word: "grows" },
  unclear: { glyph: "?", word: "unclear" },
};

const AGREEMENT: Record<LimitAgreement["same"], { glyph: string; words: string }> = {
  yes: { glyph: "✓", words: "same limit" },
  no: { glyph: "✕", words: "different limits" },
  unclear: { glyph: "?", words: "cannot tell" },
};

function Agreement({ title, agreement }: { title: string; agreement: LimitAgreement }) {
  const look = AGREEMENT[agreement.same];
  return (
    <div className={`mt-1 ${agreement.same === "no" ? "text-alarm" : ""}`}>
      <p className="font-medium">
        <span aria-hidden="true">{look.glyph} </span>
        {title}: {look.words}
      </p>
      <p className="text-ink-soft">{agreement.detail}</p>
      {agreement.witness ? (
        <dl className="mt-0.5 grid grid-cols-[auto_1fr] gap-x-2 font-mono text-[11px] text-ink-soft">
          {Object.entries(agreement.witness).map(([name, value]) => (
            <div key={name} className="contents">
              <dt>{name}</dt>
              <dd className="break-all">= {value}</dd>
            </div>
          ))}
        </dl>
      ) : null}
    </div>
  );
}

const SIDE_NAME: Record<LimitSideReport["side"], string> = { left: "Left side", right: "Right side", expression: "The expression" };

function SideReport({ side, parameter }: { side: LimitSideReport; parameter: string }) {
  return (
    <div className="mt-1.5">
      <p>
        <span className="font-medium">{SIDE_NAME[side.side]}</span> <EstimateWords estimate={side.estimate} parameter={parameter} />.
      </p>
      {side.terms.length > 1 ? (
        <ul className="mt-0.5 space-y-0.5" aria-label={`Terms of ${SIDE_NAME[side.side].toLowerCase()}`}>
          {side.terms.map((term, i) => (
            <li key={i} className="grid grid-cols-[2.5rem_minmax(0,1fr)] items-baseline gap-x-1">
              <span className="font-mono text-[11px]">
                <span aria-hidden="true">{FATE[term.fate].glyph} </span>
                {FATE[term.fate].word}
              </span>
              <span className="min-w-0 overflow-x-auto">
                <Latex source={term.latex} /> <span className="text-ink-soft">— <EstimateWords estimate={term.estimate} parameter={parameter} /></span>
              </span>
            </li>
          ))}
        </ul>
      ) : null}
      {side.limit !== undefined ? (
        <p className="mt-0.5 overflow-x-auto">
          In the limit: <Latex source={side.limit} />
        </p>
      ) : null}
    </div>
  );
}

/**
 * The answer of a limit probe in words and KaTeX: each side, each additive term's fate,
 * whether both sides tend to the same thing, notes, and always the plain statement that this
 * is a numeric estimate along a finite sequence, not a proof.
 */
export function LimitProbeResult({ answer }: { answer: LimitProbeAnswer }) {
  const arrow = answer.target === "infinity" ? "\\infty" : answer.target;
  return (
    <div className="mt-1 text-xs leading-snug">
      <p className="font-medium">
        As <Latex source={`${answer.parameter} \\to ${arrow}`} />:
      </p>
      {answer.sides.map((side) => (
        <SideReport key={side.side} side={side} parameter={answer.parameter} />
      ))}
      {answer.relation ? <Agreement title="Both sides" agreement={answer.relation} /> : null}
      {answer.expected ? <Agreement title="Expected form" agreement={answer.expected} /> : null}
      {answer.notes.map((note, i) => (
        <p key={i} className="mt-1 text-ink-soft">
          {note}
        </p>
      ))}
      <p className="mt-1.5 border-t border-dashed border-paper-edge pt-1 italic text-ink-muted">
        Estimate, not proof: {answer.note}
      </p>
    </div>
  );
}

type ProbeRun =
  | { readonly state: "idle" }
  | { readonly state: "running" }
  | { readonly state: "done"; readonly answer: LimitProbeAnswer }
  | { readonly state: "failed"; readonly message: string };

/**
 * The margin's "Probe a limit": a small form (symbol, ∞ or a value) that runs the limit
 * probe of this step's relation in the checker's worker and shows the answer. It reads the
 * document and changes nothing, so every role gets it.
 */
export function LimitProbe({ editor, stepId, stepNumber, kind, detail }: { editor: Editor; stepId: string | null; stepNumber: number | null; kind: string; detail: string }) {
  const formId = useId();
  const [open, setOpen] = useState(false);
  const [parameter, setParameter] = useState("c");
  const [toInfinity, setToInfinity] = useState(true);
  const [value, setValue] = useState("0");
  const [run, setRun] = useState<ProbeRun>({ state: "idle" });
  const toggle = useRef<HTMLButtonElement>(null);
  const first = useRef<HTMLInputElement>(null);
  const checker = useRef<NotebookChecker | null>(null);
  const current = useRef<AbortController | null>(null);

  useEffect(() => {
    if (!open) return;
    const made = acquireChecker();
    checker.current = made;
    first.current?.focus();
    return () => {
      current.current?.abort();
      current.current = null;
      checker.current = null;
      releaseChecker(made);
    };
  }, [open]);

  if (!stepId) return null;
  const label = `step ${stepNumber ?? ""}`;

  const openForm = () => {
    // Start from the step's own "limit … → …" justification when it has one.
    const choice = defaultLimitChoice(kind, detail);
    setParameter(choice.parameter);
    setToInfinity(choice.target === "infinity");
    if (choice.target !== "infinity") setValue(choice.target);
    setRun({ state: "idle" });
    setOpen(true);
  };

  const close = () => {
    setOpen(false);
    toggle.current?.focus();
  };

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const plan = planLimitProbe(extractDerivation(editor.getJSON()), stepId, { parameter, target: toInfinity ? "infinity" : value });
    if ("notProbed" in plan) return setRun({ state: "failed", message: plan.notProbed });
    const made = checker.current;
    if (!made) return;
    current.current?.abort();
    const controller = new AbortController();
    current.current = controller;
    setRun({ state: "running" });
    const result = await made.probeLimit(plan.request, controller.signal);
    if (current.current !== controller) return; // cancelled, closed or superseded
    current.current = null;
    if ("error" in result) setRun({ state: "failed", message: result.error.message });
    else setRun({ state: "done", answer: result });
  };

  const cancel = () => {
    current.current?.abort();
    current.current = null;
    setRun({ state: "idle" });
  };

  const onKeyDown = (event: KeyboardEvent<HTMLElement>) => {
    if (event.key === "Escape") {
      event.preventDefault();
      close();
    }
  };

  const field = "rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono";
  const button = "rounded border border-paper-edge bg-paper px-1.5 py-0.5 hover:text-ink";
  return (
    <div className="mt-1 font-sans text-xs text-ink-soft">
      <button
        ref={toggle}
        type="button"
        onClick={() => (open ? close() : openForm())}
        aria-expanded={open}
        aria-controls={open ? formId : undefined}
        aria-label={`Probe a limit of ${label}`}
        className={`${button} inline-flex items-center gap-1`}
      >
        <span aria-hidden="true">lim</span> probe a limit
      </button>
      {open ? (
        <section id={formId} aria-label={`Limit probe of ${label}`} onKeyDown={onKeyDown} className="mt-1 rounded border border-paper-edge bg-paper-deep p-1.5">
          <form onSubmit={submit} className="flex flex-wrap items-center gap-x-2 gap-y-1">
            <label className="flex items-center gap-1">
              <span>symbol</span>
              <input ref={first} value={parameter} onChange={(e) => setParameter(e.target.value)} size={4} spellCheck={false} className={field} aria-label={`Symbol that goes to the limit (${label})`} />
            </label>
            <fieldset className="flex flex-wrap items-center gap-1">
              <legend className="sr-only">Where it goes</legend>
              <span aria-hidden="true">→</span>
              <label className="flex items-center gap-0.5">
                <input type="radio" name={`${formId}-to`} checked={toInfinity} onChange={() => setToInfinity(true)} />
                <span>∞</span>
                <span className="sr-only">infinity</span>
              </label>
              <label className="flex items-center gap-0.5">
                <input type="radio" name={`${formId}-to`} checked={!toInfinity} onChange={() => setToInfinity(false)} />
                <span className="sr-only">the value</span>
                <input value={value} onChange={(e) => setValue(e.target.value)} onFocus={() => setToInfinity(false)} size={3} spellCheck={false} className={field} aria-label={`Value it goes to (${label})`} />
              </label>
            </fieldset>
            {run.state === "running" ? (
              <button type="button" onClick={cancel} className={button}>
                Cancel
              </button>
            ) : (
              <button type="submit" className={button}>
                Probe
              </button>
            )}
            <button type="button" onClick={close} className={button} aria-label={`Close the limit probe of ${label}`}>
              Close
            </button>
          </form>
          <div role="status" aria-live="polite">
            {run.state === "running" ? <p className="mt-1">Probing along a sequence of values in the background…</p> : null}
            {run.state === "failed" ? (
              <p className="mt-1 text-alarm">
                <span aria-hidden="true">✕ </span>Could not probe: {run.message}
              </p>
            ) : null}
            {run.state === "done" ? <LimitProbeResult answer={run.answer} /> : null}
          </div>
        </section>
      ) : null}
    </div>
  );
}
