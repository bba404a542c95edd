// An invented charged black hole, "Vesper-3", modelled by the Reissner–Nordström metric.
// This is a draft with one deliberate sign slip (step 17) for the referee to catch.
import type { JSONContent } from "@tiptap/core";
import type { DemoNotebook } from "../types";
import { ORBIT_CONSTANTS, SPHERICAL_COORDINATES, heading, notebook, para, spacetime, step } from "./blocks";

const fExplicit = "\\left(1-\\frac{r_s}{r}+\\frac{r_Q^2}{r^2}\\right)";

/** Reissner–Nordström orbit study, a draft of 25 steps with one refuted step. */
export function buildVesperReissnerNordstrom(): JSONContent {
  return notebook(
    para("Draft for the group's reading — not yet refereed."),
    heading(2, "Setup"),
    para(
      "Vesper-3 is an invented charged hole with ",
      { math: "q = Q/M = 0.6" },
      " in geometrised units, i.e. ",
      { math: "r_Q = 0.3\\,r_s" },
      ". We study neutral test particles in its equatorial plane.",
    ),
    spacetime({
      id: "sb-vesper",
      name: "Vesper-3 exterior (Reissner–Nordström)",
      coordinates: [...SPHERICAL_COORDINATES],
      lineElement: `ds^2 = -${fExplicit}c^2\\,dt^2 + ${fExplicit}^{-1}dr^2 + r^2\\left(d\\theta^2 + \\sin^2\\theta\\,d\\phi^2\\right)`,
      constants: [
        ...ORBIT_CONSTANTS,
        // The checker's dimensions are powers of M, L and T, so the charge enters as the geometrised
        // ratio q = Q/M (dimensionless) and the charge length r_Q (a length), not in coulombs.
        { symbol: "q", dimension: "dimensionless", note: "charge-to-mass ratio Q/M in geometrised units" },
        { symbol: "r_Q", dimension: "length", note: "charge length" },
      ],
      assumptions: ["r > r_+", "\\theta = \\frac{\\pi}{2}", "r_Q < \\frac{r_s}{2}"],
      parameter: "\\tau",
    }),
    step("vr01", "r_s = \\frac{2GM}{c^2}", "definition"),
    step("vr02", "r_Q = \\frac{qGM}{c^2}", "definition"),
    step("vr03", "f = 1 - \\frac{r_s}{r} + \\frac{r_Q^2}{r^2}", "definition"),
    step("vr04", "ds^2 = -f c^2\\,dt^2 + f^{-1}\\,dr^2 + r^2\\,d\\phi^2", "substitute", "\\theta = \\frac{\\pi}{2}; d\\theta = 0"),

    heading(2, "Horizons"),
    step("vr05", "r_+ = \\frac{r_s}{2} + \\sqrt{\\frac{r_s^2}{4} - r_Q^2}", "definition"),
    step("vr06", "1 - \\frac{r_s}{r_+} + \\frac{r_Q^2}{r_+^2} = 0", "algebra", "", { follows: "vr05" }),
    para("For Vesper-3 the outer horizon sits at ", { math: "r_+ = 0.9\\,r_s" }, " and the inner one at ", { math: "r_- = 0.1\\,r_s" }, "."),

    heading(2, "Conserved quantities"),
    step("vr07", "L_{\\rm g} = \\frac{\\mu}{2}\\left(-f c^2\\dot t^2 + f^{-1}\\dot r^2 + r^2\\dot\\phi^2\\right)", "definition"),
    step("vr08", "\\frac{d}{d\\tau}\\left(\\mu f c^2\\dot t\\right) = 0", "euler-lagrange", "t", { follows: "vr07" }),
    step("vr09", "E = \\mu c^2 f\\,\\dot t", "definition"),
    step("vr10", "\\frac{d}{d\\tau}\\left(\\mu r^2\\dot\\phi\\right) = 0", "euler-lagrange", "\\phi", { follows: "vr07" }),
    step("vr11", "L = \\mu r^2\\dot\\phi", "definition"),
    step("vr12", "-f c^2\\dot t^2 + f^{-1}\\dot r^2 + r^2\\dot\\phi^2 = -c^2", "substitute", "ds^2 = -c^2\\,d\\tau^2", { follows: "vr04" }),

    heading(2, "Effective potential"),
    step("vr13", "-\\frac{E^2}{\\mu^2 c^2 f} + \\frac{\\dot r^2}{f} + \\frac{L^2}{\\mu^2 r^2} = -c^2", "substitute", "", { cites: ["vr09", "vr11"], follows: "vr12" }),
    step("vr14", "\\frac{1}{2}\\mu\\dot r^2 = \\frac{E^2 - \\mu^2 c^4}{2\\mu c^2} - \\frac{\\mu c^2}{2}\\left(f - 1\\right) - \\frac{L^2 f}{2\\mu r^2}"),
    step("vr15", "V_{\\rm eff} = \\frac{\\mu c^2}{2}\\left(f - 1\\right) + \\frac{L^2 f}{2\\mu r^2}", "definition"),
    step("vr16", "\\frac{1}{2}\\mu\\dot r^2 + V_{\\rm eff} = \\frac{E^2 - \\mu^2 c^4}{2\\mu c^2}", "substitute", "", { cites: ["vr15"], follows: "vr14" }),
    para("Written out, the charge adds a repulsive term at order ", { math: "r^{-2}" }, " and a correction to the centrifugal barrier at order ", { math: "r^{-4}" }, ":"),
    // The deliberate slip: the last term should be +L^2 r_Q^2/(2 mu r^4).
    step(
      "vr17",
      "V_{\\rm eff} = -\\frac{GM\\mu}{r} + \\frac{\\mu c^2 r_Q^2}{2r^2} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3} - \\frac{L^2 r_Q^2}{2\\mu r^4}",
      "substitute",
      "",
      { cites: ["vr03", "vr01"], follows: "vr15" },
    ),

    heading(2, "Circular orbits"),
    step(
      "vr18",
      "\\frac{dV_{\\rm eff}}{dr} = \\frac{GM\\mu}{r^2} - \\frac{\\mu c^2 r_Q^2}{r^3} - \\frac{L^2}{\\mu r^3} + \\frac{3GML^2}{\\mu c^2 r^4} - \\frac{2L^2 r_Q^2}{\\mu r^5}",
      "differentiate",
      "r",
      { follows: "vr15" },
    ),
    step("vr19", "L^2 = \\frac{\\mu^2 r^2\\left(GMr - c^2 r_Q^2\\right)}{r^2 - \\frac{3GMr}{c^2} + 2r_Q^2}", "substitute", "\\frac{dV_{\\rm eff}}{dr} = 0"),
    step("vr20", "L^2 = \\frac{\\mu^2 c^2 r^2\\left(r_s r - 2r_Q^2\\right)}{2r^2 - 3r_s r + 4r_Q^2}", "substitute", "", { cites: ["vr01"] }),
    para("The photon sphere is where the denominator vanishes:"),
    step("vr21", "r_{\\rm ph} = \\frac{3r_s}{4} + \\sqrt{\\frac{9r_s^2}{16} - 2r_Q^2}", "definition"),
    step("vr22", "2r_{\\rm ph}^2 - 3r_s r_{\\rm ph} + 4r_Q^2 = 0", "algebra", "", { follows: "vr21" }),
    step(
      "vr23",
      "\\frac{d(L^2)}{dr} = \\frac{2\\mu^2 c^2 r\\left(r_s r^3 - 3r_s^2 r^2 + 9r_s r_Q^2 r - 8r_Q^4\\right)}{\\left(2r^2 - 3r_s r + 4r_Q^2\\right)^2}",
      "differentiate",
      "r",
      { follows: "vr20" },
    ),
    para(
      "The ISCO is the largest root of the cubic in the numerator. For Vesper-3 it lies at ",
      { math: "r_{\\rm ISCO} \\approx 2.71\\,r_s" },
      ", inside the uncharged value ",
      { math: "3r_s" },
      "; the photon sphere moves in to ",
      { math: "r_{\\rm ph} \\approx 1.37\\,r_s" },
      ".",
    ),

    heading(2, "Uncharged limit"),
    step("vr24", "L^2 = \\frac{\\mu^2 c^2 r_s r^2}{2r - 3r_s}", "limit", "r_Q \\to 0", { follows: "vr20" }),
    step("vr25", "r_{\\rm ph} = \\frac{3r_s}{2}", "limit", "r_Q \\to 0", { follows: "vr21" }),
  );
}

export const vesperReissnerNordstrom: DemoNotebook = {
  id: "5f0c2a1e-7b3d-4c8a-9e21-00000000b002",
  title: "Charged-hole orbits: Vesper-3",
  summary:
    "Reissner–Nordström timelike and null orbits for the invented charged hole Vesper-3 (Q/M = 0.6 in geometrised units): horizons, circular orbits and how the ISCO moves inward with charge.",
  createdBy: "coauthor@vierbein.test",
  content: buildVesperReissnerNordstrom() as Record<string, unknown>,
};
