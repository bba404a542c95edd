import { describe, expect, it } from "vitest";
import { runVerb } from "@/cas/api";
import { SCHWARZSCHILD_GM, SCHWARZSCHILD_RS, SPHERICAL } from "./spacetime-fixtures";

type Answer = {
  photonSphere: number | number[] | null;
  isco: number | number[] | null;
  marginallyBound: number | number[] | null;
  precessionPerOrbit?: number;
  deflection?: number;
  details: {
    precession?: { firstOrder: number; numerical: number };
    deflection?: { firstOrder: number; numerical: number };
    redshift?: number;
    circularOrbits: { from: number; to: number | null; stable: boolean }[];
    units: { system: string; gravitationalLength: number };
  };
};

const GM_SUN = 1.3271244e20; // m^3 s^-2, IAU 2015 Resolution B3
const G = 6.6743e-11; // m^3 kg^-1 s^-2, CODATA 2018
const C = 299_792_458; // m/s, exact (SI)
const ARCSEC = (180 / Math.PI) * 3600;

function run(request: Record<string, unknown>): Answer {
  const out = runVerb("orbits", { coordinates: SPHERICAL, symbols: ["G", "M", "r_s"], ...request });
  if (!out.ok) throw new Error(JSON.stringify(out));
  return out.value as Answer;
}

describe("orbits verb", () => {
  it("Schwarzschild: ISCO 6GM/c², photon sphere 3GM/c², marginally bound 4GM/c²", () => {
    // Hartle (2003) ch. 9; Bardeen, Press & Teukolsky, ApJ 178, 347 (1972): with r_s = 2 (GM/c² = 1)
    const o = run({ metric: SCHWARZSCHILD_RS, values: { r_s: 2 } });
    expect(o.isco as number).toBeCloseTo(6, 9);
    expect(o.photonSphere as number).toBeCloseTo(3, 9);
    expect(o.marginallyBound as number).toBeCloseTo(4, 9);
    // circular orbits are unstable between the photon sphere and the ISCO, stable beyond (Hartle (2003) §9.3)
    expect(o.details.circularOrbits).toEqual([
      { from: expect.closeTo(3, 9), to: expect.closeTo(6, 9), stable: false },
      { from: expect.closeTo(6, 9), to: null, stable: true },
    ]);
  });

  it("Mercury's relativistic perihelion advance is 42.98″ per century, analytic and numerical", () => {
    // Will, Living Rev. Relativ. 17, 4 (2014): 42.98″/century; GM☉ from IAU 2015 B3; a = 5.7909e10 m, e = 0.2056, P = 87.969 d
    const o = run({ metric: SCHWARZSCHILD_GM, values: { G, M: GM_SUN / G, c: C }, semiMajorAxis: 5.7909e10, eccentricity: 0.2056 });
    const perCentury = 36525 / 87.969;
    const analytic = o.details.precession!.firstOrder * perCentury * ARCSEC;
    const numerical = o.details.precession!.numerical * perCentury * ARCSEC;
    expect(analytic).toBeCloseTo(42.98, 1);
    expect(numerical).toBeCloseTo(42.98, 1);
    expect(Math.abs(numerical - analytic) / analytic).toBeLessThan(1e-5); // they differ at second order in GM/(c²a) ~ 3e-8
    expect(o.precessionPerOrbit).toBe(o.details.precession!.numerical);
    expect(o.details.units.system).toBe("SI");
    expect(o.details.units.gravitationalLength).toBeCloseTo(GM_SUN / C / C, 3);
  });

  it("light grazing the Sun is deflected by 1.75″", () => {
    // Will (2014): 1.7505″ at the limb (4GM/(c²R☉)); R☉ = 6.957e8 m (IAU 2015 Resolution B3)
    const o = run({ metric: SCHWARZSCHILD_GM, values: { G, M: GM_SUN / G, c: C }, impactParameter: 6.957e8 });
    expect(o.details.deflection!.firstOrder * ARCSEC).toBeCloseTo(1.75, 2);
    expect(o.deflection! * ARCSEC).toBeCloseTo(1.75, 2);
    expect(Math.abs(o.details.deflection!.numerical - o.details.deflection!.firstOrder) / o.details.deflection!.firstOrder).toBeLessThan(1e-4);
  });

  it("gravitational redshift from the solar surface to 1 au", () => {
    // z ≈ GM/(c² R☉) ≈ 2.12e-6 for light leaving the Sun (Will (2014) §2; weak-field limit, from memory)
    const o = run({ metric: SCHWARZSCHILD_GM, values: { G, M: GM_SUN / G, c: C }, emitterRadius: 6.957e8, observerRadius: 1.495978707e11 });
    expect(o.details.redshift!).toBeCloseTo(GM_SUN / (C * C) * (1 / 6.957e8 - 1 / 1.495978707e11), 8);
  });

  it("refuses a request without the values it needs", () => {
    const out = runVerb("orbits", { coordinates: SPHERICAL, symbols: ["r_s"], metric: SCHWARZSCHILD_RS, values: {} });
    expect(out).toMatchObject({ ok: false, error: { code: "malformed" } });
    expect((out as { error: { message: string } }).error.message).toContain("r_s");
  });
});
