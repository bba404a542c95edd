import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import { readJSONFromYDoc, writeJSONToYDoc } from "@/editor/collaboration";
import { notebookExtensions } from "@/editor/notebook-extensions";

import { doc, step } from "./support/headless";

const schwarzschildBlock = {
  type: "spacetimeBlock",
  attrs: {
    id: "sb-1",
    name: "exterior",
    coordinates: [{ symbol: "r", dimension: "length" }],
    lineElement: "ds^2 = -f c^2 dt^2",
    constants: [{ symbol: "r_s", dimension: "length", note: "Schwarzschild radius" }],
    assumptions: ["r > r_s"],
    parameter: "\\tau",
  },
};

describe("the notebook document under Yjs", () => {
  it("survives a round trip through a Y.Doc unchanged, attributes and lists included", () => {
    const content = doc(schwarzschildBlock, step("st-a", "E = \\mu c^2 f \\dot t", { kind: "definition", cites: ["st-0"], follows: "st-0" }), { type: "paragraph", content: [{ type: "text", text: "with " }, { type: "mathInline", attrs: { latex: "r > r_s" } }, { type: "stepRef", attrs: { stepId: "st-a" } }] });
    const ydoc = new Y.Doc();
    writeJSONToYDoc(ydoc, content, notebookExtensions());
    const copy = new Y.Doc();
    Y.applyUpdate(copy, Y.encodeStateAsUpdate(ydoc));
    expect(readJSONFromYDoc(copy)).toEqual(content);
  });

  it("merges concurrent typing in the same step character by character", () => {
    const a = new Y.Doc();
    writeJSONToYDoc(a, doc(step("st-a", "E = 1")), notebookExtensions());
    const b = new Y.Doc();
    Y.applyUpdate(b, Y.encodeStateAsUpdate(a));
    const textIn = (d: Y.Doc) => (d.getXmlFragment("notebook").get(0) as Y.XmlElement).get(0) as Y.XmlText;
    textIn(a).insert(5, "+x");
    textIn(b).insert(0, "2");
    Y.applyUpdate(a, Y.encodeStateAsUpdate(b));
    Y.applyUpdate(b, Y.encodeStateAsUpdate(a));
    const relation = (d: Y.Doc) => readJSONFromYDoc(d).content?.[0].content?.[0].text;
    expect(relation(a)).toBe("2E = 1+x");
    expect(relation(b)).toBe("2E = 1+x");
  });

  it("turns off the starter kit's own undo history when collaborating", () => {
    const names = (list: ReturnType<typeof notebookExtensions>) => list.map((e) => e.name);
    const collaborative = notebookExtensions({ collaboration: { document: new Y.Doc() } });
    expect(names(collaborative)).toContain("collaboration");
    const starterKit = collaborative.find((e) => e.name === "starterKit");
    expect(starterKit?.options).toMatchObject({ undoRedo: false });
    expect(notebookExtensions().find((e) => e.name === "starterKit")?.options).not.toHaveProperty("undoRedo");
  });
});
