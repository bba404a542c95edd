import { describe, expect, it } from "vitest";
import { readLatex, readPlain, ReadError, MAX_DEPTH, MAX_SOURCE_LENGTH } from "@/cas/parse";

/** The ReadError a read raises, or a failure when it raises nothing or something else. */
function errorOf(read: () => unknown): ReadError {
  try {
    read();
  } catch (e) {
    if (e instanceof ReadError) return e;
    throw new Error(`expected a ReadError, got ${String(e)}`);
  }
  throw new Error("expected a ReadError, but the source was read");
}

describe("ReadError positions in LaTeX", () => {
  const cases: [string, string, number, RegExp?][] = [
    ["\\left(1-x", "unbalanced", 0, /unbalanced \\left\( at 0/],
    ["1 + \\frak{g}", "unknown_command", 4, /unknown command \\frak at 4/],
    ["x + \\left[a\\right)", "unbalanced", 11, /does not close \\left\[ at 4/],
    ["(a]", "unbalanced", 2],
    ["a + b)", "unbalanced", 5, /unbalanced \) at 5/],
    ["\\frac{1}{r", "unbalanced", 8, /unbalanced \{ at 8/],
    ["r^2}", "unbalanced", 3],
    ["\\frac{}{}", "empty_group", 5],
    ["\\frac{1}{}", "empty_group", 8],
    ["\\sqrt{}", "empty_group", 5],
    ["x^", "missing_argument", 1],
    ["x^-1", "missing_argument", 2],
    ["x^2^3", "double_script", 3],
    ["a = b = c", "chain", 6],
    ["a < b \\le c", "chain", 6],
    ["E = mc^2, \\quad L = 1", "unexpected", 16],
    ["sin x", "bare_function", 0],
    ["2\\ln r + cos\\theta", "bare_function", 9],
    ["a \\approx b", "unsupported", 2],
    ["a \\pm b", "unsupported", 2],
    ["\\left. \\frac{dV}{dr}\\right|_{r=3M} = 0", "unsupported", 20],
    ["\\int x", "unknown_command", 0],
    ["\\mathcal{L}", "unknown_command", 0],
    ["\\operatorname{sech} x", "unknown_function", 0],
    ["x_", "bad_name", 1],
    ["\\dot{r+1}", "bad_name", 0],
    ["\\frac{d^2r}{d\\tau}", "bad_derivative", 0],
    ["\\frac{d}{dr}", "missing_argument", 0],
    ["\\lim x", "missing_argument", 0],
    ["\\sin", "missing_argument", 0],
    ["a \\\\ b", "unexpected", 2, /line break/],
    ["x + @", "unexpected", 4],
    ["x + ☉", "unexpected", 4],
    ["f'(x)", "unsupported", 1],
    ["x +", "unexpected", 3],
    ["\\cdot x", "unexpected", 0],
    ["", "empty", 0],
  ];
  it.each(cases)("%s → %s at %i", (source, code, position, message) => {
    const e = errorOf(() => readLatex(source));
    expect(e.code).toBe(code);
    expect(e.position).toBe(position);
    if (message) expect(e.message).toMatch(message);
    expect(e.position).toBeLessThanOrEqual(source.length);
  });
});

describe("ReadError positions in plain syntax", () => {
  const cases: [string, string, number][] = [
    ["2x", "missing_operator", 1],
    ["a b", "missing_operator", 2],
    ["sin(x", "unexpected", 5],
    ["a = b = c", "chain", 6],
    ["a # b", "unexpected", 2],
    ["dot(r+1)", "bad_name", 0],
    ["diff(f)", "missing_argument", 0],
    ["x^", "unexpected", 2],
    [")", "unexpected", 0],
    ["f(,)", "unexpected", 2],
    ["dot(r, 0)", "bad_number", 0],
    ["", "empty", 0],
  ];
  it.each(cases)("%s → %s at %i", (source, code, position) => {
    const e = errorOf(() => readPlain(source));
    expect(e.code).toBe(code);
    expect(e.position).toBe(position);
  });
});

describe("hostile input", () => {
  it("refuses a 1 MB string before reading it", () => {
    const huge = "x+".repeat(500_000);
    for (const read of [readLatex, readPlain]) {
      const e = errorOf(() => read(huge));
      expect(e.code).toBe("too_long");
      expect(e.position).toBe(MAX_SOURCE_LENGTH);
    }
  });

  it("refuses 10,000-deep parentheses without overflowing the stack", () => {
    const deep = `${"(".repeat(10_000)}x${")".repeat(10_000)}`;
    for (const read of [readLatex, readPlain]) expect(["too_long", "too_deep"]).toContain(errorOf(() => read(deep)).code);
  });

  it("refuses nesting just under the length limit as too deep", () => {
    const n = 9_000;
    const sources = [
      `${"(".repeat(n)}x${")".repeat(n)}`,
      `${"{".repeat(n)}x${"}".repeat(n)}`,
      `${"\\left(".repeat(1_500)}x${"\\right)".repeat(1_500)}`,
      `${"\\frac{1}{".repeat(1_500)}x${"}".repeat(1_500)}`,
      `${"x^{".repeat(4_000)}x${"}".repeat(4_000)}`,
      `${"\\sqrt{".repeat(2_000)}x${"}".repeat(2_000)}`,
      `${"-".repeat(15_000)}x`,
      `${"\\frac{d}{dx}".repeat(1_500)}x`,
    ];
    for (const source of sources) {
      const e = errorOf(() => readLatex(source));
      expect(e.code, source.slice(0, 20)).toBe("too_deep");
    }
    expect(errorOf(() => readPlain(`${"-".repeat(15_000)}x`)).code).toBe("too_deep");
    expect(errorOf(() => readPlain(`${"x^".repeat(5_000)}x`)).code).toBe("too_deep");
  });

  it("reads nesting up to the limit", () => {
    const depth = MAX_DEPTH - 5;
    expect(() => readLatex(`${"(".repeat(depth)}x${")".repeat(depth)}`)).not.toThrow();
    expect(() => readPlain(`${"(".repeat(depth)}x${")".repeat(depth)}`)).not.toThrow();
  });

  it("answers the next read normally after a refusal", () => {
    errorOf(() => readLatex("(".repeat(10_000)));
    expect(readPlain("1 + x")).toEqual(readLatex("1 + x"));
  });

  it("rejects a non-string source with a ReadError", () => {
    expect(errorOf(() => readLatex(42 as unknown as string)).code).toBe("unexpected");
  });
});
