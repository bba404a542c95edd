// A 300-step notebook for the editor bench: long enough that per-keystroke costs which grow
// with the document show up.
import type { JSONContent } from "@tiptap/core";
import { heading, notebook, spacetime, step, SPHERICAL_COORDINATES, ORBIT_CONSTANTS } from "@/db/demo/notebooks/blocks";
import type { DemoNotebook } from "@/db/demo/types";

const AUTHOR = "author@vierbein.test";

/** 300 steps alternating between two equal forms of the Newtonian effective potential, each checked against the previous. */
export function threeHundredSteps(): DemoNotebook {
  const forms = ["V = -\\frac{GM\\mu}{r} + \\frac{L^2}{2\\mu r^2}", "V = \\frac{L^2 - 2GM\\mu^2 r}{2\\mu r^2}"];
  const body: JSONContent[] = [
    spacetime({ id: "sb-bench", name: "Bench exterior", coordinates: [...SPHERICAL_COORDINATES], lineElement: "ds^2 = -\\left(1-\\frac{r_s}{r}\\right)c^2\\,dt^2 + \\left(1-\\frac{r_s}{r}\\right)^{-1}dr^2 + r^2\\,d\\theta^2 + r^2\\sin^2\\theta\\,d\\phi^2", constants: [...ORBIT_CONSTANTS], assumptions: ["r > r_s"], parameter: "\\tau" }),
  ];
  for (let i = 0; i < 300; i += 1) {
    if (i % 25 === 0) body.push(heading(2, `Part ${i / 25 + 1}`));
    body.push(step(`st-bench${String(i).padStart(5, "0")}`, forms[i % 2], i === 0 ? "definition" : "algebra"));
  }
  return { id: "5f0c2a1e-7b3d-4c8a-9e21-00000000be00", title: "Bench: three hundred steps", summary: "A long notebook for the editor bench.", createdBy: AUTHOR, content: notebook(...body) as Record<string, unknown> };
}

