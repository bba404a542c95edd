import { dotVariable, type Expr, type Statement } from "../expr/types";
import { latexName } from "./latex-names";

export interface LatexPrintOptions {
  /** The curve parameter, used when a dot of order above 3 is written in Leibniz form. Default `"tau"`. */
  readonly parameter?: string;
}

/**
 * LaTeX for KaTeX that `readLatex` reads back to the same tree: `\frac`,
 * `\left( \right)` only around tall content, `\sin^{2}\theta`, `\dot{r}`,
 * `\mathrm{d}t`, `r_{s}`, and parentheses only where precedence or the tree's
 * grouping needs them. Declared functions (`A(r)`) read back as calls only when
 * declared to the reader. Total: a tree too deep to print gives a marker text.
 *
 * @example
 * toLatex(readLatex("(1-r_s/r) c^2"))   // "\\left(1 - \\frac{r_{s}}{r}\\right) c^{2}"
 */
export function toLatex(s: Statement, options: LatexPrintOptions = {}): string {
  try {
    const p = new LatexPrinter(options.parameter ?? "tau");
    if (s.kind === "relation") return `${p.expr(s.lhs)} ${RELATION_TEX[s.op]} ${p.expr(s.rhs)}`;
    return p.expr(s);
  } catch {
    return "\\text{(expression too deep to print)}";
  }
}

const RELATION_TEX = { "=": "=", "<": "<", ">": ">", "<=": "\\le", ">=": "\\ge", "!=": "\\neq" } as const;
const BARE_FUNCTIONS: Readonly<Record<string, string>> = {
  sin: "\\sin", cos: "\\cos", tan: "\\tan", sec: "\\sec", csc: "\\csc", cot: "\\cot",
  sinh: "\\sinh", cosh: "\\cosh", tanh: "\\tanh", log: "\\ln", asin: "\\arcsin", acos: "\\arccos", atan: "\\arctan",
};
const SCIENTIFIC = /^([+]?\d*\.?\d+)[eE]([-+]?\d+)$/;

const isNegativeNum = (e: Expr) => e.kind === "num" && e.value.trim().startsWith("-");

/** `\left( \right)` around tall content, plain parentheses otherwise. */
function paren(text: string): string {
  return /\\[dtc]?frac|\\sqrt|\\left|\\lim|\\sum/.test(text) ? `\\left(${text}\\right)` : `(${text})`;
}

class LatexPrinter {
  constructor(private readonly parameter: string) {}

  expr(e: Expr): string {
    switch (e.kind) {
      case "num": return this.number(e.value);
      case "sym": return latexName(e.name);
      case "const": return e.name === "pi" ? "\\pi" : e.name === "e" ? "e" : "\\infty";
      case "add": return this.sum(e.terms);
      case "neg": return `-${this.negated(e.arg)}`;
      case "mul": return this.product(e.factors);
      case "div": return this.fraction(e.num, e.den);
      case "pow": return this.power(e.base, e.exp);
      case "call": return this.call(e.fn, e.args);
      case "dot": return this.dot(e.name, e.order);
      case "differential": return `\\mathrm{d}${latexName(e.name)}`;
      case "deriv": return this.derivative(e.of, e.by, e.order, e.partial);
      case "limit": return `\\lim_{${latexName(e.symbol)} \\to ${this.expr(e.to)}} ${this.limitOperand(e.of)}`;
    }
  }

  private number(value: string): string {
    const v = value.trim();
    const m = SCIENTIFIC.exec(v);
    if (m) return `${m[1].replace(/^\+/, "")} \\times 10^{${String(Number(m[2]))}}`;
    return v;
  }

  private sum(terms: readonly Expr[]): string {
    return terms
      .map((t, i) => {
        if (t.kind === "neg") return `${i === 0 ? "-" : " - "}${this.negated(t.arg)}`;
        const text = t.kind === "add" || (i > 0 && isNegativeNum(t)) ? paren(this.expr(t)) : this.expr(t);
        return i === 0 ? text : ` + ${text}`;
      })
      .join("");
  }

  /** What follows a minus sign: a whole term, in parentheses only when it is a sum or itself signed. */
  private negated(arg: Expr): string {
    const text = this.expr(arg);
    return arg.kind === "add" || arg.kind === "neg" || isNegativeNum(arg) ? paren(text) : text;
  }

  private product(factors: readonly Expr[]): string {
    let out = "";
    factors.forEach((f, i) => {
      const last = i === factors.length - 1;
      const grouped = f.kind === "add" || f.kind === "neg" || f.kind === "mul" || isNegativeNum(f) || (f.kind === "limit" && !last);
      let text = grouped ? paren(this.expr(f)) : this.expr(f);
      // `2 \cdot 10^{3}` would read back as the literal 2e3: a group keeps the power apart.
      if (i > 0 && factors[i - 1].kind === "num" && f.kind === "pow" && f.base.kind === "num") text = `{${text}}`;
      if (i > 0) out += this.separator(factors[i - 1], f, text);
      out += text;
    });
    return out;
  }

  /** How two juxtaposed factors are joined so that the reader splits them as the tree does. */
  private separator(prev: Expr, f: Expr, text: string): string {
    if (/^[\d.]/.test(text)) return " \\cdot ";
    if (this.endsWithBareCall(prev)) return "\\, ";
    if (prev.kind === "sym" && (prev.name === "d" || text.startsWith("(") || text.startsWith("\\left("))) return " \\cdot ";
    if (f.kind === "differential" || (f.kind === "pow" && f.base.kind === "differential")) return "\\,";
    return " ";
  }

  private endsWithBareCall(e: Expr): boolean {
    if (e.kind === "call") return this.isBareCall(e.fn, e.args);
    if (e.kind === "pow" && e.base.kind === "call") return this.isBareCall(e.base.fn, e.base.args) && this.isSimpleExponent(e.exp);
    return false;
  }

  private isBareCall(fn: string, args: readonly Expr[]): boolean {
    if (!BARE_FUNCTIONS[fn] || args.length !== 1) return false;
    const a = args[0];
    const upright = a.kind === "sym" && latexName(a.name).startsWith("\\mathrm");
    return (a.kind === "sym" && a.name !== "d" && a.name !== "e" && !upright) || (a.kind === "const" && a.name === "pi") || (a.kind === "num" && /^\d+(\.\d+)?$/.test(a.value));
  }

  private isSimpleExponent(e: Expr): boolean {
    return e.kind === "num" && /^\d+(\.\d+)?$/.test(e.value);
  }

  private fraction(n: Expr, d: Expr): string {
    const den = this.expr(d);
    // Braces keep a denominator that starts with a differential from reading as a Leibniz derivative.
    const safeDen = /^\\mathrm\{d\}|^\\partial|^d\b/.test(den) ? `{${den}}` : den;
    return `\\frac{${this.expr(n)}}{${safeDen}}`;
  }

  private power(base: Expr, exp: Expr): string {
    const expText = this.expr(exp);
    if (base.kind === "call" && this.isBareCall(base.fn, base.args) && this.isSimpleExponent(exp)) {
      return `${BARE_FUNCTIONS[base.fn]}^{${expText}}${this.bareArgument(base.args[0])}`;
    }
    const atomic =
      base.kind === "sym" || base.kind === "const" || base.kind === "dot" || base.kind === "differential" ||
      (base.kind === "num" && /^\d+(\.\d+)?$/.test(base.value.trim())) ||
      (base.kind === "call" && !this.isBareCall(base.fn, base.args));
    const baseText = this.expr(base);
    return `${atomic ? baseText : paren(baseText)}^{${expText}}`;
  }

  private bareArgument(arg: Expr): string {
    const text = this.expr(arg);
    return text.startsWith("\\") ? text : ` ${text}`;
  }

  private call(fn: string, args: readonly Expr[]): string {
    if (this.isBareCall(fn, args)) return `${BARE_FUNCTIONS[fn]}${this.bareArgument(args[0])}`;
    const inner = args.map((a) => this.expr(a)).join(", ");
    if (fn === "sqrt" && args.length === 1) return `\\sqrt{${inner}}`;
    if (fn === "abs" && args.length === 1) return `\\left|${inner}\\right|`;
    if (fn === "exp") return `\\exp${paren(inner)}`;
    if (BARE_FUNCTIONS[fn]) return `${BARE_FUNCTIONS[fn]}${paren(inner)}`;
    return `${latexName(fn)}${paren(inner)}`;
  }

  private dot(name: string, order: number): string {
    if (order >= 1 && order <= 3) return `\\${"d".repeat(order - 1)}dot{${latexName(name)}}`;
    return `\\frac{\\mathrm{d}^{${order}} ${latexName(name)}}{\\mathrm{d}${latexName(this.parameter)}^{${order}}}`;
  }

  /** The variable of a derivative: a dotted one (`r_dot`) prints as `\dot{r}`. */
  private variable(by: string): string {
    const m = /^(.+)_d*dot$/.exec(by);
    for (let order = 1; m && order <= 3; order += 1) if (dotVariable(m[1], order) === by) return this.dot(m[1], order);
    return latexName(by);
  }

  private derivative(of: Expr, by: string, order: number, partial: boolean): string {
    const d = partial ? "\\partial" : "\\mathrm{d}";
    const top = order === 1 ? d : `${d}^{${order}}`;
    const bottom = `${d} ${this.variable(by)}${order === 1 ? "" : `^{${order}}`}`;
    const numeratorForm = of.kind === "call" || ((of.kind === "dot" || of.kind === "sym") && (partial || by !== this.parameter));
    if (numeratorForm) return `\\frac{${top} ${this.expr(of)}}{${bottom}}`;
    return `\\frac{${top}}{${bottom}}\\left(${this.expr(of)}\\right)`;
  }

  private limitOperand(of: Expr): string {
    const text = this.expr(of);
    const single = ["sym", "num", "const", "call", "pow", "div", "dot", "differential"].includes(of.kind) && !isNegativeNum(of);
    return single ? text : `\\left(${text}\\right)`;
  }
}
