import { fail } from "./errors";
import { LETTER_COMMANDS, SUBSCRIPT_COMMANDS } from "./latex-vocabulary";

/**
 * What the notebook has declared, so the reader can prefer declared names over
 * letter-by-letter reading. Names may be given as LaTeX (`"r_{s}"`, `"\\Lambda"`,
 * `"M_\\odot"`) or as plain identifiers (`"r_s"`, `"Lambda"`); they are normalised
 * with {@link normaliseName}.
 */
export interface ReadOptions {
  /** Declared constants and symbols: `["r_s", "G", "M", "c", "\\Lambda", "GM"]`. */
  readonly symbols?: readonly string[];
  /** Declared undetermined functions: `["A", "B"]` makes `A(r)` a call rather than A·r. */
  readonly functions?: readonly string[];
  /** Declared coordinates: `d` followed by one of them is a differential (`dr`, `d\theta`). */
  readonly coordinates?: readonly string[];
  /** The curve parameter: `\frac{dr}{d\tau}` is `\dot r` when τ is it. Default `"tau"`. */
  readonly parameter?: string;
  /** Force (true) or forbid (false) line-element reading of `d`; by default it is on when the source starts with `ds^2`, `d\tau^2` or `d\sigma^2`. */
  readonly lineElement?: boolean;
}

/** Longest source a reader accepts, in characters. */
export const MAX_SOURCE_LENGTH = 20_000;
/** Deepest nesting (groups, parentheses, unary signs) a reader accepts. */
export const MAX_DEPTH = 200;

/** Options after normalisation: sets of plain identifiers. */
export interface ResolvedOptions {
  readonly symbols: ReadonlySet<string>;
  readonly functions: ReadonlySet<string>;
  readonly coordinates: ReadonlySet<string>;
  /** symbols ∪ coordinates ∪ functions: every name that beats letter-by-letter reading. */
  readonly declared: ReadonlySet<string>;
  readonly parameter: string;
  readonly lineElement: boolean | undefined;
}

const WRAPPER = /\\(?:mathrm|text|textrm|operatorname|mathit|rm|it)\b/g;
const SUBSCRIPT_SIGNS: Readonly<Record<string, string>> = { "+": "plus", "-": "minus" };

/**
 * Turns a declared name, LaTeX or plain, into the canonical plain identifier
 * (backslashes dropped, subscripts written `_x`). Throws a ReadError (code
 * "bad_name") when the result is not an identifier.
 *
 * @example
 * normaliseName("r_{s}")          // "r_s"
 * normaliseName("\\Lambda")       // "Lambda"
 * normaliseName("M_\\odot")       // "M_odot"
 * normaliseName("V_{\\rm eff}")   // "V_eff"
 * normaliseName("g_{\\theta\\theta}") // "g_thetatheta"
 */
export function normaliseName(name: string): string {
  for (const m of name.replace(WRAPPER, "").matchAll(/\\([A-Za-z]+)/g)) {
    if (!LETTER_COMMANDS.has(m[1]) && !SUBSCRIPT_COMMANDS.has(m[1])) {
      fail("bad_name", `cannot read the declared name "${name}": \\${m[1]} is not a letter`, 0);
    }
  }
  const plain = name
    .replace(WRAPPER, "")
    .replace(/[{}\s\\]/g, "")
    .replace(/_([+-])/g, (_m, sign: string) => `_${SUBSCRIPT_SIGNS[sign]}`);
  if (!/^[A-Za-z][A-Za-z0-9_]*$/.test(plain)) {
    return fail("bad_name", `cannot read the declared name "${name}" as a symbol`, 0);
  }
  return plain;
}

/** Normalises every declared list once per read. */
export function resolveOptions(options: ReadOptions = {}): ResolvedOptions {
  const set = (list: readonly string[] | undefined) => new Set((list ?? []).map(normaliseName));
  const symbols = set(options.symbols);
  const functions = set(options.functions);
  const coordinates = set(options.coordinates);
  return {
    symbols,
    functions,
    coordinates,
    declared: new Set([...symbols, ...coordinates, ...functions]),
    parameter: options.parameter === undefined ? "tau" : normaliseName(options.parameter),
    lineElement: options.lineElement,
  };
}

/** Rejects sources longer than {@link MAX_SOURCE_LENGTH} before any work is done. */
export function guardLength(source: string): void {
  if (typeof source !== "string") fail("unexpected", "the source is not a string", 0);
  if (source.length > MAX_SOURCE_LENGTH) {
    fail("too_long", `the source is ${source.length} characters long; at most ${MAX_SOURCE_LENGTH} are read`, MAX_SOURCE_LENGTH);
  }
}
