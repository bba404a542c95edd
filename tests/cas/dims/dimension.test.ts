import { describe, expect, it } from "vitest";
import { BUILTIN_DIMENSIONS, formatDimension, parseDimension } from "../../../cas/dims/dimension";

describe("dimensions", () => {
  it("reads names and products of powers", () => {
    expect(formatDimension(parseDimension("angular momentum"))).toBe("M L^2 T^-1");
    expect(formatDimension(parseDimension("energy"))).toBe("M L^2 T^-2");
    expect(formatDimension(parseDimension("M*L^2/T"))).toBe("M L^2 T^-1");
    expect(formatDimension(parseDimension("L^{1/2}"))).toBe("L^1/2");
    expect(formatDimension(parseDimension("dimensionless"))).toBe("dimensionless");
    expect(() => parseDimension("metres")).toThrow(/cannot read/);
  });

  it("builds in G and c in SI (CODATA 2018: G in m^3 kg^-1 s^-2, c in m s^-1)", () => {
    expect(formatDimension(BUILTIN_DIMENSIONS.G)).toBe("M^-1 L^3 T^-2");
    expect(formatDimension(BUILTIN_DIMENSIONS.c)).toBe("L T^-1");
  });
});
