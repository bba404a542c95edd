// An invented compact object, "Kestrel-7", modelled by the Schwarzschild metric.
import type { DemoNotebook } from "../types";

export const kestrelSchwarzschildOrbits: DemoNotebook = {
  id: "5f0c2a1e-7b3d-4c8a-9e21-00000000b001",
  title: "Test-particle orbits around Kestrel-7",
  summary:
    "Schwarzschild geodesics around the invented compact object Kestrel-7 (M = 6.2 solar masses): conserved energy and angular momentum, effective potential, ISCO and photon sphere.",
  createdBy: "author@vierbein.test",
  content: null,
};
