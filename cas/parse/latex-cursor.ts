import { dotVariable } from "../expr/types";
import { fail } from "./errors";
import { MAX_DEPTH } from "./options";
import { tokenizeLatex, type LatexToken } from "./latex-tokens";
import { LETTER_COMMANDS, SUBSCRIPT_COMMANDS, WRAPPER_COMMANDS } from "./latex-vocabulary";

/** A span of tokens: read `start` up to (not including) `end`, then continue at `after`. */
export interface Range { readonly start: number; readonly end: number; readonly after: number }
/** A `d`, `\mathrm{d}` or `\partial` found by a scan, with its order and the token after it. */
export interface DerivOperator { readonly partial: boolean; readonly order: number; readonly next: number }

/**
 * The LaTeX reader's position in the token stream, with the look-ahead scans
 * that do not build trees: names and subscripts, the d/∂ of Leibniz notation,
 * and whether the source is a line element. {@link readLatex} builds on it.
 */
export abstract class LatexCursor {
  protected readonly tokens: readonly LatexToken[];
  protected readonly partner: ReadonlyMap<number, number>;
  protected i = 0;
  /** Tokens at or after `bound` read as the end (used for arguments such as `\frac12`). */
  protected bound: number;
  protected depth = 0;

  constructor(protected readonly source: string) {
    const stream = tokenizeLatex(source);
    this.tokens = stream.tokens;
    this.partner = stream.partner;
    this.bound = this.tokens.length - 1;
    if (this.bound === 0) fail("empty", "the source is empty", 0);
  }

  // ---- token access -------------------------------------------------------

  protected peek(offset = 0): LatexToken {
    const k = this.i + offset;
    return k < this.bound ? this.tokens[k] : this.endAt(this.bound);
  }
  protected tokenAt(k: number): LatexToken {
    return k < this.bound ? this.tokens[k] : this.endAt(this.bound);
  }
  protected endAt(k: number): LatexToken {
    const t = this.tokens[k];
    return { kind: "end", text: "", pos: t.pos, end: t.pos, sized: false, ws: t.ws, thin: t.thin };
  }
  protected next(): LatexToken {
    const t = this.peek();
    if (t.kind !== "end") this.i += 1;
    return t;
  }
  protected isChar(t: LatexToken, c: string): boolean { return t.kind === "char" && t.text === c; }
  protected isCmd(t: LatexToken, name: string): boolean { return t.kind === "cmd" && t.text === name; }
  protected text(t: LatexToken): string { return t.kind === "end" ? "the end" : `'${this.source.slice(t.pos, t.end)}'`; }

  protected enter(pos: number): void {
    this.depth += 1;
    if (this.depth > MAX_DEPTH) fail("too_deep", `nesting deeper than ${MAX_DEPTH} levels at ${pos}`, pos);
  }
  protected leave(): void { this.depth -= 1; }

  /** Runs `read` on the tokens of `range` only, then continues after it. */
  protected within<T>(range: Range, read: () => T): T {
    const savedBound = this.bound;
    this.i = range.start;
    this.bound = range.end;
    const out = read();
    const rest = this.peek();
    if (rest.kind !== "end") this.unexpected(rest);
    this.bound = savedBound;
    this.i = range.after;
    return out;
  }

  protected unexpected(t: LatexToken): never {
    if (t.kind === "close") fail("unbalanced", `unbalanced ${this.text(t).slice(1, -1)} at ${t.pos}`, t.pos);
    if (t.kind === "cmd" && t.text === "\\") fail("unexpected", `a line break \\\\ at ${t.pos}: write one relation per step`, t.pos);
    if (t.kind === "end") fail("unexpected", `the source ends where a value was expected at ${t.pos}`, t.pos);
    if (this.isChar(t, ",")) fail("unexpected", `unexpected ',' at ${t.pos}: write one relation per step`, t.pos);
    return fail("unexpected", `unexpected ${this.text(t)} at ${t.pos}`, t.pos);
  }

  // ---- names and subscripts -----------------------------------------------

  /** Reads the subscript whose `_` is at token `k`, without moving; returns its plain text and the index after it. */
  protected subscriptAt(k: number): { text: string; next: number } {
    const underscore = this.tokenAt(k);
    const t = this.tokenAt(k + 1);
    if (t.kind === "lbrace") {
      const close = this.partner.get(k + 1)!;
      const text = this.subscriptText(k + 2, close, underscore);
      return { text, next: close + 1 };
    }
    if (t.kind === "cmd" && WRAPPER_COMMANDS.has(t.text)) {
      const open = k + 2;
      if (this.tokenAt(open).kind !== "lbrace") fail("bad_name", `\\${t.text} at ${t.pos} needs braces`, t.pos);
      const close = this.partner.get(open)!;
      return { text: this.subscriptText(open + 1, close, underscore), next: close + 1 };
    }
    if (t.kind === "cmd" && t.text === "rm") {
      let j = k + 2;
      let text = "";
      while (this.tokenAt(j).kind === "letter" && (j === k + 2 || (!this.tokenAt(j).ws && !this.tokenAt(j).thin))) { text += this.tokenAt(j).text; j += 1; }
      if (text === "") fail("bad_name", `empty subscript at ${underscore.pos}`, underscore.pos);
      return { text, next: j };
    }
    const piece = this.subscriptPiece(t, underscore);
    return { text: piece, next: k + 2 };
  }

  protected subscriptText(from: number, to: number, underscore: LatexToken): string {
    let text = "";
    for (let j = from; j < to; j += 1) {
      const t = this.tokens[j];
      if (t.kind === "lbrace") {
        const close = this.partner.get(j)!;
        text += this.subscriptText(j + 1, close, underscore);
        j = close;
      } else if (t.kind === "cmd" && (t.text === "rm" || t.text === "mathrm" || t.text === "text" || WRAPPER_COMMANDS.has(t.text))) {
        // the braces that follow are read as a nested group on the next turn
      } else if (this.isChar(t, "_")) {
        text += "_";
      } else {
        text += this.subscriptPiece(t, underscore);
      }
    }
    if (text === "" || text.startsWith("_") || text.endsWith("_")) fail("bad_name", `empty subscript at ${underscore.pos}`, underscore.pos);
    return text;
  }

  protected subscriptPiece(t: LatexToken, underscore: LatexToken): string {
    if (t.kind === "letter" || t.kind === "digit") return t.text;
    if (t.kind === "cmd" && (LETTER_COMMANDS.has(t.text) || SUBSCRIPT_COMMANDS.has(t.text))) return t.text;
    if (this.isChar(t, "*")) return "ast";
    if (this.isChar(t, "+")) return "plus";
    if (this.isChar(t, "-")) return "minus";
    if (t.kind === "end") return fail("bad_name", `empty subscript at ${underscore.pos}`, underscore.pos);
    return fail("bad_name", `cannot read ${this.text(t)} at ${t.pos} in a subscript`, t.pos);
  }

  /** The symbol name starting at token `k` (a letter or letter command with its subscript), without moving. */
  protected symbolNameAt(k: number): { text: string; next: number } | undefined {
    const t = this.tokenAt(k);
    if (!(t.kind === "letter" || (t.kind === "cmd" && LETTER_COMMANDS.has(t.text)))) return undefined;
    if (this.isChar(this.tokenAt(k + 1), "_")) {
      const sub = this.subscriptAt(k + 1);
      return { text: `${t.text}_${sub.text}`, next: sub.next };
    }
    return { text: t.text, next: k + 1 };
  }

  /** The text inside `\mathrm{…}`-like wrappers: one name of letters and digits. */
  protected wrapperContent(cmd: LatexToken): string {
    const open = this.peek();
    if (open.kind === "letter" || open.kind === "digit") { this.next(); return open.text; }
    if (open.kind !== "lbrace") fail("missing_argument", `\\${cmd.text} at ${cmd.pos} needs braces`, cmd.pos);
    const close = this.partner.get(this.i)!;
    const inner = this.tokens.slice(this.i + 1, close);
    const text = inner.map((t) => t.text).join("");
    if (!(inner.length > 0 && inner.every((t, j) => (t.kind === "letter" || t.kind === "digit") && (j === 0 || (!t.ws && !t.thin))) && /^[A-Za-z]/.test(text))) {
      fail("bad_name", `\\${cmd.text}{…} at ${cmd.pos} must hold one name of letters and digits`, cmd.pos);
    }
    this.i = close + 1;
    return text;
  }

  /** `\rm d` or `{\rm eff}`: the letters after `\rm`. */
  protected rmContent(): string {
    let text = "";
    const first = this.peek();
    while (this.peek().kind === "letter" && (text === "" || (!this.peek().ws && !this.peek().thin))) text += this.next().text;
    if (text === "") fail("missing_argument", `\\rm at ${first.pos} needs letters after it`, first.pos);
    return text;
  }

  /** `d`, `\mathrm{d}`, `{\rm d}` or `\partial` at token k, with an optional order `^2` when allowed. */
  protected derivOperatorAt(k: number, end: number, allowOrder: boolean): DerivOperator | undefined {
    const t = this.tokens[k];
    if (k >= end || !t) return undefined;
    let partial = false;
    let next: number;
    if (t.kind === "letter" && t.text === "d") next = k + 1;
    else if (t.kind === "cmd" && t.text === "partial") { partial = true; next = k + 1; }
    else if (t.kind === "cmd" && (t.text === "mathrm" || t.text === "text" || t.text === "textrm")) {
      const a = this.tokens[k + 1];
      if (a?.kind === "letter" && a.text === "d") next = k + 2;
      else if (a?.kind === "lbrace" && this.tokens[k + 2]?.text === "d" && this.tokens[k + 2]?.kind === "letter" && this.tokens[k + 3]?.kind === "rbrace") next = k + 4;
      else return undefined;
    } else if (t.kind === "lbrace" && this.isCmd(this.tokens[k + 1], "rm") && this.tokens[k + 2]?.kind === "letter" && this.tokens[k + 2]?.text === "d" && this.tokens[k + 3]?.kind === "rbrace") next = k + 4;
    else return undefined;
    let order = 1;
    if (allowOrder && next < end && this.isChar(this.tokens[next], "^")) {
      const o = this.tokens[next + 1];
      if (o?.kind === "digit") { order = Number(o.text); next += 2; }
      else if (o?.kind === "lbrace") {
        const close = this.partner.get(next + 1)!;
        const body = this.tokens.slice(next + 2, close);
        if (!(body.length > 0 && body.every((b) => b.kind === "digit"))) return undefined;
        order = Number(body.map((b) => b.text).join(""));
        next = close + 1;
      } else return undefined;
    }
    if (next > end) return undefined;
    return { partial, order, next };
  }

  /** The variable after a d/∂ in a denominator: a symbol, or a dotted symbol for partials (`\partial \dot r` → `r_dot`). */
  protected variableAt(k: number, end: number): { name: string; next: number } | undefined {
    const t = this.tokens[k];
    if (k >= end || !t) return undefined;
    if (t.kind === "cmd" && (t.text === "dot" || t.text === "ddot")) {
      const order = t.text === "dot" ? 1 : 2;
      const open = this.tokens[k + 1];
      if (open?.kind === "lbrace") {
        const close = this.partner.get(k + 1)!;
        const inner = this.symbolNameAt(k + 2);
        if (!inner || inner.next !== close) return undefined;
        return { name: dotVariable(inner.text, order), next: close + 1 };
      }
      const inner = this.symbolNameAt(k + 1);
      return inner ? { name: dotVariable(inner.text, order), next: inner.next } : undefined;
    }
    const s = this.symbolNameAt(k);
    return s ? { name: s.text, next: s.next } : undefined;
  }

  // ---- context ------------------------------------------------------------

  /** `ds^2`, `d\tau^2`, `d\sigma^2` (with d, \mathrm{d} or {\rm d}) at the start mark a line element. */
  protected startsLikeLineElement(): boolean {
    const op = this.derivOperatorAt(0, this.tokens.length - 1, false);
    if (!op || op.partial) return false;
    const v = this.tokens[op.next];
    const isInterval = (v?.kind === "letter" && v.text === "s") || (v?.kind === "cmd" && (v.text === "tau" || v.text === "sigma"));
    return isInterval && this.isChar(this.tokens[op.next + 1], "^");
  }
}
