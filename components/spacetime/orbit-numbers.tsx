"use client";

import { Latex } from "./latex";
import { radiiList, type OrbitsAnswer } from "./orbit-model";

const fmt = (x: number) => (Math.abs(x) >= 1e5 || (Math.abs(x) < 1e-3 && x !== 0) ? x.toExponential(4) : x.toPrecision(5));
const ARCSEC = (180 / Math.PI) * 3600;

function radius(r: number | number[] | null, m: number | null) {
  const list = radiiList(r);
  if (list.length === 0) return "none";
  return list.map((x) => `r = ${fmt(x)}${m ? ` (${fmt(x / m)} m)` : ""}`).join("; ");
}

function angle(rad: number | null | undefined) {
  if (rad === null || rad === undefined) return "not available";
  return `${fmt(rad)} rad = ${fmt((rad * 180) / Math.PI)}° = ${fmt(rad * ARCSEC)}″`;
}

/**
 * The orbit panel's numbers with, on every row, how the number was obtained:
 * an exact condition solved numerically, a first-order formula, or a numerical
 * integration of the exact orbit equation.
 */
export function OrbitNumbers({ answer, a, e, b }: { answer: OrbitsAnswer; a: number; e: number; b: number }) {
  const m = answer.details.units.gravitationalLength;
  const p = answer.details.precession;
  const d = answer.details.deflection;
  const rows: { name: string; tex?: string; value: string; how: string }[] = [
    { name: "Horizon", value: answer.details.horizon === null ? "none" : radius(answer.details.horizon, m), how: "largest root of A(r) = 0, found numerically" },
    { name: "Photon sphere", value: radius(answer.photonSphere, m), how: "exact condition d(A/r²)/dr = 0, root found numerically" },
    { name: "ISCO", value: radius(answer.isco, m), how: "exact condition: minimum of ℓ²(r) along circular orbits, root found numerically" },
    { name: "Marginally bound orbit", value: radius(answer.marginallyBound, m), how: "exact condition: circular orbit with E = μc², root found numerically" },
    { name: "Perihelion advance per orbit, first order", value: angle(p?.firstOrder), how: "first-order formula 6πm / (a(1 − e²))" },
    { name: "Perihelion advance per orbit, numerical", value: angle(p?.numerical), how: p?.note ?? "numerical integration of the exact orbit equation (odex), perihelion to perihelion" },
    { name: "Light deflection, first order", value: angle(d?.firstOrder), how: "first-order formula 4m / b" },
    { name: "Light deflection, numerical", value: angle(d?.numerical), how: d?.note ?? "numerical integration of the exact null orbit equation (odex), closest approach to infinity" },
  ];
  return (
    <section aria-label="Orbit numbers">
      <table className="w-full border-collapse font-sans text-sm">
        <caption className="pb-1 text-left text-xs text-ink-muted">
          At the constants above (they do not depend on L). Radii in the units of r{m ? <>, and in units of the gravitational length <Latex source={`m = ${fmt(m)}`} /></> : null}; the orbit has a = {fmt(a)}, e = {fmt(e)}; the ray has b = {fmt(b)}.
        </caption>
        <thead>
          <tr className="text-left text-xs text-ink-muted">
            <th scope="col" className="py-1 pr-3 font-medium">Quantity</th>
            <th scope="col" className="py-1 pr-3 font-medium">Value</th>
            <th scope="col" className="py-1 font-medium">How it is obtained</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.name} className="border-t border-paper-edge/70 align-baseline">
              <th scope="row" className="py-1 pr-3 text-left font-medium">{row.name}</th>
              <td className="py-1 pr-3 font-mono text-xs">{row.value}</td>
              <td className="py-1 text-ink-soft">{row.how}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
