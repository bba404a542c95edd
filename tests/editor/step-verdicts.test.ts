import { describe, expect, it } from "vitest";
import type { CheckAnswer } from "@/cas/check/protocol";
import { stepVerdictsKey, tallyVerdicts, verdictWord } from "@/editor/step-verdicts";
import { doc, headlessEditor, step } from "./support/headless";

const verified: CheckAnswer = { verdict: "verified", method: { kind: "symbolic", detail: "expanded" } };
const refuted: CheckAnswer = { verdict: "refuted", method: { kind: "numeric", points: 8, digits: 30 }, witness: { r: "2.5" } };

describe("step verdicts", () => {
  it("records verdicts by step id and tallies them", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c"), step("st-c", "c=d"), step("st-d", "")));
    editor.commands.setStepVerdicts([
      ["st-a", { state: "answered", answer: verified }],
      ["st-b", { state: "answered", answer: refuted }],
      ["st-c", { state: "failed", error: { code: "bad_request:cas", message: "unknown command \\foo" } }],
      ["st-d", { state: "not-checked", reason: "empty" }],
    ]);
    expect(verdictWord(stepVerdictsKey.getState(editor.state)!.verdicts.get("st-b"))).toBe("refuted");
    expect(tallyVerdicts(editor.state)).toEqual({ verified: 1, refuted: 1, undecided: 1, pending: 0, notChecked: 1 });
  });

  it("puts an edited step back to pending at once, keeping its old answer as previous", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c")));
    editor.commands.setStepVerdicts([["st-a", { state: "answered", answer: verified }], ["st-b", { state: "answered", answer: verified }]]);
    editor.view.dispatch(editor.state.tr.insertText("x", 2));
    const verdicts = stepVerdictsKey.getState(editor.state)!.verdicts;
    expect(verdicts.get("st-a")).toEqual({ state: "pending", previous: verified });
    expect(verdicts.get("st-b")).toEqual({ state: "answered", answer: verified });
  });

  it("counts a step without any verdict yet as pending, and forgets deleted steps in the tally", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c")));
    editor.commands.setStepVerdicts([["st-b", { state: "answered", answer: refuted }]]);
    editor.view.dispatch(editor.state.tr.delete(editor.state.doc.child(0).nodeSize, editor.state.doc.content.size));
    expect(tallyVerdicts(editor.state)).toEqual({ verified: 0, refuted: 0, undecided: 0, pending: 1, notChecked: 0 });
  });

  it("never writes verdicts into the document", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b")));
    editor.view.dispatch(editor.state.tr); // let the starter kit add its trailing paragraph first
    const before = JSON.stringify(editor.getJSON());
    editor.commands.setStepVerdicts([["st-a", { state: "answered", answer: refuted }]]);
    expect(JSON.stringify(editor.getJSON())).toBe(before);
  });

  it("replaces only the changed steps' marks, and they say what a full rebuild would say", () => {
    const editor = headlessEditor(doc(step("st-a", "a=b"), step("st-b", "b=c"), step("st-c", "c=d")));
    editor.commands.setStepVerdicts([["st-a", { state: "answered", answer: verified }], ["st-b", { state: "answered", answer: verified }], ["st-c", { state: "answered", answer: refuted }]]);
    const marks = () => stepVerdictsKey.getState(editor.state)!.decorations.find();
    const untouched = marks().find((mark) => (mark.spec as { stepId: string }).stepId === "st-c");
    editor.view.dispatch(editor.state.tr.insertText("x", 2)); // the first keystroke in st-a
    editor.commands.setStepVerdicts([["st-b", { state: "answered", answer: refuted }]]); // an answer for st-b
    const now = marks().sort((x, y) => x.from - y.from);
    expect(now.map((mark) => [mark.from, mark.to, (mark as unknown as { type: { attrs: Record<string, string> } }).type.attrs["data-verdict"]])).toEqual(
      [0, 1, 2].map((index) => {
        let from = 0;
        for (let i = 0; i < index; i++) from += editor.state.doc.child(i).nodeSize;
        return [from, from + editor.state.doc.child(index).nodeSize, ["pending", "refuted", "refuted"][index]];
      }),
    );
    expect(now[2].spec).toBe(untouched!.spec); // st-c's mark was mapped, not rebuilt
  });
});
