// An invented compact object, "Kestrel-7", modelled by the Schwarzschild metric.
import type { JSONContent } from "@tiptap/core";
import type { DemoNotebook } from "../types";
import { ORBIT_CONSTANTS, SPHERICAL_COORDINATES, heading, notebook, para, spacetime, step } from "./blocks";

const f = "\\left(1-\\frac{r_s}{r}\\right)";

/** Schwarzschild test-particle orbits, from the line element to the ISCO (26 steps). */
export function buildKestrelSchwarzschildOrbits(): JSONContent {
  return notebook(
    heading(2, "Setup"),
    para(
      "We follow a test particle of rest mass ",
      { math: "\\mu" },
      " around Kestrel-7, an invented compact object of mass ",
      { math: "M = 6.2\\,M_\\odot" },
      ", whose exterior we model as Schwarzschild. Its Schwarzschild radius is ",
      { math: "r_s \\approx 18.3\\,\\mathrm{km}" },
      ". Signature (−,+,+,+); dots are derivatives by proper time ",
      { math: "\\tau" },
      ".",
    ),
    spacetime({
      id: "sb-kestrel",
      name: "Kestrel-7 exterior (Schwarzschild)",
      coordinates: [...SPHERICAL_COORDINATES],
      lineElement: `ds^2 = -${f}c^2\\,dt^2 + ${f}^{-1}dr^2 + r^2\\left(d\\theta^2 + \\sin^2\\theta\\,d\\phi^2\\right)`,
      constants: [...ORBIT_CONSTANTS],
      assumptions: ["r > r_s", "M > 0", "\\mu > 0"],
      parameter: "\\tau",
    }),
    step("ks01", "r_s = \\frac{2GM}{c^2}", "definition"),

    heading(2, "Equatorial reduction"),
    para("Spherical symmetry lets us rotate the orbit into the equatorial plane and keep it there; the first step starts from the block's line element."),
    step("ks03", `ds^2 = -${f}c^2\\,dt^2 + ${f}^{-1}dr^2 + r^2\\,d\\phi^2`, "substitute", "\\theta = \\frac{\\pi}{2}; d\\theta = 0"),
    para("For a massive particle ", { math: "ds^2 = -c^2\\,d\\tau^2" }, ", which fixes the norm of the four-velocity:"),
    step("ks04", `-${f}c^2\\dot t^2 + ${f}^{-1}\\dot r^2 + r^2\\dot\\phi^2 = -c^2`, "substitute", "ds^2 = -c^2\\,d\\tau^2"),

    heading(2, "Geodesic Lagrangian and conserved quantities"),
    step("ks05", `L_{\\rm g} = \\frac{\\mu}{2}\\left[-${f}c^2\\dot t^2 + ${f}^{-1}\\dot r^2 + r^2\\dot\\phi^2\\right]`, "definition"),
    para(
      "The geodesic Lagrangian ",
      { math: "L_{\\rm g}" },
      " depends on neither ",
      { math: "t" },
      " nor ",
      { math: "\\phi" },
      ": the Killing vectors ",
      { math: "\\partial_t" },
      " and ",
      { math: "\\partial_\\phi" },
      " give, by Noether, a conserved energy and angular momentum.",
    ),
    step("ks06", `\\frac{d}{d\\tau}\\left[\\mu${f}c^2\\dot t\\right] = 0`, "euler-lagrange", "t", { follows: "ks05" }),
    step("ks07", `E = \\mu c^2${f}\\dot t`, "definition"),
    step("ks08", "\\frac{d}{d\\tau}\\left(\\mu r^2\\dot\\phi\\right) = 0", "euler-lagrange", "\\phi", { follows: "ks05" }),
    step("ks09", "L = \\mu r^2\\dot\\phi", "definition"),
    step("ks10", `\\dot t = \\frac{E}{\\mu c^2${f}}`, "algebra", "", { follows: "ks07" }),
    step("ks11", "\\dot\\phi = \\frac{L}{\\mu r^2}", "algebra", "", { follows: "ks09" }),

    heading(2, "Radial equation and effective potential"),
    para("Inserting ", { ref: "ks10" }, " and ", { ref: "ks11" }, " into the norm condition ", { ref: "ks04" }, ":"),
    step("ks12", `-\\frac{E^2}{\\mu^2 c^2}${f}^{-1} + ${f}^{-1}\\dot r^2 + \\frac{L^2}{\\mu^2 r^2} = -c^2`, "substitute", "", { cites: ["ks10", "ks11"], follows: "ks04" }),
    step("ks13", `\\dot r^2 = \\frac{E^2}{\\mu^2 c^2} - ${f}\\left(c^2 + \\frac{L^2}{\\mu^2 r^2}\\right)`),
    step("ks14", "\\frac{1}{2}\\mu\\dot r^2 = \\frac{E^2}{2\\mu c^2} - \\frac{\\mu c^2}{2} + \\frac{\\mu c^2 r_s}{2r} - \\frac{L^2}{2\\mu r^2} + \\frac{r_s L^2}{2\\mu r^3}"),
    step("ks15", "\\frac{1}{2}\\mu\\dot r^2 = \\frac{E^2 - \\mu^2 c^4}{2\\mu c^2} + \\frac{GM\\mu}{r} - \\frac{L^2}{2\\mu r^2} + \\frac{GML^2}{\\mu c^2 r^3}", "substitute", "", { cites: ["ks01"] }),
    step("ks16", "V_{\\rm eff} = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2} - \\frac{GML^2}{\\mu c^2 r^3}", "definition"),
    step("ks17", "\\frac{1}{2}\\mu\\dot r^2 + V_{\\rm eff} = \\frac{E^2 - \\mu^2 c^4}{2\\mu c^2}", "substitute", "", { cites: ["ks16"], follows: "ks15" }),
    para("The last term of the effective potential is the relativistic correction; without it we are back to Newton:"),
    step("ks18", "V_{\\rm eff} = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2}", "limit", "c \\to \\infty", { follows: "ks16" }),

    heading(2, "Circular orbits and the ISCO"),
    step("ks19", "\\frac{dV_{\\rm eff}}{dr} = \\frac{GM\\mu}{r^2} - \\frac{L^2}{\\mu r^3} + \\frac{3GML^2}{\\mu c^2 r^4}", "differentiate", "r", { follows: "ks16" }),
    step("ks20", "GM\\mu^2 r^2 - L^2 r + \\frac{3GML^2}{c^2} = 0", "substitute", "\\frac{dV_{\\rm eff}}{dr} = 0"),
    step("ks21", "L^2 = \\frac{GM\\mu^2 r^2}{r - \\frac{3GM}{c^2}}"),
    step("ks22", "L^2 = \\frac{\\mu^2 c^2 r_s r^2}{2r - 3r_s}", "substitute", "", { cites: ["ks01"] }),
    para("The angular momentum of a circular orbit diverges where the denominator vanishes: only light circles there."),
    step("ks23", "r_{\\rm ph} = \\frac{3r_s}{2}", "definition"),
    para("A circular orbit is stable while ", { math: "L^2" }, " grows outward; the innermost stable one is where ", { math: "L^2(r)" }, " has its minimum."),
    step("ks24", "\\frac{d(L^2)}{dr} = \\frac{2\\mu^2 c^2 r_s r\\left(r - 3r_s\\right)}{\\left(2r - 3r_s\\right)^2}", "differentiate", "r", { follows: "ks22" }),
    step("ks25", "r_{\\rm ISCO} = 3r_s", "definition"),
    step("ks26", "\\frac{d(L^2)}{dr} = 0", "substitute", "r = r_{\\rm ISCO}", { cites: ["ks25"], follows: "ks24" }),
    step("ks27", "r_{\\rm ISCO} = \\frac{6GM}{c^2}", "substitute", "", { cites: ["ks01"], follows: "ks25" }),
    para(
      "For Kestrel-7 this puts the ISCO at ",
      { math: "r_{\\rm ISCO} \\approx 54.9\\,\\mathrm{km}" },
      " and the photon sphere at ",
      { math: "r_{\\rm ph} \\approx 27.5\\,\\mathrm{km}" },
      ".",
    ),
  );
}

export const kestrelSchwarzschildOrbits: DemoNotebook = {
  id: "5f0c2a1e-7b3d-4c8a-9e21-00000000b001",
  title: "Test-particle orbits around Kestrel-7",
  summary:
    "Schwarzschild geodesics around the invented compact object Kestrel-7 (M = 6.2 solar masses): conserved energy and angular momentum, effective potential, ISCO and photon sphere.",
  createdBy: "author@vierbein.test",
  content: buildKestrelSchwarzschildOrbits() as Record<string, unknown>,
};
