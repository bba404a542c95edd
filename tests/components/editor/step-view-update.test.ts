import { describe, expect, it } from "vitest";
import { Decoration } from "@tiptap/pm/view";
import type { CheckAnswer } from "@/cas/check/protocol";
import { onlyTextOrTurnedPending } from "@/components/editor/step-view-update";
import type { StepVerdict } from "@/editor/step-verdicts";

const verified: CheckAnswer = { verdict: "verified", method: { kind: "symbolic", detail: "expanded" } };
const numbering = (stepNumber: number) => Decoration.node(0, 5, {}, { stepNumber, citedNumbers: "", followsNumber: null });
const verdict = (v: StepVerdict | null) => Decoration.node(0, 5, {}, { verdict: v });

describe("onlyTextOrTurnedPending", () => {
  it("lets a step whose verdict just went back to pending wait for the pause", () => {
    expect(onlyTextOrTurnedPending([numbering(3), verdict({ state: "answered", answer: verified })], [numbering(3), verdict({ state: "pending", previous: verified })])).toBe(true);
    expect(onlyTextOrTurnedPending([numbering(3), verdict(null)], [numbering(3), verdict(null)])).toBe(true);
  });

  it("re-renders at once for a new number, an answer, or a different set of decorations", () => {
    expect(onlyTextOrTurnedPending([numbering(3), verdict(null)], [numbering(4), verdict(null)])).toBe(false);
    expect(onlyTextOrTurnedPending([numbering(3), verdict({ state: "pending" })], [numbering(3), verdict({ state: "answered", answer: verified })])).toBe(false);
    expect(onlyTextOrTurnedPending([numbering(3)], [numbering(3), verdict(null)])).toBe(false);
  });
});
