/**
 * Dimensions as exponents of the base dimensions mass M, length L, time T.
 * Exponents may be fractions (√r has L^1/2); they are kept as numbers and
 * compared to 1e-9.
 *
 * @example
 * formatDimension(parseDimension("angular momentum")) // "M L^2 T^-1"
 */
export interface Dimension {
  readonly M: number;
  readonly L: number;
  readonly T: number;
}

export const DIMENSIONLESS: Dimension = { M: 0, L: 0, T: 0 };

/** The names a notebook may use for a dimension. */
export const NAMED_DIMENSIONS: Readonly<Record<string, Dimension>> = {
  dimensionless: DIMENSIONLESS,
  mass: { M: 1, L: 0, T: 0 },
  length: { M: 0, L: 1, T: 0 },
  time: { M: 0, L: 0, T: 1 },
  velocity: { M: 0, L: 1, T: -1 },
  acceleration: { M: 0, L: 1, T: -2 },
  energy: { M: 1, L: 2, T: -2 },
  "angular momentum": { M: 1, L: 2, T: -1 },
  action: { M: 1, L: 2, T: -1 },
  momentum: { M: 1, L: 1, T: -1 },
  force: { M: 1, L: 1, T: -2 },
};

/** Thrown for a dimension text that is neither a name nor a product of powers of M, L, T. */
export class DimensionSyntaxError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "DimensionSyntaxError";
  }
}

/**
 * Reads "M L^2 T^-1", "L^3 M^-1 T^-2", "M*L^2/T", "1" or a name ("energy").
 *
 * @example
 * parseDimension("L T^-1") // { M: 0, L: 1, T: -1 }
 */
export function parseDimension(text: string): Dimension {
  const t = text.trim();
  const named = NAMED_DIMENSIONS[t.toLowerCase().replace(/\s+/g, " ")];
  if (named) return named;
  if (t === "1" || t === "") return DIMENSIONLESS;
  const out = { M: 0, L: 0, T: 0 };
  // A "/" inside braces is a fractional exponent (L^{1/2}); outside it starts the denominator.
  const [numerator, denominator, extra] = t.split(/\/(?![^{]*\})/);
  if (extra !== undefined) throw new DimensionSyntaxError(`"${text}": at most one "/" in a dimension`);
  const read = (part: string, sign: number) => {
    for (const token of part.split(/[\s*·]+/).filter(Boolean)) {
      const m = /^([MLT])(?:\^\{?(-?\d+(?:\.\d+)?(?:\/\d+)?)\}?)?$/.exec(token);
      if (!m) {
        if (token === "1") continue;
        throw new DimensionSyntaxError(`"${text}": cannot read "${token}" (write powers of M, L, T such as "M L^2 T^-1", or a name such as "energy")`);
      }
      const exp = m[2] === undefined ? 1 : m[2].includes("/") ? Number(m[2].split("/")[0]) / Number(m[2].split("/")[1]) : Number(m[2]);
      out[m[1] as "M" | "L" | "T"] += sign * exp;
    }
  };
  read(numerator, 1);
  if (denominator !== undefined) read(denominator.replace(/^\(|\)$/g, ""), -1);
  return out;
}

const near = (a: number, b: number) => Math.abs(a - b) < 1e-9;

export function sameDimension(a: Dimension, b: Dimension): boolean {
  return near(a.M, b.M) && near(a.L, b.L) && near(a.T, b.T);
}

export function multiplyDimensions(a: Dimension, b: Dimension): Dimension {
  return { M: a.M + b.M, L: a.L + b.L, T: a.T + b.T };
}

export function powerOfDimension(a: Dimension, n: number): Dimension {
  return { M: a.M * n, L: a.L * n, T: a.T * n };
}

function exponentText(n: number): string {
  if (Number.isInteger(n)) return String(n);
  for (const d of [2, 3, 4, 6]) if (near(n * d, Math.round(n * d))) return `${Math.round(n * d)}/${d}`;
  return String(n);
}

/** "M L^2 T^-2", or "dimensionless". */
export function formatDimension(d: Dimension): string {
  const parts = (["M", "L", "T"] as const)
    .filter((k) => !near(d[k], 0))
    .map((k) => (near(d[k], 1) ? k : `${k}^${exponentText(d[k])}`));
  return parts.length ? parts.join(" ") : "dimensionless";
}

/** The common name of a dimension when it has one ("energy"), else undefined. */
export function nameOfDimension(d: Dimension): string | undefined {
  for (const [name, dim] of Object.entries(NAMED_DIMENSIONS)) if (sameDimension(dim, d)) return name === "action" ? undefined : name;
  return undefined;
}

/** Dimensions built in unless the notebook declares otherwise: G and c in SI. */
export const BUILTIN_DIMENSIONS: Readonly<Record<string, Dimension>> = {
  G: { M: -1, L: 3, T: -2 },
  c: { M: 0, L: 1, T: -1 },
};
