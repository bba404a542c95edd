// The invented research group and its five accounts (all with the demo-only password).
import type { DemoAccount } from "./types";

export const DEMO_PASSWORD = "relativity";

export const demoGroup = {
  id: "5f0c2a1e-7b3d-4c8a-9e21-00000000a001",
  name: "Strong-Field Orbits",
  description:
    "A made-up group at the fictional Marrowfield Institute for Gravitation, following test particles and light around compact objects.",
};

export const demoAccounts: DemoAccount[] = [
  { email: "lead@vierbein.test", name: "Orla Quennell", role: "lead" },
  { email: "author@vierbein.test", name: "Tobiah Marchwood", role: "author" },
  { email: "coauthor@vierbein.test", name: "Sunniva Brakeley", role: "author" },
  { email: "reviewer@vierbein.test", name: "Perrin Achterholt", role: "reviewer" },
  { email: "reader@vierbein.test", name: "Dagny Thistlecombe", role: "reader" },
];
