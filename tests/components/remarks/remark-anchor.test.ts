// Remark anchors are Yjs relative positions: they must follow their words through edits.
import { getSchema } from "@tiptap/core";
import { initProseMirrorDoc } from "@tiptap/y-tiptap";
import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import { encodeSpan, findStep, resolveSpan, stepAround, type YBinding } from "@/components/remarks/remark-anchor";
import { writeJSONToYDoc } from "@/editor/collaboration";
import { notebookExtensions } from "@/editor/notebook-extensions";
import { doc, paragraph, step } from "../../editor/support/headless";

const schema = getSchema(notebookExtensions());
const slip = "- \\frac{L^2 r_Q^2}{2\\mu r^4}";
const content = doc(
  paragraph({ type: "text", text: "Written out, the charge adds a repulsive term." }),
  step("vr16", "\\frac{1}{2}\\mu\\dot r^2 + V = E"),
  step("vr17", `V = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} ${slip}`),
);

/** A ProseMirror view of the Y.Doc as a client would hold it, with y-tiptap's mapping. */
function bind(ydoc: Y.Doc): YBinding & { pm: ReturnType<typeof initProseMirrorDoc>["doc"] } {
  const type = ydoc.getXmlFragment("notebook");
  const { doc: pm, mapping } = initProseMirrorDoc(type, schema);
  return { doc: ydoc, type, mapping, pm };
}

/** ProseMirror range of the first occurrence of `text`. */
function rangeOf(pm: YBinding & { pm: ReturnType<typeof initProseMirrorDoc>["doc"] }, text: string) {
  let range: { from: number; to: number } | null = null;
  pm.pm.descendants((node, pos) => {
    if (range || !node.isText) return !range;
    const at = node.text!.indexOf(text);
    if (at >= 0) range = { from: pos + at, to: pos + at + text.length };
    return false;
  });
  if (!range) throw new Error(`no “${text}” in the document`);
  return range as { from: number; to: number };
}

/** An edit made by another client, arriving as a Yjs update. */
function remoteEdit(ydoc: Y.Doc, edit: (copy: Y.Doc) => void) {
  const copy = new Y.Doc();
  Y.applyUpdate(copy, Y.encodeStateAsUpdate(ydoc));
  const before = Y.encodeStateVector(copy);
  edit(copy);
  Y.applyUpdate(ydoc, Y.encodeStateAsUpdate(copy, before));
}

const stepText = (ydoc: Y.Doc, index: number) => (ydoc.getXmlFragment("notebook").get(index) as Y.XmlElement).get(0) as Y.XmlText;

describe("remark anchors", () => {
  it("still cover the same text after text is inserted before the span, in the same step", () => {
    const ydoc = new Y.Doc();
    writeJSONToYDoc(ydoc, content, notebookExtensions());
    const before = bind(ydoc);
    const { from, to } = rangeOf(before, slip);
    const anchor = encodeSpan(before, from, to);

    remoteEdit(ydoc, (copy) => stepText(copy, 2).insert(4, "\\left(\\text{exterior}\\right) "));
    const after = bind(ydoc);
    const resolved = resolveSpan(after, anchor);
    expect(resolved).not.toBeNull();
    expect(resolved!.from).toBeGreaterThan(from); // the span moved …
    expect(after.pm.textBetween(resolved!.from, resolved!.to)).toBe(slip); // … with its words
  });

  it("follow their words when blocks are inserted above and text is typed at both ends", () => {
    const ydoc = new Y.Doc();
    writeJSONToYDoc(ydoc, content, notebookExtensions());
    const first = bind(ydoc);
    const { from, to } = rangeOf(first, "repulsive term");
    const anchor = encodeSpan(first, from, to);

    remoteEdit(ydoc, (copy) => {
      const fragment = copy.getXmlFragment("notebook");
      const heading = new Y.XmlElement("heading");
      heading.setAttribute("level", 2 as never);
      heading.insert(0, [new Y.XmlText("Charged case")]);
      fragment.insert(0, [heading]);
      const text = (fragment.get(1) as Y.XmlElement).get(0) as Y.XmlText;
      text.insert(0, "Now: ");
      text.insert(text.length, " More later.");
    });
    const after = bind(ydoc);
    const resolved = resolveSpan(after, anchor)!;
    expect(after.pm.textBetween(resolved.from, resolved.to)).toBe("repulsive term");
    expect(after.pm.textContent).toContain("Now: Written out");
  });

  it("resolve to nothing once their text is deleted, and survive damaged input", () => {
    const ydoc = new Y.Doc();
    writeJSONToYDoc(ydoc, content, notebookExtensions());
    const binding = bind(ydoc);
    const { from, to } = rangeOf(binding, slip);
    const anchor = encodeSpan(binding, from, to);
    remoteEdit(ydoc, (copy) => {
      const text = stepText(copy, 2);
      const at = text.toString().indexOf(slip);
      text.delete(at, slip.length);
    });
    expect(resolveSpan(bind(ydoc), anchor)).toBeNull();
    expect(resolveSpan(bind(ydoc), { from: "AAAA", to: "not base64" })).toBeNull();
  });

  it("find a step by id and the step around a position", () => {
    const ydoc = new Y.Doc();
    writeJSONToYDoc(ydoc, content, notebookExtensions());
    const binding = bind(ydoc);
    const found = findStep(binding.pm, "vr17");
    expect(found?.node.textContent).toContain(slip);
    expect(stepAround(binding.pm, rangeOf(binding, slip).from)).toBe("vr17");
    expect(stepAround(binding.pm, rangeOf(binding, "repulsive").from)).toBeNull();
    expect(findStep(binding.pm, "missing")).toBeNull();
  });
});
