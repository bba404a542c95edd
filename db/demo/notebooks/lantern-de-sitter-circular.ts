// An invented object, "Lantern", in a Schwarzschild–de Sitter background.
import type { JSONContent } from "@tiptap/core";
import type { DemoNotebook } from "../types";
import { ORBIT_CONSTANTS, SPHERICAL_COORDINATES, heading, notebook, para, spacetime, step } from "./blocks";

const fExplicit = "\\left(1-\\frac{r_s}{r}-\\frac{\\Lambda r^2}{3}\\right)";

/** Circular orbits in Schwarzschild–de Sitter, with the static radius and both limits (20 steps). */
export function buildLanternDeSitterCircular(): JSONContent {
  return notebook(
    heading(2, "Setup"),
    para(
      "Lantern is an invented compact object in a universe with a cosmological constant; we take ",
      { math: "\\Lambda (GM/c^2)^2 = 10^{-5}" },
      " and ask which circular orbits survive.",
    ),
    spacetime({
      id: "sb-lantern",
      name: "Lantern in Schwarzschild–de Sitter",
      coordinates: [...SPHERICAL_COORDINATES],
      lineElement: `ds^2 = -${fExplicit}c^2\\,dt^2 + ${fExplicit}^{-1}dr^2 + r^2\\left(d\\theta^2 + \\sin^2\\theta\\,d\\phi^2\\right)`,
      constants: [
        ...ORBIT_CONSTANTS,
        { symbol: "\\Lambda", dimension: "L^-2", note: "cosmological constant" },
      ],
      assumptions: ["\\Lambda > 0", "r > r_s", "\\theta = \\frac{\\pi}{2}"],
      parameter: "\\tau",
    }),
    step("ld01", "r_s = \\frac{2GM}{c^2}", "definition"),
    step("ld02", "f = 1 - \\frac{r_s}{r} - \\frac{\\Lambda r^2}{3}", "definition"),

    heading(2, "Conserved quantities and the radial equation"),
    step("ld03", "L_{\\rm g} = \\frac{\\mu}{2}\\left(-f c^2\\dot t^2 + f^{-1}\\dot r^2 + r^2\\dot\\phi^2\\right)", "definition"),
    step("ld04", "\\frac{d}{d\\tau}\\left(\\mu f c^2\\dot t\\right) = 0", "euler-lagrange", "t", { follows: "ld03" }),
    step("ld05", "E = \\mu c^2 f\\,\\dot t", "definition"),
    step("ld06", "\\frac{d}{d\\tau}\\left(\\mu r^2\\dot\\phi\\right) = 0", "euler-lagrange", "\\phi", { follows: "ld03" }),
    step("ld07", "L = \\mu r^2\\dot\\phi", "definition"),
    step("ld08", "-f c^2\\dot t^2 + f^{-1}\\dot r^2 + r^2\\dot\\phi^2 = -c^2", "substitute", "ds^2 = -c^2\\,d\\tau^2; d\\theta = 0"),
    step("ld09", "V_{\\rm eff} = \\frac{\\mu c^2}{2}\\left(f - 1\\right) + \\frac{L^2 f}{2\\mu r^2}", "definition"),
    step("ld10", "\\frac{1}{2}\\mu\\dot r^2 + V_{\\rm eff} = \\frac{E^2 - \\mu^2 c^4}{2\\mu c^2}", "substitute", "", { cites: ["ld05", "ld07", "ld09"], follows: "ld08" }),
    step(
      "ld11",
      "V_{\\rm eff} = -\\frac{GM\\mu}{r} - \\frac{\\mu c^2\\Lambda r^2}{6} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3} - \\frac{\\Lambda L^2}{6\\mu}",
      "substitute",
      "",
      { cites: ["ld02", "ld01"], follows: "ld09" },
    ),
    para("The constant term ", { math: "-\\Lambda L^2/(6\\mu)" }, " shifts the potential but not the orbits; the term in ", { math: "r^2" }, " pulls outward."),

    heading(2, "Circular orbits"),
    step("ld12", "\\frac{dV_{\\rm eff}}{dr} = \\frac{GM\\mu}{r^2} - \\frac{\\mu c^2\\Lambda r}{3} - \\frac{L^2}{\\mu r^3} + \\frac{3GML^2}{\\mu c^2 r^4}", "differentiate", "r", { follows: "ld11" }),
    step("ld13", "L^2 = \\frac{\\mu^2 r^2\\left(GM - \\frac{\\Lambda c^2 r^3}{3}\\right)}{r - \\frac{3GM}{c^2}}", "substitute", "\\frac{dV_{\\rm eff}}{dr} = 0"),
    step("ld14", "E^2 = \\mu^2 c^4 f\\left(1 + \\frac{L^2}{\\mu^2 c^2 r^2}\\right)", "substitute", "\\dot r = 0", { follows: "ld10" }),
    step("ld15", "E^2 = \\frac{\\mu^2 c^4 f^2 r}{r - \\frac{3GM}{c^2}}", "substitute", "", { cites: ["ld13"], follows: "ld14" }),

    heading(2, "The static radius"),
    para("Circular orbits need ", { math: "L^2 \\ge 0" }, ", so beyond the radius where gravity and ", { math: "\\Lambda" }, " balance there are none:"),
    step("ld16", "r_{\\rm stat} = \\left(\\frac{3GM}{\\Lambda c^2}\\right)^{1/3}", "definition"),
    step("ld17", "L^2 = 0", "substitute", "r = r_{\\rm stat}", { cites: ["ld16"], follows: "ld13" }),
    step("ld18", "\\frac{dV_{\\rm eff}}{dr} = 0", "substitute", "L = 0; r = r_{\\rm stat}", { cites: ["ld16"], follows: "ld12" }),
    para(
      "For Lantern, ",
      { math: "r_{\\rm stat} = (3\\times 10^{5})^{1/3}\\,GM/c^2 \\approx 66.9\\,GM/c^2" },
      ", about ",
      { math: "33.5\\,r_s" },
      ".",
    ),

    heading(2, "Limits"),
    step("ld19", "L^2 = \\frac{GM\\mu^2 r^2}{r - \\frac{3GM}{c^2}}", "limit", "\\Lambda \\to 0", { follows: "ld13" }),
    step("ld20", "L^2 = GM\\mu^2 r", "limit", "c \\to \\infty", { follows: "ld19" }),
    para("The first limit is the Schwarzschild result; the second is Kepler's circular orbit, ", { math: "L = \\mu\\sqrt{GMr}" }, "."),
  );
}

export const lanternDeSitterCircular: DemoNotebook = {
  id: "5f0c2a1e-7b3d-4c8a-9e21-00000000b003",
  title: "Circular orbits in Schwarzschild–de Sitter around Lantern",
  summary:
    "A note on circular orbits when a cosmological constant is switched on (Λ M² = 10⁻⁵, invented): the outer limit where gravity and Λ balance, and the Λ → 0 limit back to Schwarzschild.",
  createdBy: "author@vierbein.test",
  content: buildLanternDeSitterCircular() as Record<string, unknown>,
};
