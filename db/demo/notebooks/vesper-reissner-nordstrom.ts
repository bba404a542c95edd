// An invented charged black hole, "Vesper-3", modelled by the Reissner–Nordström metric.
import type { DemoNotebook } from "../types";

export const vesperReissnerNordstrom: DemoNotebook = {
  id: "5f0c2a1e-7b3d-4c8a-9e21-00000000b002",
  title: "Charged-hole orbits: Vesper-3",
  summary:
    "Reissner–Nordström timelike and null orbits for the invented charged hole Vesper-3 (Q/M = 0.6 in geometrised units): horizons, circular orbits and how the ISCO moves inward with charge.",
  createdBy: "coauthor@vierbein.test",
  content: null,
};
