// Every demo notebook, one module each. To give one its document, set `content` in its module.
import type { DemoNotebook } from "../types";
import { kestrelSchwarzschildOrbits } from "./kestrel-schwarzschild-orbits";
import { lanternDeSitterCircular } from "./lantern-de-sitter-circular";
import { vesperReissnerNordstrom } from "./vesper-reissner-nordstrom";

export const demoNotebooks: DemoNotebook[] = [kestrelSchwarzschildOrbits, vesperReissnerNordstrom, lanternDeSitterCircular];
