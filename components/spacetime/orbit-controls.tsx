"use client";

import { useId } from "react";
import { latexName } from "@/cas/print/latex-names";
import { Latex } from "./latex";

const fmt = (x: number) => (Math.abs(x) >= 1e4 || (Math.abs(x) < 1e-3 && x !== 0) ? x.toExponential(3) : String(Number(x.toPrecision(4))));

/** A slider with its exact value beside it (typed values may leave the slider's range). */
export function SliderField({ label, tex, value, min, max, step, onChange, unit }: {
  label: string;
  tex?: string;
  value: number;
  min: number;
  max: number;
  step: number;
  unit?: string;
  onChange: (value: number) => void;
}) {
  const id = useId();
  const commit = (text: string) => {
    const next = Number(text);
    if (text.trim() !== "" && Number.isFinite(next) && next !== value) onChange(next);
  };
  return (
    <div className="grid grid-cols-[minmax(7rem,auto)_1fr_6rem] items-center gap-2 font-sans text-sm">
      <label htmlFor={id}>
        {tex ? <Latex source={tex} /> : null} <span className={tex ? "text-xs text-ink-muted" : ""}>{label}</span>
      </label>
      <input id={id} type="range" min={min} max={max} step={step} value={Math.min(max, Math.max(min, value))} onChange={(e) => onChange(Number(e.target.value))} className="accent-accent" />
      <span className="flex items-center gap-1">
        <input
          key={value}
          type="number"
          aria-label={`${label}, exact value`}
          defaultValue={fmt(value)}
          step="any"
          // committed on Enter or leaving the field, so typing "1." is not reformatted mid-way
          onBlur={(e) => commit(e.currentTarget.value)}
          onKeyDown={(e) => {
            if (e.key === "Enter") commit(e.currentTarget.value);
          }}
          className="w-full rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono text-xs"
        />
        {unit ? <span className="text-xs text-ink-muted">{unit}</span> : null}
      </span>
    </div>
  );
}

/** Sliders for the metric's constants, each from 0 to four times the value it opened with. */
export function ConstantSliders({ names, values, initial, onChange }: { names: readonly string[]; values: Readonly<Record<string, number>>; initial: Readonly<Record<string, number>>; onChange: (name: string, value: number) => void }) {
  if (names.length === 0) return <p className="font-sans text-sm text-ink-muted">The metric has no constants to set.</p>;
  return (
    <div className="grid gap-2">
      {names.map((name) => (
        <SliderField
          key={name}
          label={`constant ${name}`}
          tex={latexName(name)}
          value={values[name] ?? 1}
          min={0}
          max={4 * Math.max(Math.abs(initial[name] ?? 1), 1e-12)}
          step={Math.max(Math.abs(initial[name] ?? 1), 1e-12) / 100}
          onChange={(v) => onChange(name, v)}
        />
      ))}
    </div>
  );
}
