// LaTeX line elements for the spacetime verb tests, written as a relativist types them.
export const SPHERICAL = ["t", "r", "\\theta", "\\phi"];

/** Schwarzschild (MTW (1973) eq. 31.1), with r_s declared. */
export const SCHWARZSCHILD_RS = "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2\\,dt^2 + \\frac{dr^2}{1-\\frac{r_s}{r}} + r^2\\,d\\theta^2 + r^2\\sin^2\\theta\\,d\\phi^2";

/** Schwarzschild with GM written out (Hartle (2003) eq. 9.1). */
export const SCHWARZSCHILD_GM = "ds^2 = -\\left(1-\\frac{2GM}{c^2 r}\\right)c^2\\,dt^2 + \\left(1-\\frac{2GM}{c^2 r}\\right)^{-1}dr^2 + r^2\\,d\\theta^2 + r^2\\sin^2\\theta\\,d\\phi^2";
