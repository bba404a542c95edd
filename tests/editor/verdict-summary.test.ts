import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { CheckAnswer } from "@/cas/check/protocol";
import { followVerdictSummary, type VerdictSummaryFigures } from "@/editor/verdict-summary";
import { doc, headlessEditor, step } from "./support/headless";

const symbolic: CheckAnswer = { verdict: "verified", method: { kind: "symbolic", detail: "expanded" } };
const numeric: CheckAnswer = { verdict: "verified", method: { kind: "numeric", points: 8, digits: 30 } };

describe("followVerdictSummary", () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  const setup = () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c")));
    const shown: VerdictSummaryFigures[] = [];
    const stop = followVerdictSummary(editor, (summary) => shown.push(summary), 250);
    return { editor, shown, stop };
  };

  it("shows the counts at once, and the checker's verdicts as they arrive, naming those that rest on probing", () => {
    const { editor, shown } = setup();
    expect(shown.at(-1)?.tally).toMatchObject({ verified: 0, pending: 2 });
    editor.commands.setStepVerdicts([["st-a", { state: "answered", answer: symbolic }], ["st-b", { state: "answered", answer: numeric }]]);
    expect(shown.at(-1)).toEqual({ tally: { verified: 2, refuted: 0, undecided: 0, pending: 0, notChecked: 0 }, probabilistic: 1 });
  });

  it("shows a step turned pending by typing only once typing pauses, and not again per keystroke", () => {
    const { editor, shown } = setup();
    editor.commands.setStepVerdicts([["st-a", { state: "answered", answer: symbolic }], ["st-b", { state: "answered", answer: symbolic }]]);
    const before = shown.length;
    for (let i = 0; i < 5; i += 1) {
      editor.view.dispatch(editor.state.tr.insertText("x", 2));
      vi.advanceTimersByTime(100);
    }
    expect(shown.length).toBe(before);
    vi.advanceTimersByTime(250);
    expect(shown.length).toBe(before + 1);
    expect(shown.at(-1)?.tally).toMatchObject({ verified: 1, pending: 1 });
  });

  it("does not show a typed change early when a transaction without an answer (a caret) comes between keystrokes", () => {
    const { editor, shown } = setup();
    editor.commands.setStepVerdicts([["st-a", { state: "answered", answer: symbolic }]]);
    const before = shown.length;
    editor.view.dispatch(editor.state.tr.insertText("x", 2));
    editor.view.dispatch(editor.state.tr.setMeta("a caret moved", true));
    expect(shown.length).toBe(before);
    vi.advanceTimersByTime(250);
    expect(shown.at(-1)?.tally).toMatchObject({ verified: 0, pending: 2 });
  });

  it("stops following when asked", () => {
    const { editor, shown, stop } = setup();
    stop();
    const before = shown.length;
    editor.commands.setStepVerdicts([["st-a", { state: "answered", answer: symbolic }]]);
    editor.view.dispatch(editor.state.tr.insertText("x", 2));
    vi.advanceTimersByTime(1000);
    expect(shown.length).toBe(before);
  });
});
