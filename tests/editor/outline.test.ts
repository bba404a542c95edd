import { describe, expect, it } from "vitest";
import { outlineOf } from "@/editor/outline";
import { doc, headlessEditor, paragraph, step } from "./support/headless";

describe("outlineOf", () => {
  it("lists sections, spacetime blocks and numbered steps with their verdict words", () => {
    const editor = headlessEditor(
      doc(
        { type: "heading", attrs: { level: 2 }, content: [{ type: "text", text: "Orbits" }] },
        { type: "spacetimeBlock", attrs: { id: "sb", name: "exterior" } },
        step("st-a", "a=b"),
        paragraph({ type: "text", text: "so" }),
        step("st-b", "b=c"),
      ),
    );
    editor.commands.setStepVerdicts([["st-b", { state: "answered", answer: { verdict: "refuted", method: { kind: "numeric", points: 5, digits: 30 } } }]]);
    const outline = outlineOf(editor.state).map((e) => (e.kind === "step" ? [e.kind, e.number, e.verdict] : e.kind === "section" ? [e.kind, e.text] : [e.kind, e.name]));
    expect(outline).toEqual([["section", "Orbits"], ["spacetime", "exterior"], ["step", 1, "pending"], ["step", 2, "refuted"]]);
  });
});
