import type { Expr, RelationOp, Statement } from "../expr/types";
import { add, call, deriv, differential, div, dot, euler, infinity, limit, mul, neg, num, pi, pow, relation, sym } from "../expr/build";
import { fail } from "./errors";
import { guardLength, MAX_DEPTH, resolveOptions, type ReadOptions, type ResolvedOptions } from "./options";

/**
 * Reader for the plain calculator syntax, the `expr` form of every API answer
 * and what {@link toPlain} prints.
 *
 * - numbers `2`, `0.5`, `6.674e-11`; identifiers `r_s`, `theta`, `g_tt`
 *   (letters, digits, underscores, starting with a letter);
 * - `+ - * /`, `^` (right-associative, `**` is accepted too), unary minus,
 *   parentheses; multiplication is always written `*` (`2x` is an error);
 * - `name(args)` is always a function call (`sin(x)`, `A(r)`); `ln` and `arcsin`…
 *   are read as `log` and `asin`…;
 * - constants `pi`, `e` (Euler's number unless `e` is a declared symbol), `infinity`;
 * - relations `= < > <= >= !=`, one per statement (`a = b = c` is rejected);
 * - the calculus forms, reserved as call names:
 *   `dot(r)` = ṙ, `ddot(r)` = r̈, `dot(r, 3)` = third derivative by the parameter,
 *   `d(t)` = the differential dt,
 *   `diff(f, r)` / `diff(f, r, 2)` = d/dr f, `pdiff(f, r)` = ∂f/∂r
 *   (a derivative by a dotted symbol names it as `r_dot`),
 *   `limit(f, c, infinity)` = lim_{c→∞} f.
 *
 * @example
 * readPlain("(1-r_s/r)*c^2*dot(t)^2 - dot(r)^2/(1-r_s/r) = c^2")
 */
export function readPlain(source: string, options?: ReadOptions): Statement {
  guardLength(source);
  return new PlainReader(source, resolveOptions(options)).statement();
}

/**
 * Like {@link readPlain} but rejects relations.
 *
 * @example
 * readPlainExpr("G*M/r^2")   // div(mul(G, M), pow(r, 2))
 */
export function readPlainExpr(source: string, options?: ReadOptions): Expr {
  const s = readPlain(source, options);
  if (s.kind === "relation") fail("unexpected", "expected an expression, found a relation", relationPosition(source));
  return s;
}

/** Alias kept for code that calls the plain reader by its older name. */
export const parsePlain = readPlainExpr;

/** Call names with a fixed meaning in the plain syntax. */
export const PLAIN_RESERVED_CALLS = ["dot", "ddot", "dddot", "d", "diff", "pdiff", "limit"] as const;

const ALIASES: Readonly<Record<string, string>> = { ln: "log", arcsin: "asin", arccos: "acos", arctan: "atan" };
const RELATIONS: readonly RelationOp[] = ["<=", ">=", "!=", "=", "<", ">"];

function relationPosition(source: string): number {
  const m = /[=<>!]/.exec(source);
  return m ? m.index : 0;
}

type TokenKind = "num" | "id" | "op" | "end";
interface Token { readonly kind: TokenKind; readonly text: string; readonly pos: number }

function tokenize(source: string): Token[] {
  const out: Token[] = [];
  const re = /\s+|(\d+\.?\d*(?:[eE][+-]?\d+)?|\.\d+(?:[eE][+-]?\d+)?)|([A-Za-z][A-Za-z0-9_]*)|(\*\*|<=|>=|!=|[-+*/^(),=<>])/y;
  let i = 0;
  while (i < source.length) {
    re.lastIndex = i;
    const m = re.exec(source);
    if (!m) fail("unexpected", `unexpected character '${source[i]}' at ${i}`, i);
    if (m[1] !== undefined) out.push({ kind: "num", text: m[1], pos: i });
    else if (m[2] !== undefined) out.push({ kind: "id", text: m[2], pos: i });
    else if (m[3] !== undefined) out.push({ kind: "op", text: m[3] === "**" ? "^" : m[3], pos: i });
    i = re.lastIndex;
  }
  out.push({ kind: "end", text: "", pos: source.length });
  return out;
}

class PlainReader {
  private readonly tokens: Token[];
  private i = 0;
  private depth = 0;

  constructor(source: string, private readonly options: ResolvedOptions) {
    this.tokens = tokenize(source);
    if (this.tokens.length === 1) fail("empty", "the source is empty", 0);
  }

  private peek(): Token { return this.tokens[this.i]; }
  private next(): Token { return this.tokens[this.i++]; }
  private isOp(text: string): boolean { const t = this.peek(); return t.kind === "op" && t.text === text; }

  private expect(text: string, what: string): Token {
    const t = this.peek();
    if (t.kind !== "op" || t.text !== text) fail("unexpected", `expected '${text}' at ${t.pos} ${what}, found ${describe(t)}`, t.pos);
    return this.next();
  }

  private enter(pos: number): void {
    this.depth += 1;
    if (this.depth > MAX_DEPTH) fail("too_deep", `nesting deeper than ${MAX_DEPTH} levels at ${pos}`, pos);
  }

  statement(): Statement {
    const lhs = this.expression();
    const opTok = this.peek();
    let result: Statement = lhs;
    if (opTok.kind === "op" && (RELATIONS as readonly string[]).includes(opTok.text)) {
      this.next();
      result = relation(lhs, opTok.text as RelationOp, this.expression());
      const again = this.peek();
      if (again.kind === "op" && (RELATIONS as readonly string[]).includes(again.text)) {
        fail("chain", `a second relation '${again.text}' at ${again.pos}: write one relation per statement`, again.pos);
      }
    }
    const end = this.peek();
    if (end.kind !== "end") {
      if (end.kind !== "op" || end.text === "(") {
        fail("missing_operator", `missing operator before ${describe(end)} at ${end.pos}: write * for multiplication`, end.pos);
      }
      fail("unexpected", `unexpected ${describe(end)} at ${end.pos}`, end.pos);
    }
    return result;
  }

  private expression(): Expr {
    this.enter(this.peek().pos);
    const terms: Expr[] = [];
    if (this.isOp("-")) { this.next(); terms.push(neg(this.term())); }
    else { if (this.isOp("+")) this.next(); terms.push(this.term()); }
    for (;;) {
      if (this.isOp("+")) { this.next(); terms.push(this.term()); }
      else if (this.isOp("-")) { this.next(); terms.push(neg(this.term())); }
      else break;
    }
    this.depth -= 1;
    return terms.length === 1 ? terms[0] : add(...terms);
  }

  private term(): Expr {
    let factors: Expr[] = [this.factor()];
    for (;;) {
      if (this.isOp("*")) { this.next(); factors.push(this.factor()); }
      else if (this.isOp("/")) { this.next(); factors = [div(product(factors), this.factor())]; }
      else break;
    }
    return product(factors);
  }

  /** A signed power: `-x^2` is -(x^2); signs nest (`--x`) up to the depth limit. */
  private factor(): Expr {
    const t = this.peek();
    if (t.kind === "op" && (t.text === "-" || t.text === "+")) {
      this.next();
      this.enter(t.pos);
      const inner = this.factor();
      this.depth -= 1;
      return t.text === "-" ? neg(inner) : inner;
    }
    return this.power();
  }

  private power(): Expr {
    const base = this.atom();
    if (!this.isOp("^")) return base;
    const caret = this.next();
    this.enter(caret.pos);
    const exponent = this.factor();
    this.depth -= 1;
    if (this.isOp("^")) { /* unreachable: factor() consumed the right-associative chain */ }
    return pow(base, exponent);
  }

  private atom(): Expr {
    const t = this.next();
    if (t.kind === "num") return num(t.text);
    if (t.kind === "op" && t.text === "(") {
      const inner = this.expression();
      this.expect(")", `to close '(' at ${t.pos}`);
      return inner;
    }
    if (t.kind === "id") {
      if (this.isOp("(")) return this.callOf(t);
      return this.named(t.text);
    }
    if (t.kind === "end") fail("unexpected", `the source ends where a value was expected at ${t.pos}`, t.pos);
    return fail("unexpected", `unexpected ${describe(t)} at ${t.pos}`, t.pos);
  }

  private named(name: string): Expr {
    if (this.options.symbols.has(name)) return sym(name);
    if (name === "pi") return pi;
    if (name === "e") return euler;
    if (name === "infinity") return infinity;
    return sym(name);
  }

  private callOf(nameTok: Token): Expr {
    const open = this.expect("(", "after a function name");
    const args: Expr[] = [];
    if (!this.isOp(")")) {
      args.push(this.expression());
      while (this.isOp(",")) { this.next(); args.push(this.expression()); }
    }
    this.expect(")", `to close '(' at ${open.pos}`);
    const name = ALIASES[nameTok.text] ?? nameTok.text;
    if (this.options.functions.has(name)) return call(name, ...args);
    switch (name) {
      case "dot": case "ddot": case "dddot": {
        const base = name === "dot" ? 1 : name === "ddot" ? 2 : 3;
        const order = args.length === 2 && name === "dot" ? positiveInteger(args[1], nameTok) : base;
        if (args.length !== 1 && !(args.length === 2 && name === "dot")) argumentCount(nameTok, "one identifier");
        return dot(identifierOf(args[0], nameTok), order);
      }
      case "d":
        if (args.length !== 1) argumentCount(nameTok, "one identifier");
        return differential(identifierOf(args[0], nameTok));
      case "diff": case "pdiff": {
        if (args.length !== 2 && args.length !== 3) argumentCount(nameTok, "an expression, an identifier and an optional order");
        const order = args.length === 3 ? positiveInteger(args[2], nameTok) : 1;
        return deriv(args[0], identifierOf(args[1], nameTok), order, name === "pdiff");
      }
      case "limit":
        if (args.length !== 3) argumentCount(nameTok, "an expression, an identifier and a limit value");
        return limit(args[0], identifierOf(args[1], nameTok), args[2]);
      default:
        if (args.length === 0) fail("missing_argument", `${nameTok.text}() needs an argument at ${nameTok.pos}`, nameTok.pos);
        return call(name, ...args);
    }
  }
}

function product(factors: Expr[]): Expr {
  return factors.length === 1 ? factors[0] : mul(...factors);
}

function identifierOf(e: Expr | undefined, at: Token): string {
  if (e?.kind === "sym") return e.name;
  if (e?.kind === "const") return e.name;
  return fail("bad_name", `${at.text}(…) at ${at.pos} needs an identifier`, at.pos);
}

function positiveInteger(e: Expr, at: Token): number {
  if (e.kind === "num" && /^[1-9]\d*$/.test(e.value) && Number(e.value) <= 20) return Number(e.value);
  return fail("bad_number", `the order in ${at.text}(…) at ${at.pos} must be a whole number from 1 to 20`, at.pos);
}

function argumentCount(at: Token, wanted: string): never {
  return fail("missing_argument", `${at.text}(…) at ${at.pos} takes ${wanted}`, at.pos);
}

function describe(t: Token): string {
  if (t.kind === "end") return "the end";
  return `'${t.text}'`;
}
