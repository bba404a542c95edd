import { describe, expect, it } from "vitest";
import { tokenizeLatex } from "@/cas/parse/latex-tokens";
import { ReadError } from "@/cas/parse";

describe("tokenizeLatex", () => {
  it("keeps commands, letters and digits apart and drops sizing commands", () => {
    const kinds = tokenizeLatex("\\bigl(2x\\bigr)").tokens.map((t) => `${t.kind}:${t.text}`);
    expect(kinds).toEqual(["open:(", "digit:2", "letter:x", "close:)", "end:"]);
  });

  it("turns \\left( and \\right. into sized delimiters with the command's position", () => {
    const [open, , close] = tokenizeLatex("\\left( x \\right.").tokens;
    expect(open).toMatchObject({ kind: "open", text: "(", sized: true, pos: 0 });
    expect(close).toMatchObject({ kind: "close", text: ".", sized: true, pos: 9 });
  });

  it("marks the token after a thin space and after whitespace", () => {
    const [, r, t] = tokenizeLatex("\\theta\\,r t").tokens;
    expect(r).toMatchObject({ text: "r", thin: true, ws: false });
    expect(t).toMatchObject({ text: "t", thin: false, ws: true });
  });

  it("pairs braces and names the brace left open", () => {
    const { partner } = tokenizeLatex("{a{b}}");
    expect(partner.get(0)).toBe(5);
    expect(partner.get(2)).toBe(4);
    expect(() => tokenizeLatex("{a{b}")).toThrow(ReadError);
    try { tokenizeLatex("x}"); } catch (e) { expect((e as ReadError).position).toBe(1); }
  });

  it("needs a delimiter after \\left", () => {
    expect(() => tokenizeLatex("\\left x")).toThrow(/needs a delimiter/);
  });
});
