import type { Relation } from "../expr/types";
import { dimensionOf, type DimensionEnvironment } from "../dims/audit";
import type { Dimension } from "../dims/dimension";
import { variableOf } from "./variables";

/**
 * Gives each symbol a definition introduces (`f = 1 - r_s/r`, `V_eff = …`, `r_ph = 3r_s/2`)
 * the dimension of its right-hand side, when the notebook declared none for it. Definitions may
 * build on each other (r_ISCO from r_s), so this repeats until nothing new is learnt. A declared
 * dimension is never overridden: a definition that disagrees with it is the audit's to report.
 *
 * @example
 * withDefinedDimensions(env, [parsePlain("f = 1 - r_s/r")]).symbols.get("f") // dimensionless
 */
export function withDefinedDimensions(env: DimensionEnvironment, definitions: readonly Relation[]): DimensionEnvironment {
  const symbols = new Map<string, Dimension | null>(env.symbols);
  for (let changed = true; changed; ) {
    changed = false;
    for (const d of definitions) {
      const name = d.op === "=" ? variableOf(d.lhs) : null;
      if (name === null || d.lhs.kind !== "sym" || symbols.get(name)) continue;
      const outcome = dimensionOf(d.rhs, { symbols, parameter: env.parameter });
      if (outcome.kind !== "known") continue;
      symbols.set(name, outcome.dimension);
      changed = true;
    }
  }
  return { symbols, parameter: env.parameter };
}
