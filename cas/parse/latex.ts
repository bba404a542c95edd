import type { Expr, RelationOp, Statement } from "../expr/types";
import { call, deriv, differential, div, dot, euler, infinity, limit, mul, neg, num, pi, pow, relation, sym, add } from "../expr/build";
import { fail } from "./errors";
import { guardLength, resolveOptions, type ReadOptions, type ResolvedOptions } from "./options";
import type { LatexToken } from "./latex-tokens";
import { LatexCursor, type Range } from "./latex-cursor";
import { BARE_FUNCTION_WORDS, FUNCTION_COMMANDS, LETTER_COMMANDS, WRAPPER_COMMANDS } from "./latex-vocabulary";

/**
 * Reads one relation or expression written the way a relativist writes LaTeX.
 *
 * Reading rules worth knowing:
 * - Juxtaposition binds tighter than `/`, `\cdot`, `\times` (`GM/rc^2` is GM/(r c²),
 *   the convention of physics journals); `/`, `\cdot`, `\times`, `*` are left-associative.
 * - Declared names (options) beat letter-by-letter reading: with `GM` declared, `GM`
 *   is one symbol; otherwise G·M. A letter with a subscript is always one symbol (`r_s`).
 * - A declared function followed by `(` is a call; an undeclared letter before `(`
 *   multiplies. `A'(r)` is the derivative of a declared function.
 * - `e` is Euler's number unless declared as a symbol; `\pi` is π.
 * - `d` followed by a coordinate is a differential when the coordinate is declared,
 *   or anywhere in a line element (source starting `ds^2`, `d\tau^2`, `d\sigma^2`);
 *   `\mathrm{d}x` is always a differential. `dt^2` is (dt)².
 * - `\frac{dr}{d\tau}` is ṙ when τ is the curve parameter; other Leibniz forms give
 *   derivative nodes; a derivative by a dotted symbol (`\partial \dot r`) is by `r_dot`.
 * - `\sin^2\theta` is (sin θ)²; `\sin^{-1}` is arcsin. A bare function argument
 *   runs over the following letters and numbers (`\sin 2\theta`, `\sin\omega t`) and
 *   stops at a spacing command, an operator, a function, `\dot`, a fraction, a
 *   parenthesis or the letter `d`.
 * - One relation per statement: `a = b = c` is rejected. A trailing `,` or `.` is ignored.
 *
 * @example
 * readLatex("ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2dt^2 + \\frac{dr^2}{1-r_s/r} + r^2 d\\Omega^2")
 */
export function readLatex(source: string, options?: ReadOptions): Statement {
  guardLength(source);
  return new LatexReader(source, resolveOptions(options)).statement();
}

/**
 * Like {@link readLatex} but rejects relations.
 *
 * @example
 * readLatexExpr("\\frac{GM}{r^2}")   // div(mul(G, M), pow(r, 2))
 */
export function readLatexExpr(source: string, options?: ReadOptions): Expr {
  const s = readLatex(source, options);
  if (s.kind === "relation") fail("unexpected", "expected an expression, found a relation", 0);
  return s;
}

const RELATION_COMMANDS: Readonly<Record<string, RelationOp>> = {
  le: "<=", leq: "<=", leqslant: "<=", ge: ">=", geq: ">=", geqslant: ">=",
  neq: "!=", ne: "!=", lt: "<", gt: ">", equiv: "=", coloneqq: "=", eqqcolon: "=",
};
const UNSUPPORTED_RELATIONS = new Set(["approx", "sim", "simeq", "propto", "ll", "gg", "cong", "to", "rightarrow", "Rightarrow", "implies", "iff", "mapsto"]);
const PRODUCT_COMMANDS = new Set(["cdot", "times", "ast"]);
const ATOM_COMMANDS_NOT_FACTOR_START = new Set([...PRODUCT_COMMANDS, ...Object.keys(RELATION_COMMANDS), ...UNSUPPORTED_RELATIONS, "pm", "mp", "div", "right"]);


class LatexReader extends LatexCursor {
  private absDepth = 0;
  private readonly lineElement: boolean;
  /** Longest letter run a declared name can match; bounds the search in {@link letters}. */
  private readonly longestDeclared: number;

  constructor(source: string, private readonly options: ResolvedOptions) {
    super(source);
    this.lineElement = options.lineElement ?? this.startsLikeLineElement();
    this.longestDeclared = Math.max(0, ...[...options.declared].map((n) => n.length));
  }

  // ---- statement ----------------------------------------------------------

  statement(): Statement {
    const lhs = this.expression();
    let result: Statement = lhs;
    const op = this.relationAhead();
    if (op) {
      const rhs = this.expression();
      result = relation(lhs, op, rhs);
      const again = this.peek();
      if (this.relationAhead()) fail("chain", `a second relation at ${again.pos}: write one relation per step`, again.pos);
    }
    const tail = this.peek();
    if (this.isChar(tail, ",") || this.isChar(tail, ".") || this.isChar(tail, ";")) {
      this.next();
      const more = this.peek();
      if (more.kind !== "end") fail("unexpected", `more after '${tail.text}' at ${tail.pos}: write one relation per step`, more.pos);
    }
    const end = this.peek();
    if (end.kind !== "end") this.unexpected(end);
    return result;
  }

  /** Consumes a relation sign and returns it, or returns undefined. */
  private relationAhead(): RelationOp | undefined {
    const t = this.peek();
    const after = this.peek(1);
    const glued = after.kind === "char" && after.text === "=" && !after.ws && !after.thin;
    if (t.kind === "char") {
      if (t.text === "=") { this.next(); return "="; }
      if (t.text === "<" || t.text === ">") { this.next(); if (glued) { this.next(); return t.text === "<" ? "<=" : ">="; } return t.text; }
      if ((t.text === "!" || t.text === ":") && glued) { this.next(); this.next(); return t.text === "!" ? "!=" : "="; }
    }
    if (t.kind === "cmd") {
      const op = RELATION_COMMANDS[t.text];
      if (op) { this.next(); return op; }
      if (UNSUPPORTED_RELATIONS.has(t.text)) fail("unsupported", `\\${t.text} at ${t.pos} is not a relation the checker reads: use =, <, >, \\le, \\ge or \\neq`, t.pos);
    }
    return undefined;
  }

  // ---- sums, products, powers ----------------------------------------------

  private expression(): Expr {
    this.enter(this.peek().pos);
    const terms: Expr[] = [];
    const first = this.peek();
    if (this.isChar(first, "-")) { this.next(); terms.push(neg(this.term())); }
    else { if (this.isChar(first, "+")) this.next(); terms.push(this.term()); }
    for (;;) {
      const t = this.peek();
      if (this.isChar(t, "+")) { this.next(); terms.push(this.term()); }
      else if (this.isChar(t, "-")) { this.next(); terms.push(neg(this.term())); }
      else if (this.isCmd(t, "pm") || this.isCmd(t, "mp")) fail("unsupported", `\\${t.text} at ${t.pos}: write the two signs as two steps`, t.pos);
      else break;
    }
    this.leave();
    return terms.length === 1 ? terms[0] : add(...terms);
  }

  private term(): Expr {
    let factors = this.tight();
    for (;;) {
      const t = this.peek();
      if ((t.kind === "cmd" && PRODUCT_COMMANDS.has(t.text)) || this.isChar(t, "*")) { this.next(); factors.push(...this.tight()); }
      else if (this.isChar(t, "/") || this.isCmd(t, "div")) { this.next(); factors = [div(product(factors), product(this.tight()))]; }
      else break;
    }
    return product(factors);
  }

  /** A run of juxtaposed factors, optionally signed (`a \cdot -b`). */
  private tight(): Expr[] {
    const t = this.peek();
    if (this.isChar(t, "-") || this.isChar(t, "+")) {
      this.next();
      this.enter(t.pos);
      const inner = product(this.tight());
      this.leave();
      return [t.text === "-" ? neg(inner) : inner];
    }
    if (!this.startsFactor(t)) {
      if (t.kind === "cmd" && PRODUCT_COMMANDS.has(t.text)) fail("unexpected", `\\${t.text} at ${t.pos} needs a factor before it`, t.pos);
      this.unexpected(t);
    }
    const factors = [this.postfix()];
    while (this.startsFactor(this.peek())) factors.push(this.postfix());
    return factors;
  }

  private startsFactor(t: LatexToken): boolean {
    switch (t.kind) {
      case "letter": case "digit": case "lbrace": return true;
      case "open": return true;
      case "bar": return this.absDepth === 0;
      case "char": return t.text === "." && this.peekIsDigitAfter(t);
      case "cmd": return !ATOM_COMMANDS_NOT_FACTOR_START.has(t.text);
      default: return false;
    }
  }
  /** Whether `t`, the current token, is followed by a digit (`.5`). */
  private peekIsDigitAfter(t: LatexToken): boolean {
    return this.peek() === t && this.tokenAt(this.i + 1).kind === "digit";
  }

  private postfix(): Expr {
    let base = this.atom();
    let powered = false;
    for (;;) {
      const t = this.peek();
      if (this.isChar(t, "^")) {
        if (powered) fail("double_script", `double superscript at ${t.pos}: add braces, e.g. {x^{a}}^{b}`, t.pos);
        this.next();
        base = pow(base, this.script(t));
        powered = true;
      } else if (this.isChar(t, "_")) {
        fail("unexpected", `a subscript at ${t.pos} can only follow a symbol`, t.pos);
      } else if (this.isChar(t, "'")) {
        fail("unsupported", `a prime at ${t.pos}: primes are read only on declared functions, as A'(r)`, t.pos);
      } else if (this.isChar(t, "!") && !this.isChar(this.peek(1), "=")) {
        fail("unsupported", `factorials are not read (at ${t.pos})`, t.pos);
      } else break;
    }
    return base;
  }

  /** The argument of `^` (or of a log base): a braced group or one token. */
  private script(at: LatexToken): Expr {
    const t = this.peek();
    if (t.kind === "lbrace") return this.braced(t, "superscript");
    if (t.kind === "digit") { this.next(); return num(t.text); }
    if (t.kind === "letter" || (t.kind === "cmd" && (LETTER_COMMANDS.has(t.text) || t.text === "pi" || t.text === "infty"))) {
      return this.within({ start: this.i, end: this.i + 1, after: this.i + 1 }, () => this.atom());
    }
    if (this.isChar(t, "-") || this.isChar(t, "+")) fail("missing_argument", `a sign after ^ at ${at.pos} needs braces, e.g. x^{-1}`, t.pos);
    return fail("missing_argument", `^ at ${at.pos} needs an exponent`, at.pos);
  }

  private braced(open: LatexToken, what: string): Expr {
    const close = this.partner.get(this.i)!;
    if (close === this.i + 1) fail("empty_group", `empty ${what} {} at ${open.pos}`, open.pos);
    return this.within({ start: this.i + 1, end: close, after: close + 1 }, () => this.expression());
  }

  // ---- atoms --------------------------------------------------------------

  private atom(): Expr {
    const t = this.peek();
    switch (t.kind) {
      case "digit": return this.number();
      case "char":
        if (t.text === "." && this.peekIsDigitAfter(t)) return this.number();
        return this.unexpected(t);
      case "letter": return this.letters();
      case "lbrace": {
        if (this.isCmd(this.tokenAt(this.i + 1), "rm") && this.tokenAt(this.i + 2).text === "d" && this.tokenAt(this.i + 3).kind === "rbrace") {
          // `{\rm d}r`: the old-style upright differential.
          const rm = this.tokenAt(this.i + 1);
          this.i += 4;
          return this.wrapped(rm, "d");
        }
        const e = this.braced(t, "group");
        return e;
      }
      case "open": return this.delimited();
      case "bar": return this.bars();
      case "cmd": return this.command();
      default: return this.unexpected(t);
    }
  }

  /** Digits with an optional decimal point; `6.674\times10^{-11}` folds into one literal. */
  private number(): Expr {
    const start = this.peek().pos;
    let text = "";
    let seenPoint = false;
    for (;;) {
      const t = this.peek();
      if (t.kind === "digit" && (text === "" || !t.thin)) { text += t.text; this.next(); }
      else if (this.isChar(t, ".") && !seenPoint && this.tokenAt(this.i + 1).kind === "digit" && !t.thin) { seenPoint = true; text += "."; this.next(); }
      else break;
    }
    if (text === "") fail("bad_number", `a number expected at ${start}`, start);
    const exponent = this.powerOfTenAhead();
    return num(exponent === undefined ? text : `${text}e${exponent}`);
  }

  /** Matches `\times 10^{k}` / `\cdot 10^{k}` with an integer k and consumes it, else leaves the stream alone. */
  private powerOfTenAhead(): string | undefined {
    const saved = this.i;
    const op = this.peek();
    if (!(this.isCmd(op, "times") || this.isCmd(op, "cdot"))) return undefined;
    if (!(this.peek(1).text === "1" && this.peek(1).kind === "digit" && this.peek(2).text === "0" && this.peek(2).kind === "digit" && this.isChar(this.peek(3), "^"))) return undefined;
    const digitAfterTen = this.peek(4);
    let exponent: string | undefined;
    let consumed = 0;
    if (digitAfterTen.kind === "digit") { exponent = digitAfterTen.text; consumed = 5; }
    else if (digitAfterTen.kind === "lbrace") {
      const close = this.partner.get(this.i + 4)!;
      const inner = this.tokens.slice(this.i + 5, close);
      const body = inner.map((t) => t.text).join("");
      if (inner.every((t) => t.kind === "digit" || (t.kind === "char" && (t.text === "-" || t.text === "+"))) && /^[-+]?\d+$/.test(body)) {
        exponent = body.replace(/^\+/, "");
        consumed = close + 1 - this.i;
      }
    }
    if (exponent === undefined) { this.i = saved; return undefined; }
    const nextAfter = this.tokenAt(this.i + consumed);
    if (this.isChar(nextAfter, "^")) { this.i = saved; return undefined; }
    this.i += consumed;
    return exponent;
  }

  /** A run of letters: declared multi-letter names first, else one letter (with its subscript). */
  private letters(): Expr {
    const start = this.i;
    // Only the first few letters of a run can matter (declared names and function words are short),
    // so the scan stops there: a long run then costs linear time, not quadratic.
    const scanLimit = Math.min(this.bound, start + Math.max(this.longestDeclared, 6) + 1);
    let runEnd = start + 1;
    while (runEnd < scanLimit && this.tokens[runEnd].kind === "letter" && !this.tokens[runEnd].ws && !this.tokens[runEnd].thin) runEnd += 1;
    const letterText = (from: number, to: number) => this.tokens.slice(from, to).map((t) => t.text).join("");
    for (let k = Math.min(runEnd - start, this.longestDeclared); k >= 2; k -= 1) {
      const base = letterText(start, start + k);
      if (start + k === runEnd && this.isChar(this.tokenAt(runEnd), "_")) {
        const sub = this.subscriptAt(runEnd);
        if (this.options.declared.has(`${base}_${sub.text}`)) { this.i = sub.next; return this.named(`${base}_${sub.text}`); }
      }
      if (this.options.declared.has(base)) { this.i = start + k; return this.named(base); }
    }
    if (runEnd - start >= 2) {
      const word = letterText(start, runEnd);
      if (BARE_FUNCTION_WORDS.has(word)) fail("bare_function", `'${word}' at ${this.tokens[start].pos} reads as a product of letters: write \\${word}`, this.tokens[start].pos);
    }
    const letter = this.next();
    if (this.isChar(this.peek(), "_") && this.i === runEnd) {
      const sub = this.subscriptAt(this.i);
      this.i = sub.next;
      return this.named(`${letter.text}_${sub.text}`);
    }
    if (letter.text === "d" && !this.options.functions.has("d")) {
      const differentialOf = this.differentialAhead();
      if (differentialOf) return differentialOf;
    }
    if (letter.text === "e" && !this.options.symbols.has("e")) return euler;
    return this.named(letter.text);
  }

  /** After a `d`: the differential of the symbol that follows, when this is a line element or the symbol is a declared coordinate. */
  private differentialAhead(): Expr | undefined {
    const name = this.symbolNameAt(this.i);
    if (!name) return undefined;
    if (!(this.lineElement || this.options.coordinates.has(name.text))) return undefined;
    this.i = name.next;
    return differential(name.text);
  }

  /** A symbol: declared function call, or plain symbol. */
  private named(name: string): Expr {
    if (this.options.functions.has(name)) {
      let primes = 0;
      while (this.isChar(this.peek(), "'")) { this.next(); primes += 1; }
      const open = this.peek();
      if (open.kind === "open" && (open.text === "(" || open.text === "[")) {
        const args = this.argumentList();
        const applied = call(name, ...args);
        if (primes === 0) return applied;
        const only = args.length === 1 ? args[0] : undefined;
        if (only?.kind !== "sym") fail("bad_derivative", `${name}${"'".repeat(primes)} at ${open.pos} needs one symbol as its argument`, open.pos);
        return deriv(applied, only.name, primes);
      }
      if (primes > 0) fail("missing_argument", `${name}' at ${open.pos} needs its argument, as ${name}'(r)`, open.pos);
      if (this.isChar(open, "^")) {
        // `a^2(t)`: the power of a declared function, as (a(t))^2.
        const saved = this.i;
        this.next();
        const power = this.script(open);
        const paren = this.peek();
        if (paren.kind === "open" && (paren.text === "(" || paren.text === "[")) return pow(call(name, ...this.argumentList()), power);
        this.i = saved;
      }
    }
    return sym(name);
  }

  /** `( a, b )` after a declared function. */
  private argumentList(): Expr[] {
    const open = this.next();
    const args = [this.expression()];
    while (this.isChar(this.peek(), ",")) { this.next(); args.push(this.expression()); }
    this.closeFor(open);
    return args;
  }

  /** Reads the closing delimiter for `open` or reports the imbalance. */
  private closeFor(open: LatexToken): LatexToken {
    const close = this.peek();
    const opener = this.source.slice(open.pos, open.end);
    if (close.kind !== "close") {
      if (close.kind === "end") fail("unbalanced", `unbalanced ${opener} at ${open.pos}`, open.pos);
      this.unexpected(close);
    }
    const pairs: Readonly<Record<string, string>> = { "(": ")", "[": "]", "{": "}", "|": "|" };
    const fits = open.text === "." ? close.sized : close.text === "." ? open.sized : pairs[open.text] === close.text;
    if (!fits) fail("unbalanced", `${this.source.slice(close.pos, close.end)} at ${close.pos} does not close ${opener} at ${open.pos}`, close.pos);
    this.next();
    return close;
  }

  /** `( … )`, `\left[ … \right]`, `\left. … \right|`, `\left| … \right|` (absolute value). */
  private delimited(): Expr {
    const open = this.next();
    const first = this.peek();
    if (first.kind === "close") fail("empty_group", `empty parentheses at ${open.pos}`, open.pos);
    const inner = this.expression();
    const close = this.closeFor(open);
    if (close.sized && close.text === "|" && this.isChar(this.peek(), "_")) {
      fail("unsupported", `an evaluation bar at ${close.pos} is not read: substitute the value instead`, close.pos);
    }
    return open.text === "|" ? call("abs", inner) : inner;
  }

  private bars(): Expr {
    const open = this.next();
    this.absDepth += 1;
    const inner = this.expression();
    this.absDepth -= 1;
    const close = this.peek();
    if (close.kind !== "bar") fail("unbalanced", `unbalanced | at ${open.pos}`, open.pos);
    this.next();
    if (this.isChar(this.peek(), "_")) fail("unsupported", `an evaluation bar at ${close.pos} is not read: substitute the value instead`, close.pos);
    return call("abs", inner);
  }

  private command(): Expr {
    const t = this.peek();
    const name = t.text;
    if (LETTER_COMMANDS.has(name)) {
      this.next();
      if (this.isChar(this.peek(), "_")) {
        const sub = this.subscriptAt(this.i);
        this.i = sub.next;
        return this.named(`${name}_${sub.text}`);
      }
      return this.named(name);
    }
    switch (name) {
      case "pi": this.next(); return this.options.symbols.has("pi") ? sym("pi") : pi;
      case "infty": this.next(); return infinity;
      case "frac": case "dfrac": case "tfrac": case "cfrac": return this.fraction();
      case "sqrt": return this.root();
      case "dot": case "ddot": case "dddot": return this.dotted();
      case "lim": return this.limitOf();
      case "rm": return this.wrapped(this.next(), this.rmContent());
      case "partial": return this.partialIndex();
      default: break;
    }
    if (FUNCTION_COMMANDS[name]) { this.next(); return this.applyFunction(FUNCTION_COMMANDS[name], t); }
    if (WRAPPER_COMMANDS.has(name)) { this.next(); return this.wrapped(t, this.wrapperContent(t)); }
    if (name === "\\") this.unexpected(t);
    return fail("unknown_command", `unknown command \\${name} at ${t.pos}`, t.pos);
  }

  /** Meaning of an upright name: d (differential), e (Euler), a function, or one symbol. */
  private wrapped(cmd: LatexToken, content: string): Expr {
    if (content === "d" && cmd.text !== "operatorname") {
      const name = this.symbolNameAt(this.i);
      if (!name) fail("missing_argument", `the differential at ${cmd.pos} needs a coordinate after it`, cmd.pos);
      this.i = name.next;
      return differential(name.text);
    }
    if (content === "e" && cmd.text !== "operatorname") return euler;
    const builtin = FUNCTION_COMMANDS[content] ?? (["sqrt", "abs", "asin", "acos", "atan", "exp", "log"].includes(content) ? content : undefined);
    if (builtin) return this.applyFunction(builtin, cmd);
    let name = content;
    if (this.isChar(this.peek(), "_")) {
      const sub = this.subscriptAt(this.i);
      this.i = sub.next;
      name = `${content}_${sub.text}`;
    }
    if (cmd.text === "operatorname" && !this.options.functions.has(name)) {
      fail("unknown_function", `unknown function \\operatorname{${content}} at ${cmd.pos}: declare it as a function`, cmd.pos);
    }
    return this.named(name);
  }

  // ---- functions, roots, dots, limits --------------------------------------

  private applyFunction(fn: string, at: LatexToken): Expr {
    let base: Expr | undefined;
    let power: Expr | undefined;
    let name = fn;
    if (fn === "log" && this.isChar(this.peek(), "_")) { this.next(); base = this.script(at); }
    if (this.isChar(this.peek(), "^")) {
      const caret = this.next();
      power = this.script(caret);
      const inverse: Readonly<Record<string, string>> = { sin: "asin", cos: "acos", tan: "atan" };
      if (isMinusOne(power)) {
        if (!inverse[fn]) fail("unsupported", `\\${at.text}^{-1} at ${at.pos}: write the inverse function or \\left(…\\right)^{-1}`, at.pos);
        name = inverse[fn];
        power = undefined;
      }
    }
    const arg = this.functionArgument(at);
    let result: Expr = call(name, arg);
    if (base) result = div(result, call("log", base));
    return power ? pow(result, power) : result;
  }

  private functionArgument(at: LatexToken): Expr {
    const t = this.peek();
    if (t.kind === "open" || t.kind === "lbrace" || t.kind === "bar") return this.atom();
    // `\cosh\frac{g\tau}{c}`: a fraction right after the function is its whole argument.
    if (t.kind === "cmd" && ["frac", "dfrac", "tfrac", "sqrt"].includes(t.text)) return this.postfix();
    const items: Expr[] = [];
    for (;;) {
      const n = this.peek();
      if (items.length > 0 && n.thin) break;
      const isName = n.kind === "letter" || (n.kind === "cmd" && (LETTER_COMMANDS.has(n.text) || n.text === "pi" || n.text === "infty"));
      if (!(isName || n.kind === "digit")) break;
      if (n.kind === "letter" && n.text === "d" && !this.options.declared.has("d")) break;
      items.push(this.postfix());
    }
    if (items.length === 0) fail("missing_argument", `\\${at.text} at ${at.pos} needs an argument`, at.pos);
    return product(items);
  }

  private root(): Expr {
    const t = this.next();
    let index: Expr | undefined;
    const open = this.peek();
    if (open.kind === "open" && open.text === "[" && !open.sized) {
      this.next();
      index = this.expression();
      this.closeFor(open);
    }
    const radicand = this.argument(t, "\\sqrt");
    if (!index || (index.kind === "num" && index.value === "2")) return call("sqrt", radicand);
    return pow(radicand, div(num(1), index));
  }

  /** One macro argument: a braced group or a single token. */
  private argument(cmd: LatexToken, what: string): Expr {
    const range = this.argumentRange(cmd, what);
    const e = this.within(range, () => this.expression());
    return e;
  }

  private argumentRange(cmd: LatexToken, what: string): Range {
    const t = this.peek();
    if (t.kind === "lbrace") {
      const close = this.partner.get(this.i)!;
      if (close === this.i + 1) fail("empty_group", `empty argument {} at ${t.pos} of ${what} at ${cmd.pos}`, t.pos);
      return { start: this.i + 1, end: close, after: close + 1 };
    }
    if (t.kind === "letter" || t.kind === "digit" || (t.kind === "cmd" && (LETTER_COMMANDS.has(t.text) || t.text === "pi" || t.text === "infty"))) {
      return { start: this.i, end: this.i + 1, after: this.i + 1 };
    }
    return fail("missing_argument", `${what} at ${cmd.pos} is missing an argument`, cmd.pos);
  }

  private dotted(): Expr {
    const t = this.next();
    const order = t.text === "dot" ? 1 : t.text === "ddot" ? 2 : 3;
    const range = this.argumentRange(t, `\\${t.text}`);
    const name = this.symbolNameAt(range.start);
    if (!name || name.next !== range.end) fail("bad_name", `\\${t.text} at ${t.pos} applies to one symbol`, t.pos);
    this.i = range.after;
    let text = name.text;
    if (this.isChar(this.peek(), "_") && !text.includes("_")) {
      const sub = this.subscriptAt(this.i);
      this.i = sub.next;
      text = `${text}_${sub.text}`;
    }
    return dot(text, order);
  }

  private limitOf(): Expr {
    const t = this.next();
    if (!this.isChar(this.peek(), "_")) fail("missing_argument", `\\lim at ${t.pos} needs _{x \\to a}`, t.pos);
    this.next();
    const open = this.peek();
    if (open.kind !== "lbrace") fail("missing_argument", `\\lim at ${t.pos} needs _{x \\to a}`, t.pos);
    const close = this.partner.get(this.i)!;
    const name = this.symbolNameAt(this.i + 1);
    const arrow = name ? this.tokenAt(name.next) : open;
    if (!name || !(this.isCmd(arrow, "to") || this.isCmd(arrow, "rightarrow") || this.isCmd(arrow, "longrightarrow"))) {
      fail("missing_argument", `\\lim at ${t.pos} needs _{x \\to a}`, t.pos);
    }
    if (name.next + 1 >= close) fail("missing_argument", `\\lim at ${t.pos} needs a value after \\to`, arrow.pos);
    this.enter(t.pos);
    const to = this.within({ start: name.next + 1, end: close, after: close + 1 }, () => this.expression());
    if (!this.startsFactor(this.peek()) && !this.isChar(this.peek(), "-")) fail("missing_argument", `\\lim at ${t.pos} needs something to take the limit of`, t.pos);
    const of = product(this.tight());
    this.leave();
    return limit(of, name.text, to);
  }

  /** `\partial_r f`: the partial derivative by the subscript, of the factor that follows. */
  private partialIndex(): Expr {
    const t = this.next();
    if (!this.isChar(this.peek(), "_")) fail("unsupported", `\\partial at ${t.pos} is read as \\partial_r f or in \\frac{\\partial f}{\\partial r}`, t.pos);
    const underscore = this.i;
    const by = this.tokenAt(underscore + 1).kind === "lbrace"
      ? this.symbolNameAt(underscore + 2)
      : this.symbolNameAt(underscore + 1);
    const close = this.tokenAt(underscore + 1).kind === "lbrace" ? this.partner.get(underscore + 1)! : -1;
    if (!by || (close >= 0 && by.next !== close)) fail("bad_derivative", `\\partial at ${t.pos} needs one variable as its subscript`, t.pos);
    this.i = close >= 0 ? close + 1 : by.next;
    if (!this.startsFactor(this.peek())) fail("missing_argument", `\\partial_${by.text} at ${t.pos} needs something to act on`, t.pos);
    this.enter(t.pos);
    const of = this.postfix();
    this.leave();
    return deriv(of, by.text, 1, true);
  }

  // ---- fractions and Leibniz derivatives ------------------------------------

  private fraction(): Expr {
    const t = this.next();
    const numerator = this.argumentRange(t, `\\${t.text}`);
    this.i = numerator.after;
    const denominator = this.argumentRange(t, `\\${t.text}`);
    // A derivative in operator form applies to the next factor without a group between: count it as a level.
    this.enter(t.pos);
    const leibniz = this.leibniz(t, numerator, denominator);
    this.leave();
    if (leibniz) return leibniz;
    const n = this.within(numerator, () => this.expression());
    const d = this.within(denominator, () => this.expression());
    return div(n, d);
  }

  private leibniz(frac: LatexToken, numerator: Range, denominator: Range): Expr | undefined {
    const op = this.derivOperatorAt(numerator.start, numerator.end, true);
    if (!op) return undefined;
    const items: { by: string; order: number }[] = [];
    let k = denominator.start;
    while (k < denominator.end) {
      const dop = this.derivOperatorAt(k, denominator.end, false);
      if (!dop || dop.partial !== op.partial) return undefined;
      const variable = this.variableAt(dop.next, denominator.end);
      if (!variable) return undefined;
      k = variable.next;
      let order = 1;
      if (k < denominator.end && this.isChar(this.tokens[k], "^")) {
        const o = this.tokens[k + 1];
        if (o?.kind === "digit") { order = Number(o.text); k += 2; }
        else if (o?.kind === "lbrace") {
          const close = this.partner.get(k + 1)!;
          const body = this.tokens.slice(k + 2, close);
          if (!(body.length > 0 && body.every((b) => b.kind === "digit"))) return undefined;
          order = Number(body.map((b) => b.text).join(""));
          k = close + 1;
        } else return undefined;
      }
      items.push({ by: variable.name, order });
    }
    if (items.length === 0) return undefined;
    const total = items.reduce((s, it) => s + it.order, 0);
    if (total !== op.order) fail("bad_derivative", `the derivative at ${frac.pos} has order ${op.order} above and ${total} below`, frac.pos);
    if (!op.partial && items.length > 1) fail("bad_derivative", `a total derivative at ${frac.pos} by more than one variable`, frac.pos);
    if (op.order < 1 || op.order > 20) fail("bad_derivative", `the derivative order at ${frac.pos} must be from 1 to 20`, frac.pos);
    let of: Expr;
    let fromNumerator = false;
    if (op.next < numerator.end) {
      of = this.within({ start: op.next, end: numerator.end, after: denominator.after }, () => this.expression());
      fromNumerator = true;
    } else {
      this.i = denominator.after;
      if (!this.startsFactor(this.peek())) fail("missing_argument", `the derivative at ${frac.pos} needs something to act on`, frac.pos);
      of = this.postfix();
    }
    this.i = Math.max(this.i, denominator.after);
    if (fromNumerator && !op.partial && items[0].by === this.options.parameter) {
      if (of.kind === "sym") return dot(of.name, op.order);
      if (of.kind === "dot") return dot(of.name, of.order + op.order);
    }
    let result = of;
    for (let j = items.length - 1; j >= 0; j -= 1) result = deriv(result, items[j].by, items[j].order, op.partial);
    return result;
  }

}

function product(factors: Expr[]): Expr {
  return factors.length === 1 ? factors[0] : mul(...factors);
}

function isMinusOne(e: Expr): boolean {
  return (e.kind === "neg" && e.arg.kind === "num" && e.arg.value === "1") || (e.kind === "num" && e.value === "-1");
}
