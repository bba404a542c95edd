"use client";

import { useEffect, useMemo, useState } from "react";
import type { SpacetimeBlockAttributes } from "@/editor/spacetime-block";
import { ComputationStatus } from "./computation-status";
import { Latex } from "./latex";
import { ConstantSliders, SliderField } from "./orbit-controls";
import { orbitModel, potentialCurve, radiiList, trajectoryOf, withFixed, type OrbitModel, type OrbitsAnswer, type PotentialAnswer } from "./orbit-model";
import { OrbitNumbers } from "./orbit-numbers";
import { OrbitPlot } from "./orbit-plot";
import { PotentialPlot, type RadiusMark } from "./potential-plot";
import { SpacetimeDialog } from "./spacetime-dialog";
import { missingForRequest, spacetimeRequest } from "./spacetime-request";
import { useSpacetimeVerb } from "./use-spacetime-verb";

interface Settings {
  readonly values: Record<string, number>;
  readonly L: number;
  readonly a: number;
  readonly e: number;
  readonly b: number;
}

const TURNS = 4;

function readModel(answer: PotentialAnswer): OrbitModel | string {
  try {
    return orbitModel(answer);
  } catch (error) {
    return error instanceof Error ? error.message : "the effective potential could not be read";
  }
}

/** The gravitational length m if the metric has a 1/r tail, else a third of the photon sphere, else 1. */
function scaleOf(answer: OrbitsAnswer): number {
  const m = answer.details.units.gravitationalLength;
  if (m && m > 0) return m;
  const ph = radiiList(answer.photonSphere);
  return ph.length ? ph[ph.length - 1] / 3 : 1;
}

/**
 * The orbit panel of a spacetime block: V_eff per unit mass plotted against r with
 * sliders for L and the constants, the circular orbits marked, the `orbits` verb's
 * numbers (each saying whether it is a first-order formula or a numerical
 * integration) and the integrated orbit for a chosen a and e.
 */
export function OrbitPanel({ block, onClose }: { block: SpacetimeBlockAttributes; onClose: () => void }) {
  const missing = missingForRequest(block);
  const request = useMemo(() => spacetimeRequest(block), [block]);
  const potential = useSpacetimeVerb<PotentialAnswer>("potential");
  const orbits = useSpacetimeVerb<OrbitsAnswer>("orbits");
  const [initial, setInitial] = useState<Record<string, number>>({});
  const [settings, setSettings] = useState<Settings | null>(null);
  const [scale, setScale] = useState<number | null>(null);
  const [attempt, setAttempt] = useState(0);
  // the last numbers stay on screen (and keep the plot's range) while new ones are computed
  const [numbers, setNumbers] = useState<OrbitsAnswer | null>(null);
  useEffect(() => {
    // eslint-disable-next-line react-hooks/set-state-in-effect -- mirrors the worker's latest answer
    if (orbits.run.state === "done") setNumbers(orbits.run.value);
  }, [orbits.run]);

  const loadPotential = () => {
    if (!missing) void potential.start(request);
  };
  useEffect(() => {
    loadPotential();
    // eslint-disable-next-line react-hooks/exhaustive-deps -- computed once on opening
  }, []);

  const model = useMemo(() => (potential.run.state === "done" ? readModel(potential.run.value) : null), [potential.run]);
  const ready = model !== null && typeof model !== "string" ? model : null;

  // First the numbers at unit constants, to learn the length scale; then the panel's defaults in that scale.
  useEffect(() => {
    if (!ready || settings) return;
    const values = Object.fromEntries(ready.constants.map((n) => [n, 1]));
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the sliders open at the constants' first values
    setInitial(values);
    void orbits.start({ ...request, values: withFixed(values) });
    // eslint-disable-next-line react-hooks/exhaustive-deps -- once per model
  }, [ready]);
  useEffect(() => {
    if (settings || orbits.run.state !== "done" || !ready) return;
    const m = scaleOf(orbits.run.value);
    // eslint-disable-next-line react-hooks/set-state-in-effect -- defaults follow the first answer's length scale
    setScale(m);
    setSettings({ values: initial, L: 4 * m, a: 30 * m, e: 0.3, b: 50 * m });
  }, [orbits.run, ready, settings, initial]);

  // Every later change of the constants or the orbit asks for the numbers again, a moment after the last change.
  useEffect(() => {
    if (!settings) return;
    const timer = setTimeout(() => {
      void orbits.start({ ...request, values: withFixed(settings.values), semiMajorAxis: settings.a, eccentricity: settings.e, impactParameter: settings.b });
    }, 250);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- L does not change the numbers
  }, [settings?.values, settings?.a, settings?.e, settings?.b, attempt]);

  const m = scale ?? 1;
  const horizon = numbers?.details.horizon ?? null;
  const from = horizon ? horizon * 1.02 : m * 0.5;
  const wide = useMemo(() => (ready && settings ? potentialCurve(ready, settings.values, settings.L, from, Math.max(from * 2, 2000 * m)) : null), [ready, settings, from, m]);
  const to = Math.max(30 * m, from * 4, ...(wide?.circular.map((c) => 1.6 * c.x) ?? []));
  const curve = useMemo(() => (ready && settings ? potentialCurve(ready, settings.values, settings.L, from, to) : null), [ready, settings, from, to]);
  const orbit = useMemo(() => {
    if (!ready || !settings) return null;
    try {
      return trajectoryOf(ready, settings.values, settings.a, settings.e, TURNS);
    } catch (error) {
      return error instanceof Error ? error.message : "the orbit could not be integrated";
    }
  }, [ready, settings]);

  const marks: RadiusMark[] = numbers
    ? [
        ...(horizon ? [{ r: horizon, label: "horizon", dash: "1 3" }] : []),
        ...radiiList(numbers.photonSphere).map((r) => ({ r, label: "photon sphere", dash: "6 3" })),
        ...radiiList(numbers.isco).map((r) => ({ r, label: "ISCO", dash: "2 2" })),
        ...radiiList(numbers.marginallyBound).map((r) => ({ r, label: "marg. bound", dash: "8 2 2 2" })),
      ]
    : [];
  const set = (patch: Partial<Settings>) => setSettings((s) => (s ? { ...s, ...patch } : s));

  return (
    <SpacetimeDialog title={`Orbit panel${block.name ? ` — ${block.name}` : ""}`} subtitle={<Latex source={block.lineElement || "\\text{(no line element)}"} />} onClose={onClose}>
      {missing ? <p role="alert" className="font-sans text-sm text-alarm">{missing}</p> : null}
      <ComputationStatus run={potential.run} what="the effective potential" onCancel={potential.cancel} onRetry={loadPotential} />
      {typeof model === "string" ? <p role="alert" className="font-sans text-sm text-alarm">Could not read the effective potential: {model}</p> : null}
      {ready && potential.run.state === "done" ? (
        <>
          <section aria-label="Effective potential" className="font-sans text-sm">
            <p>
              Per unit rest mass in geometric units (<Latex source="G = c = 1" />): <Latex source={`\\tfrac12 \\dot r^2 + V_{\\mathrm{eff}} = \\tfrac{E^2 - 1}{2}`} />, with
            </p>
            <p className="overflow-x-auto py-1">
              <Latex source={`V_{\\mathrm{eff}} = ${potential.run.value.perUnitMass.effectivePotential.latex}`} display />
            </p>
            <p className="text-xs text-ink-muted">
              Units: r, L and every length-like constant are in one length unit of your choosing (the unit of r); V_eff is per unit μc², dimensionless; angles in radians. In SI the potential is <Latex source={`V_{\\mathrm{eff}} = ${potential.run.value.effectivePotential.latex}`} />.
            </p>
          </section>

          {settings ? (
            <div className="mt-4 grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
              <div>
                <h3 className="font-serif text-lg">Effective potential</h3>
                {curve ? <PotentialPlot curve={curve} marks={marks} from={from} to={to} /> : null}
                <p role="status" className="font-sans text-sm">
                  {curve && curve.circular.length
                    ? `Circular orbits at this L (read off the plotted curve): ${curve.circular.map((c) => `r ≈ ${c.x.toPrecision(4)} (${c.kind === "minimum" ? "stable, ● minimum" : "unstable, ○ maximum"})`).join("; ")}.`
                    : "No circular orbit at this L: raise L to see them."}
                </p>
              </div>
              <div className="grid content-start gap-3">
                <h3 className="font-serif text-lg">Settings</h3>
                <SliderField label="angular momentum per unit rest mass" tex="L" value={settings.L} min={0} max={12 * m} step={m / 100} onChange={(L) => set({ L })} />
                <ConstantSliders names={ready.constants} values={settings.values} initial={initial} onChange={(name, v) => set({ values: { ...settings.values, [name]: v } })} />
                <SliderField label="semi-major axis of the orbit" tex="a" value={settings.a} min={4 * m} max={200 * m} step={m / 10} onChange={(a) => set({ a })} />
                <SliderField label="eccentricity of the orbit" tex="e" value={settings.e} min={0} max={0.9} step={0.01} onChange={(e) => set({ e })} />
                <SliderField label="impact parameter of the ray" tex="b" value={settings.b} min={6 * m} max={500 * m} step={m / 10} onChange={(b) => set({ b })} />
              </div>
            </div>
          ) : null}

          <div className="mt-6">
            <h3 className="font-serif text-lg">Numbers</h3>
            <ComputationStatus run={orbits.run} what="the orbit numbers" onCancel={orbits.cancel} onRetry={() => setAttempt((n) => n + 1)} />
            {numbers && settings ? <OrbitNumbers answer={numbers} a={settings.a} e={settings.e} b={settings.b} /> : null}
          </div>

          {settings ? (
            <div className="mt-6">
              <h3 className="font-serif text-lg">Orbit</h3>
              <p className="font-sans text-sm text-ink-soft">
                The bound orbit with a = {settings.a.toPrecision(4)}, e = {settings.e.toPrecision(2)} over {TURNS} turns, from a numerical integration of the exact orbit equation (odex, in this browser); the rosette is the perihelion advance.
              </p>
              {typeof orbit === "string" ? (
                <p role="alert" className="font-sans text-sm text-alarm">No orbit to draw: {orbit}.</p>
              ) : orbit ? (
                <>
                  <OrbitPlot trajectory={orbit} horizon={horizon} />
                  {orbit.end === "plunged" ? <p role="status" className="font-sans text-sm">The orbit crossed the horizon and was stopped there.</p> : null}
                </>
              ) : null}
            </div>
          ) : null}
        </>
      ) : null}
    </SpacetimeDialog>
  );
}
