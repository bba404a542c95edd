// Metrics used by the spacetime tests and the curvature bench, as plain-syntax
// components. Line elements from the named textbooks; the SymPy cross-check
// script reads the same strings.
import { readPlainExpr } from "@/cas/parse/plain";
import { metricFromComponents, type Metric } from "@/cas/spacetime/metric";

export interface MetricCase {
  readonly name: string;
  readonly coordinates: string[];
  /** Plain syntax, row by row; "0" for zero entries. */
  readonly components: string[][];
  readonly functions?: string[];
}

const diag = (entries: string[]): string[][] => entries.map((e, i) => entries.map((_, j) => (i === j ? e : "0")));

const SPHERICAL = ["t", "r", "theta", "phi"];

/** Schwarzschild in Schwarzschild coordinates (MTW (1973) §31.2, eq. 31.1). */
export const SCHWARZSCHILD: MetricCase = {
  name: "Schwarzschild",
  coordinates: SPHERICAL,
  components: diag(["-(1 - r_s/r)*c^2", "1/(1 - r_s/r)", "r^2", "r^2*sin(theta)^2"]),
};

/** Reissner–Nordström in geometrised Gaussian units, r_Q^2 = G Q^2/(4 pi epsilon_0 c^4) (Carroll (2004) §5.6, eq. 5.139). */
export const REISSNER_NORDSTROM: MetricCase = {
  name: "Reissner–Nordström",
  coordinates: SPHERICAL,
  components: diag(["-(1 - r_s/r + r_Q^2/r^2)*c^2", "1/(1 - r_s/r + r_Q^2/r^2)", "r^2", "r^2*sin(theta)^2"]),
};

/** Schwarzschild–de Sitter (Kottler) (e.g. Griffiths & Podolský, Exact Space-Times (2009) §9.2). */
export const SCHWARZSCHILD_DE_SITTER: MetricCase = {
  name: "Schwarzschild–de Sitter",
  coordinates: SPHERICAL,
  components: diag(["-(1 - r_s/r - Lambda*r^2/3)*c^2", "1/(1 - r_s/r - Lambda*r^2/3)", "r^2", "r^2*sin(theta)^2"]),
};

/** Kerr in Boyer–Lindquist coordinates, r_s = 2GM/c^2 (MTW (1973) §33.2, eq. 33.2). */
const SIGMA = "(r^2 + a^2*cos(theta)^2)";
const DELTA = "(r^2 - r_s*r + a^2)";
export const KERR: MetricCase = {
  name: "Kerr (Boyer–Lindquist)",
  coordinates: SPHERICAL,
  components: [
    [`-(1 - r_s*r/${SIGMA})*c^2`, "0", "0", `-r_s*r*a*sin(theta)^2*c/${SIGMA}`],
    ["0", `${SIGMA}/${DELTA}`, "0", "0"],
    ["0", "0", SIGMA, "0"],
    [`-r_s*r*a*sin(theta)^2*c/${SIGMA}`, "0", "0", `(r^2 + a^2 + r_s*r*a^2*sin(theta)^2/${SIGMA})*sin(theta)^2`],
  ],
};

/** Flat space in spherical coordinates. */
export const FLAT_SPHERICAL: MetricCase = {
  name: "flat (spherical)",
  coordinates: SPHERICAL,
  components: diag(["-c^2", "1", "r^2", "r^2*sin(theta)^2"]),
};

/** General static spherically symmetric, undetermined A(r), B(r) (Carroll (2004) §5.2, eq. 5.14 with e^{2α}=A, e^{2β}=B). */
export const STATIC_SPHERICAL: MetricCase = {
  name: "static spherical A(r), B(r)",
  coordinates: SPHERICAL,
  components: diag(["-A(r)*c^2", "B(r)", "r^2", "r^2*sin(theta)^2"]),
  functions: ["A", "B"],
};

/** Flat FLRW with scale factor a(t) (Carroll (2004) §8.3, eq. 8.21 with k = 0). */
export const FLRW_FLAT: MetricCase = {
  name: "FLRW (k = 0)",
  coordinates: ["t", "x", "y", "z"],
  components: diag(["-c^2", "a(t)^2", "a(t)^2", "a(t)^2"]),
  functions: ["a"],
};

/** Closed FLRW in hyperspherical coordinates, R(t) the scale factor (Carroll (2004) §8.2). */
export const FLRW_CLOSED: MetricCase = {
  name: "FLRW (k = +1)",
  coordinates: ["t", "chi", "theta", "phi"],
  components: diag(["-1", "R(t)^2", "R(t)^2*sin(chi)^2", "R(t)^2*sin(chi)^2*sin(theta)^2"]),
  functions: ["R"],
};

/** Ingoing Vaidya with mass function m(v) (Griffiths & Podolský (2009) §9.5), geometric units. */
export const VAIDYA: MetricCase = {
  name: "Vaidya m(v)",
  coordinates: ["v", "r", "theta", "phi"],
  components: [
    ["-(1 - 2*m(v)/r)", "1", "0", "0"],
    ["1", "0", "0", "0"],
    ["0", "0", "r^2", "0"],
    ["0", "0", "0", "r^2*sin(theta)^2"],
  ],
  functions: ["m"],
};

export function metricOf(c: MetricCase): Metric {
  const read = (s: string) => readPlainExpr(s, { functions: c.functions ?? [] });
  return metricFromComponents(c.components.map((row) => row.map(read)), c.coordinates);
}
