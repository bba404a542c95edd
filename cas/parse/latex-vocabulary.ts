/**
 * The LaTeX commands the reader and the LaTeX printer agree on: which command
 * names are symbols, which are functions, which only space or size things.
 */

/** Greek letters and other letter-like commands read as symbols named after the command (`\theta` → `theta`). */
export const LETTER_COMMANDS: ReadonlySet<string> = new Set([
  "alpha", "beta", "gamma", "delta", "epsilon", "varepsilon", "zeta", "eta", "theta", "vartheta",
  "iota", "kappa", "lambda", "mu", "nu", "xi", "varpi", "rho", "varrho", "sigma", "varsigma",
  "tau", "upsilon", "phi", "varphi", "chi", "psi", "omega",
  "Gamma", "Delta", "Theta", "Lambda", "Xi", "Pi", "Sigma", "Upsilon", "Phi", "Psi", "Omega",
  "hbar", "ell",
]);

/** Commands allowed only inside a subscript (`M_\odot` → `M_odot`). */
export const SUBSCRIPT_COMMANDS: ReadonlySet<string> = new Set(["odot", "oplus", "star", "bullet", "ast", "infty", "pm", "mp", "pi"]);

/** Function commands and the built-in function they read as. */
export const FUNCTION_COMMANDS: Readonly<Record<string, string>> = {
  sin: "sin", cos: "cos", tan: "tan", sec: "sec", csc: "csc", cot: "cot",
  arcsin: "asin", arccos: "acos", arctan: "atan",
  sinh: "sinh", cosh: "cosh", tanh: "tanh",
  exp: "exp", ln: "log", log: "log",
};

/** Function names that, typed as bare letters (`sin x`), are almost surely a missing backslash. */
export const BARE_FUNCTION_WORDS: ReadonlySet<string> = new Set([
  "sin", "cos", "tan", "sec", "csc", "cot", "sinh", "cosh", "tanh", "arcsin", "arccos", "arctan", "exp", "ln", "log", "sqrt", "lim",
]);

/** Commands that only change size or style; the reader drops them. */
export const IGNORED_COMMANDS: ReadonlySet<string> = new Set([
  "displaystyle", "textstyle", "scriptstyle", "scriptscriptstyle", "limits", "nolimits",
  "big", "Big", "bigg", "Bigg", "bigl", "bigr", "Bigl", "Bigr", "biggl", "biggr", "Biggl", "Biggr",
  "bigm", "Bigm", "biggm", "Biggm", "mathstrut", "strut",
]);

/** Spacing commands; they separate a bare function argument from what follows (`\sin\theta\,r`). */
export const SPACING_COMMANDS: ReadonlySet<string> = new Set([
  "quad", "qquad", "enspace", "thinspace", "medspace", "thickspace", "negthinspace", "negmedspace", "negthickspace", "space",
]);

/** Upright-text wrappers whose content is one name (`\mathrm{d}`, `\text{eff}`, `\operatorname{sn}`). */
export const WRAPPER_COMMANDS: ReadonlySet<string> = new Set(["mathrm", "text", "textrm", "mathit", "operatorname", "mathsf", "textit"]);
