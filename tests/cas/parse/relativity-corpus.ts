import type { ReadOptions } from "@/cas/parse";
import { dotVariable } from "@/cas/expr/types";

/**
 * LaTeX as relativists write it, with its meaning in the plain syntax (written
 * by hand, independently of the reader) and where the formula comes from.
 * Equation numbers marked "from memory" were not checked against the book.
 */
export interface CorpusEntry {
  readonly latex: string;
  readonly plain: string;
  readonly source: string;
  readonly options?: ReadOptions;
}

const schwarzschildSymbols: ReadOptions = { symbols: ["r_s"] };
const kerr: ReadOptions = { symbols: ["\\Sigma", "\\Delta"] };

export const RELATIVITY_CORPUS: readonly CorpusEntry[] = [
  // ---- line elements ----
  {
    latex: "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2\\,dt^2 + \\left(1-\\frac{r_s}{r}\\right)^{-1}dr^2 + r^2\\left(d\\theta^2+\\sin^2\\theta\\,d\\phi^2\\right)",
    plain: "d(s)^2 = -(1-r_s/r)*c^2*d(t)^2 + (1-r_s/r)^(-1)*d(r)^2 + r^2*(d(theta)^2 + sin(theta)^2*d(phi)^2)",
    source: "Schwarzschild, Carroll, Spacetime and Geometry (2004) eq. 5.38 (from memory)",
    options: schwarzschildSymbols,
  },
  {
    latex: "ds^2 = -\\left(1-\\frac{2M}{r}\\right)dt^2 + \\left(1-\\frac{2M}{r}\\right)^{-1}dr^2 + r^2 d\\Omega^2",
    plain: "d(s)^2 = -(1-2*M/r)*d(t)^2 + (1-2*M/r)^(-1)*d(r)^2 + r^2*d(Omega)^2",
    source: "Schwarzschild in G=c=1, Hartle, Gravity (2003) eq. 9.1 (from memory)",
  },
  {
    latex: "\\mathrm{d}s^2 = -\\left(1-\\frac{2GM}{rc^2}\\right)c^2\\mathrm{d}t^2 + \\frac{\\mathrm{d}r^2}{1-\\frac{2GM}{rc^2}} + r^2\\,\\mathrm{d}\\Omega^2",
    plain: "d(s)^2 = -(1-2*G*M/(r*c^2))*c^2*d(t)^2 + d(r)^2/(1-2*G*M/(r*c^2)) + r^2*d(Omega)^2",
    source: "Schwarzschild in SI units, Misner-Thorne-Wheeler, Gravitation (1973) eq. 31.1 (from memory)",
  },
  {
    latex: "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2dt^2 + \\frac{dr^2}{1-\\frac{r_s}{r}} + r^2d\\phi^2",
    plain: "d(s)^2 = -(1-r_s/r)*c^2*d(t)^2 + d(r)^2/(1-r_s/r) + r^2*d(phi)^2",
    source: "equatorial Schwarzschild, Hartle (2003) ch. 9 (from memory)",
  },
  {
    latex: "ds^2 = -\\left(1-\\frac{2M}{r}+\\frac{Q^2}{r^2}\\right)dt^2 + \\left(1-\\frac{2M}{r}+\\frac{Q^2}{r^2}\\right)^{-1}dr^2 + r^2d\\Omega^2",
    plain: "d(s)^2 = -(1-2*M/r+Q^2/r^2)*d(t)^2 + (1-2*M/r+Q^2/r^2)^(-1)*d(r)^2 + r^2*d(Omega)^2",
    source: "Reissner-Nordstrom, Carroll (2004) eq. 6.31 (from memory)",
  },
  {
    latex: "ds^2 = -\\left(1-\\frac{2M}{r}-\\frac{\\Lambda r^2}{3}\\right)dt^2 + \\frac{dr^2}{1-\\frac{2M}{r}-\\frac{\\Lambda r^2}{3}} + r^2\\left(d\\theta^2 + \\sin^2\\theta\\, d\\phi^2\\right)",
    plain: "d(s)^2 = -(1-2*M/r-Lambda*r^2/3)*d(t)^2 + d(r)^2/(1-2*M/r-Lambda*r^2/3) + r^2*(d(theta)^2 + sin(theta)^2*d(phi)^2)",
    source: "Schwarzschild-de Sitter (Kottler), Rindler, Relativity: Special, General, and Cosmological (2006) ch. 15 (from memory)",
  },
  {
    latex: "ds^2 = -\\left(1-\\frac{2Mr}{\\Sigma}\\right)dt^2 - \\frac{4Mar\\sin^2\\theta}{\\Sigma}\\,dt\\,d\\phi + \\frac{\\Sigma}{\\Delta}dr^2 + \\Sigma\\, d\\theta^2 + \\left(r^2+a^2+\\frac{2Ma^2r\\sin^2\\theta}{\\Sigma}\\right)\\sin^2\\theta\\, d\\phi^2",
    plain: "d(s)^2 = -(1-2*M*r/Sigma)*d(t)^2 - 4*M*a*r*sin(theta)^2/Sigma*d(t)*d(phi) + Sigma/Delta*d(r)^2 + Sigma*d(theta)^2 + (r^2+a^2+2*M*a^2*r*sin(theta)^2/Sigma)*sin(theta)^2*d(phi)^2",
    source: "Kerr in Boyer-Lindquist coordinates, Carroll (2004) eq. 6.70 (from memory)",
    options: kerr,
  },
  {
    latex: "\\Sigma = r^2 + a^2\\cos^2\\theta",
    plain: "Sigma = r^2 + a^2*cos(theta)^2",
    source: "Kerr, Carroll (2004) eq. 6.71 (from memory)",
    options: kerr,
  },
  {
    latex: "\\Delta = r^2 - 2Mr + a^2",
    plain: "Delta = r^2 - 2*M*r + a^2",
    source: "Kerr, Carroll (2004) eq. 6.71 (from memory)",
    options: kerr,
  },
  {
    latex: "ds^2 = -c^2dt^2 + a(t)^2\\left[\\frac{dr^2}{1-kr^2} + r^2 d\\Omega^2\\right]",
    plain: "d(s)^2 = -c^2*d(t)^2 + a(t)^2*(d(r)^2/(1-k*r^2) + r^2*d(Omega)^2)",
    source: "FLRW, Carroll (2004) eq. 8.1 (from memory)",
    options: { functions: ["a"] },
  },
  {
    latex: "ds^2 = -dt^2 + a^2(t)\\left(dx^2+dy^2+dz^2\\right)",
    plain: "d(s)^2 = -d(t)^2 + a(t)^2*(d(x)^2+d(y)^2+d(z)^2)",
    source: "spatially flat FLRW, Hartle (2003) eq. 18.1 (from memory)",
    options: { functions: ["a"] },
  },
  {
    latex: "ds^2 = -c^2 dt^2 + dr^2 + r^2 d\\theta^2 + r^2\\sin^2\\theta\\,d\\phi^2",
    plain: "d(s)^2 = -c^2*d(t)^2 + d(r)^2 + r^2*d(theta)^2 + r^2*sin(theta)^2*d(phi)^2",
    source: "Minkowski in spherical coordinates, Hartle (2003) eq. 7.? (from memory)",
  },
  {
    latex: "ds^2 = -\\left(\\frac{1-\\frac{M}{2\\rho}}{1+\\frac{M}{2\\rho}}\\right)^2dt^2 + \\left(1+\\frac{M}{2\\rho}\\right)^4\\left(d\\rho^2+\\rho^2d\\Omega^2\\right)",
    plain: "d(s)^2 = -((1-M/(2*rho))/(1+M/(2*rho)))^2*d(t)^2 + (1+M/(2*rho))^4*(d(rho)^2+rho^2*d(Omega)^2)",
    source: "Schwarzschild in isotropic coordinates, Misner-Thorne-Wheeler (1973) eq. 31.22 (from memory)",
  },
  {
    latex: "ds^2 = -\\left(1-\\frac{2M}{r}\\right)dv^2 + 2\\,dv\\,dr + r^2 d\\Omega^2",
    plain: "d(s)^2 = -(1-2*M/r)*d(v)^2 + 2*d(v)*d(r) + r^2*d(Omega)^2",
    source: "Eddington-Finkelstein, Hartle (2003) eq. 12.7 (from memory)",
  },
  {
    latex: "ds^2 = -\\left(1-\\frac{r^2}{\\ell^2}\\right)dt^2 + \\left(1-\\frac{r^2}{\\ell^2}\\right)^{-1}dr^2 + r^2d\\Omega^2",
    plain: "d(s)^2 = -(1-r^2/ell^2)*d(t)^2 + (1-r^2/ell^2)^(-1)*d(r)^2 + r^2*d(Omega)^2",
    source: "static de Sitter, Carroll (2004) ch. 8 (from memory)",
  },
  {
    latex: "ds^2 = -\\left(1+\\frac{2\\Phi}{c^2}\\right)c^2dt^2 + \\left(1-\\frac{2\\Phi}{c^2}\\right)\\left(dx^2+dy^2+dz^2\\right)",
    plain: "d(s)^2 = -(1+2*Phi/c^2)*c^2*d(t)^2 + (1-2*Phi/c^2)*(d(x)^2+d(y)^2+d(z)^2)",
    source: "weak-field metric, Hartle (2003) eq. 6.20 (from memory)",
  },
  {
    latex: "d\\tau^2 = \\left(1-\\frac{r_s}{r}\\right)dt^2 - \\frac{dr^2}{c^2\\left(1-\\frac{r_s}{r}\\right)}",
    plain: "d(tau)^2 = (1-r_s/r)*d(t)^2 - d(r)^2/(c^2*(1-r_s/r))",
    source: "proper time along a radial worldline, Hartle (2003) ch. 9 (from memory)",
  },
  {
    latex: "d\\Omega^2 = d\\theta^2 + \\sin^2\\theta\\,d\\phi^2",
    plain: "d(Omega)^2 = d(theta)^2 + sin(theta)^2*d(phi)^2",
    source: "unit-sphere line element, Carroll (2004) eq. 5.? (from memory)",
    options: { coordinates: ["\\Omega", "\\theta", "\\phi"] },
  },
  {
    latex: "ds^2 = -\\alpha^2x^2dt^2 + dx^2",
    plain: "d(s)^2 = -alpha^2*x^2*d(t)^2 + d(x)^2",
    source: "Rindler wedge, Misner-Thorne-Wheeler (1973) ch. 6 (from memory)",
  },
  // ---- Lagrangian, conserved quantities, normalisation ----
  {
    latex: "L = \\frac{1}{2}\\left[-\\left(1-\\frac{r_s}{r}\\right)c^2\\dot t^2 + \\frac{\\dot r^2}{1-\\frac{r_s}{r}} + r^2\\dot\\phi^2\\right]",
    plain: "L = 1/2*(-(1-r_s/r)*c^2*dot(t)^2 + dot(r)^2/(1-r_s/r) + r^2*dot(phi)^2)",
    source: "geodesic Lagrangian, Carroll (2004) sec. 5.4 (from memory)",
  },
  {
    latex: "-\\left(1-\\frac{r_s}{r}\\right)c^2\\dot{t}^2 + \\left(1-\\frac{r_s}{r}\\right)^{-1}\\dot{r}^2 + r^2\\dot{\\phi}^2 = -c^2",
    plain: "-(1-r_s/r)*c^2*dot(t)^2 + (1-r_s/r)^(-1)*dot(r)^2 + r^2*dot(phi)^2 = -c^2",
    source: "four-velocity normalisation, Hartle (2003) eq. 9.24 (from memory)",
  },
  {
    latex: "E = \\left(1-\\frac{r_s}{r}\\right)c^2\\frac{dt}{d\\tau}",
    plain: "E = (1-r_s/r)*c^2*dot(t)",
    source: "Killing energy, Carroll (2004) eq. 5.61 (from memory)",
  },
  {
    latex: "L = r^2\\frac{d\\phi}{d\\tau}",
    plain: "L = r^2*dot(phi)",
    source: "Killing angular momentum, Carroll (2004) eq. 5.62 (from memory)",
  },
  {
    latex: "e = \\left(1-\\frac{2M}{r}\\right)\\frac{dt}{d\\tau}",
    plain: "e = (1-2*M/r)*dot(t)",
    source: "specific energy, Hartle (2003) eq. 9.21a (from memory); e declared as a symbol",
    options: { symbols: ["e"] },
  },
  {
    latex: "\\ell = r^2\\frac{d\\phi}{d\\tau}",
    plain: "ell = r^2*dot(phi)",
    source: "specific angular momentum, Hartle (2003) eq. 9.21b (from memory)",
  },
  {
    latex: "E = -g_{tt}\\frac{dt}{d\\tau}",
    plain: "E = -g_tt*dot(t)",
    source: "conserved energy from the Killing vector, Carroll (2004) eq. 5.? (from memory)",
  },
  {
    latex: "\\frac{1}{2}\\mu\\dot r^2 + \\frac{L^2}{2\\mu r^2} - \\frac{GM\\mu}{r} = E",
    plain: "1/2*mu*dot(r)^2 + L^2/(2*mu*r^2) - G*M*mu/r = E",
    source: "Newtonian radial energy, Goldstein, Classical Mechanics (1980) ch. 3 (from memory)",
  },
  {
    latex: "\\frac12\\mu\\dot r^2 + V_{\\rm eff}(r) = E",
    plain: "1/2*mu*dot(r)^2 + V_eff(r) = E",
    source: "radial equation as a one-dimensional problem, Hartle (2003) eq. 9.28 (from memory)",
    options: { functions: ["V_{\\rm eff}"] },
  },
  // ---- effective potentials ----
  {
    latex: "V_{\\rm eff}(r) = -\\frac{M}{r} + \\frac{\\ell^2}{2r^2} - \\frac{M\\ell^2}{r^3}",
    plain: "V_eff(r) = -M/r + ell^2/(2*r^2) - M*ell^2/r^3",
    source: "Schwarzschild effective potential, Hartle (2003) eq. 9.29 (from memory)",
    options: { functions: ["V_{\\rm eff}"] },
  },
  {
    latex: "V(r) = \\frac{1}{2}\\epsilon - \\epsilon\\frac{GM}{r} + \\frac{L^2}{2r^2} - \\frac{GML^2}{r^3}",
    plain: "V(r) = 1/2*epsilon - epsilon*G*M/r + L^2/(2*r^2) - G*M*L^2/r^3",
    source: "Carroll (2004) eq. 5.70 (from memory)",
    options: { functions: ["V"] },
  },
  {
    latex: "\\frac{1}{2}\\left(\\frac{dr}{d\\tau}\\right)^2 + V(r) = \\frac{1}{2}E^2",
    plain: "1/2*dot(r)^2 + V(r) = 1/2*E^2",
    source: "Carroll (2004) eq. 5.69 (from memory)",
    options: { functions: ["V"] },
  },
  {
    latex: "\\frac{e^2-1}{2} = \\frac{1}{2}\\left(\\frac{dr}{d\\tau}\\right)^2 + V_{\\rm eff}",
    plain: "(e^2-1)/2 = 1/2*dot(r)^2 + V_eff",
    source: "Hartle (2003) eq. 9.28 (from memory); e is the specific energy",
    options: { symbols: ["e"] },
  },
  {
    latex: "V_{\\rm eff} = \\frac{L^2}{2\\mu r^2} - \\frac{GM\\mu}{r} - \\frac{GML^2}{\\mu c^2 r^3}",
    plain: "V_eff = L^2/(2*mu*r^2) - G*M*mu/r - G*M*L^2/(mu*c^2*r^3)",
    source: "effective potential with units, common practice (cf. Hartle (2003) ch. 9)",
  },
  {
    latex: "W_{\\rm eff}(r) = \\frac{1}{r^2}\\left(1-\\frac{2M}{r}\\right)",
    plain: "W_eff(r) = 1/r^2*(1-2*M/r)",
    source: "photon effective potential, Hartle (2003) eq. 9.47 (from memory)",
    options: { functions: ["W_{\\rm eff}"] },
  },
  {
    latex: "\\left(\\frac{du}{d\\phi}\\right)^2 = \\frac{E^2}{c^2L^2} - \\left(1-r_s u\\right)\\left(\\frac{c^2}{L^2}+u^2\\right)",
    plain: "diff(u, phi)^2 = E^2/(c^2*L^2) - (1-r_s*u)*(c^2/L^2+u^2)",
    source: "orbit equation in u = 1/r, common practice (cf. Carroll (2004) sec. 5.5)",
  },
  // ---- circular orbits, ISCO, photon sphere ----
  {
    latex: "\\frac{dV_{\\rm eff}}{dr} = 0",
    plain: "diff(V_eff, r) = 0",
    source: "circular-orbit condition, Hartle (2003) ch. 9",
  },
  {
    latex: "\\frac{d}{dr}\\left(-\\frac{M}{r}+\\frac{\\ell^2}{2r^2}-\\frac{M\\ell^2}{r^3}\\right) = 0",
    plain: "diff(-M/r + ell^2/(2*r^2) - M*ell^2/r^3, r) = 0",
    source: "circular-orbit condition, Hartle (2003) eq. 9.30 (from memory)",
  },
  {
    latex: "r = \\frac{\\ell^2}{2M}\\left(1+\\sqrt{1-\\frac{12M^2}{\\ell^2}}\\right)",
    plain: "r = ell^2/(2*M)*(1 + sqrt(1 - 12*M^2/ell^2))",
    source: "stable circular orbit radius, Hartle (2003) eq. 9.31 (from memory)",
  },
  {
    latex: "r_{\\rm ISCO} = \\frac{6GM}{c^2}",
    plain: "r_ISCO = 6*G*M/c^2",
    source: "innermost stable circular orbit, Hartle (2003) eq. 9.32 (from memory)",
  },
  {
    latex: "r_{\\mathrm{ph}} = 3M",
    plain: "r_ph = 3*M",
    source: "photon sphere, Hartle (2003) ch. 9 (from memory)",
  },
  {
    latex: "L^2 = \\frac{GMr^2}{r - \\frac{3GM}{c^2}}",
    plain: "L^2 = G*M*r^2/(r - 3*G*M/c^2)",
    source: "angular momentum per unit mass on a circular orbit, Carroll (2004) sec. 5.4 (from memory)",
  },
  {
    latex: "E = \\frac{c^2\\left(1-\\frac{2GM}{rc^2}\\right)}{\\sqrt{1-\\frac{3GM}{rc^2}}}",
    plain: "E = c^2*(1-2*G*M/(r*c^2))/sqrt(1-3*G*M/(r*c^2))",
    source: "energy per unit mass on a circular orbit, common practice (cf. Hartle (2003) ch. 9)",
  },
  {
    latex: "\\Omega^2 = \\frac{GM}{r^3}",
    plain: "Omega^2 = G*M/r^3",
    source: "circular-orbit angular velocity in coordinate time, Hartle (2003) eq. 9.? (from memory)",
  },
  {
    latex: "b_{c} = 3\\sqrt{3}\\,M",
    plain: "b_c = 3*sqrt(3)*M",
    source: "critical impact parameter of light, Hartle (2003) eq. 9.? (from memory)",
  },
  {
    latex: "r_{+} = M + \\sqrt{M^2-a^2}",
    plain: "r_plus = M + sqrt(M^2 - a^2)",
    source: "Kerr outer horizon, Carroll (2004) eq. 6.? (from memory)",
  },
  {
    latex: "r_{-} = M - \\sqrt{M^2 - Q^2}",
    plain: "r_minus = M - sqrt(M^2 - Q^2)",
    source: "Reissner-Nordstrom inner horizon, Carroll (2004) sec. 6.5 (from memory)",
  },
  // ---- equations of motion ----
  {
    latex: "\\frac{d}{d\\tau}\\left(\\frac{\\partial L}{\\partial \\dot r}\\right) - \\frac{\\partial L}{\\partial r} = 0",
    plain: `diff(pdiff(L, ${dotVariable("r", 1)}), tau) - pdiff(L, r) = 0`,
    source: "Euler-Lagrange equation, Goldstein (1980) eq. 1.57 (from memory)",
  },
  {
    latex: "\\frac{d}{d\\tau}\\left(r^2\\dot\\phi\\right) = 0",
    plain: "diff(r^2*dot(phi), tau) = 0",
    source: "phi Euler-Lagrange equation, Carroll (2004) sec. 5.4 (from memory)",
  },
  {
    latex: "\\ddot r = -\\frac{GM}{r^2} + \\frac{L^2}{r^3} - \\frac{3GML^2}{c^2r^4}",
    plain: "ddot(r) = -G*M/r^2 + L^2/r^3 - 3*G*M*L^2/(c^2*r^4)",
    source: "radial geodesic equation, common practice (cf. Carroll (2004) eq. 5.70)",
  },
  {
    latex: "\\frac{d^2r}{d\\tau^2} = -\\frac{GM}{r^2}",
    plain: "ddot(r) = -G*M/r^2",
    source: "Newtonian radial infall, Hartle (2003) ch. 3 (from memory)",
  },
  {
    latex: "\\frac{d^2u}{d\\phi^2} + u = \\frac{GM}{L^2} + \\frac{3GM}{c^2}u^2",
    plain: "diff(u, phi, 2) + u = G*M/L^2 + 3*G*M/c^2*u^2",
    source: "relativistic Binet equation, Hartle (2003) eq. 10.? (from memory)",
  },
  {
    latex: "\\dot{\\phi} = \\frac{L}{r^2}",
    plain: "dot(phi) = L/r^2",
    source: "Carroll (2004) eq. 5.62 (from memory)",
  },
  {
    latex: "\\frac{d\\tau}{dt} = \\sqrt{1-\\frac{r_s}{r}}",
    plain: "diff(tau, t) = sqrt(1 - r_s/r)",
    source: "static-observer time dilation, Hartle (2003) eq. 9.? (from memory)",
  },
  {
    latex: "\\left(\\frac{\\dot a}{a}\\right)^2 = \\frac{8\\pi G}{3}\\rho - \\frac{kc^2}{a^2}",
    plain: "(dot(a)/a)^2 = 8*pi*G/3*rho - k*c^2/a^2",
    source: "Friedmann equation, Carroll (2004) eq. 8.44 (from memory)",
  },
  {
    latex: "\\frac{\\ddot a}{a} = -\\frac{4\\pi G}{3}\\left(\\rho + \\frac{3p}{c^2}\\right)",
    plain: "ddot(a)/a = -(4*pi*G/3)*(rho + 3*p/c^2)",
    source: "acceleration equation, Carroll (2004) eq. 8.45 (from memory)",
  },
  {
    latex: "a(t) = a_0\\exp\\left(\\sqrt{\\frac{\\Lambda}{3}}\\,c\\,t\\right)",
    plain: "a(t) = a_0*exp(sqrt(Lambda/3)*c*t)",
    source: "de Sitter expansion, Carroll (2004) sec. 8.? (from memory)",
    options: { functions: ["a"] },
  },
  {
    latex: "x = \\frac{c^2}{g}\\cosh\\frac{g\\tau}{c}",
    plain: "x = c^2/g*cosh(g*tau/c)",
    source: "uniformly accelerated worldline, Misner-Thorne-Wheeler (1973) eq. 6.3 (from memory)",
  },
  // ---- precession, deflection, redshift, limits ----
  {
    latex: "\\delta\\phi_{\\rm prec} = \\frac{6\\pi GM}{c^2a\\left(1-e^2\\right)}",
    plain: "delta*phi_prec = 6*pi*G*M/(c^2*a*(1-e^2))",
    source: "perihelion precession per orbit, Misner-Thorne-Wheeler (1973) eq. 40.? (from memory); e is the eccentricity",
    options: { symbols: ["e"] },
  },
  {
    latex: "\\delta\\phi_{\\rm prec} = 6\\pi\\left(\\frac{GM}{cL}\\right)^2",
    plain: "delta*phi_prec = 6*pi*(G*M/(c*L))^2",
    source: "perihelion precession, Hartle (2003) eq. 10.12 (from memory)",
  },
  {
    latex: "\\delta\\phi_{\\rm def} = \\frac{4GM}{c^2b}",
    plain: "delta*phi_def = 4*G*M/(c^2*b)",
    source: "light deflection, Hartle (2003) eq. 9.? (from memory)",
  },
  {
    latex: "\\frac{\\omega_{\\infty}}{\\omega_*} = \\sqrt{1-\\frac{2GM}{Rc^2}}",
    plain: "omega_infty/omega_ast = sqrt(1 - 2*G*M/(R*c^2))",
    source: "gravitational redshift, Hartle (2003) eq. 9.? (from memory)",
  },
  {
    latex: "z = \\frac{1}{\\sqrt{1-\\frac{r_s}{r}}} - 1",
    plain: "z = 1/sqrt(1 - r_s/r) - 1",
    source: "redshift from a static emitter, Carroll (2004) sec. 5.? (from memory)",
  },
  {
    latex: "\\lim_{c\\to\\infty} c^2\\left(\\sqrt{1-\\frac{2GM}{rc^2}}-1\\right) = -\\frac{GM}{r}",
    plain: "limit(c^2*(sqrt(1 - 2*G*M/(r*c^2)) - 1), c, infinity) = -G*M/r",
    source: "Newtonian limit of the redshift factor, common practice (Taylor expansion)",
  },
  {
    latex: "r_* = r + 2M\\ln\\left|\\frac{r}{2M}-1\\right|",
    plain: "r_ast = r + 2*M*log(abs(r/(2*M) - 1))",
    source: "tortoise coordinate, Carroll (2004) eq. 5.? (from memory)",
  },
  {
    latex: "K = \\frac{48G^2M^2}{c^4r^6}",
    plain: "K = 48*G^2*M^2/(c^4*r^6)",
    source: "Schwarzschild Kretschmann scalar, Carroll (2004) eq. 5.? (from memory)",
  },
  {
    latex: "\\Delta\\phi = \\frac{6\\pi GM_\\odot}{c^2a\\left(1-e^2\\right)}",
    plain: "Delta*phi = 6*pi*G*M_odot/(c^2*a*(1-e^2))",
    source: "Mercury's precession, Weinberg, Gravitation and Cosmology (1972) eq. 8.6.? (from memory)",
    options: { symbols: ["e"] },
  },
  // ---- constants and definitions ----
  {
    latex: "G = 6.67430\\times10^{-11}",
    plain: "G = 6.67430e-11",
    source: "CODATA 2018 Newtonian constant of gravitation, m^3 kg^-1 s^-2",
  },
  {
    latex: "GM_\\odot = 1.3271244\\times10^{20}",
    plain: "G*M_odot = 1.3271244e20",
    source: "IAU 2015 Resolution B3 nominal solar mass parameter, m^3 s^-2",
  },
  {
    latex: "c = 299792458",
    plain: "c = 299792458",
    source: "SI definition of the metre (exact), m s^-1",
  },
  {
    latex: "r_s = \\frac{2GM_\\odot}{c^2}",
    plain: "r_s = 2*G*M_odot/c^2",
    source: "Schwarzschild radius, Carroll (2004) sec. 5.? (from memory)",
  },
  {
    latex: "a = \\sqrt[3]{\\frac{GMT^2}{4\\pi^2}}",
    plain: "a = (G*M*T^2/(4*pi^2))^(1/3)",
    source: "Kepler's third law, Goldstein (1980) ch. 3 (from memory)",
  },
  {
    latex: "\\theta = \\frac{\\pi}{2}",
    plain: "theta = pi/2",
    source: "equatorial plane, common practice",
  },
  { latex: "r > r_s", plain: "r > r_s", source: "exterior region, common practice" },
  { latex: "c > 0", plain: "c > 0", source: "common practice, no source" },
  { latex: "r \\geq 3M", plain: "r >= 3*M", source: "outside the photon sphere, Hartle (2003) ch. 9" },
  { latex: "Q^2 \\le M^2", plain: "Q^2 <= M^2", source: "Reissner-Nordstrom black hole condition, Carroll (2004) sec. 6.5 (from memory)" },
  { latex: "a \\neq 0", plain: "a != 0", source: "rotating Kerr hole, common practice" },
  // ---- notation variants ----
  {
    latex: "\\dfrac{GM}{r}\\bigl(1 - \\tfrac{r_s}{r}\\bigr)",
    plain: "G*M/r*(1 - r_s/r)",
    source: "notation variant (\\dfrac, \\tfrac, \\bigl), common practice",
  },
  {
    latex: "\\displaystyle \\Big[ 1 + \\frac{\\partial^2 f}{\\partial r\\,\\partial\\theta} \\Big]",
    plain: "1 + pdiff(pdiff(f, theta), r)",
    source: "notation variant (mixed partial), common practice",
  },
  {
    latex: "\\sin^{2}(\\theta) + \\cos 2\\theta",
    plain: "sin(theta)^2 + cos(2*theta)",
    source: "notation variant, common practice",
  },
  {
    latex: "\\frac{d^2}{dr^2}\\left(\\frac{1}{r}\\right) = \\frac{2}{r^3}",
    plain: "diff(1/r, r, 2) = 2/r^3",
    source: "second derivative, common practice",
  },
  {
    latex: "\\ln\\left(\\frac{r}{r_s}-1\\right) + \\log_{10} x",
    plain: "log(r/r_s - 1) + log(x)/log(10)",
    source: "logarithms, common practice",
  },
  {
    latex: "\\varphi + \\phi \\cdot \\vartheta \\times 2",
    plain: "varphi + phi*vartheta*2",
    source: "varphi and phi are distinct, common practice",
  },
];
