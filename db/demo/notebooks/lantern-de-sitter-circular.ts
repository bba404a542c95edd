// An invented object, "Lantern", in a Schwarzschild–de Sitter background.
import type { DemoNotebook } from "../types";

export const lanternDeSitterCircular: DemoNotebook = {
  id: "5f0c2a1e-7b3d-4c8a-9e21-00000000b003",
  title: "Circular orbits in Schwarzschild–de Sitter around Lantern",
  summary:
    "A note on circular orbits when a cosmological constant is switched on (Λ M² = 10⁻⁵, invented): the outer limit where gravity and Λ balance, and the Λ → 0 limit back to Schwarzschild.",
  createdBy: "author@vierbein.test",
  content: null,
};
