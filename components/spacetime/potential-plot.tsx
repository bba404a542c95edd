"use client";

import { CartesianGrid, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { PotentialCurve } from "./orbit-model";

const fmt = (x: number) => (Math.abs(x) >= 1e4 || (Math.abs(x) < 1e-3 && x !== 0) ? x.toExponential(3) : x.toPrecision(4));

export interface RadiusMark {
  readonly r: number;
  readonly label: string;
  /** Dash pattern, so marks differ by shape and label, not colour alone. */
  readonly dash: string;
}

/**
 * V_eff(r) per unit mass at the chosen L: hover shows r and V_eff; the circular
 * orbits at this L are marked on the curve (● stable minimum, ○ unstable maximum);
 * the horizon, photon sphere, ISCO and marginally bound orbit are vertical marks.
 */
export function PotentialPlot({ curve, marks, from, to }: { curve: PotentialCurve; marks: readonly RadiusMark[]; from: number; to: number }) {
  return (
    <figure aria-label="Effective potential plot" className="w-full">
      <div className="h-80 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={curve.points as { x: number; y: number | null }[]} margin={{ top: 24, right: 24, bottom: 24, left: 12 }}>
            <CartesianGrid stroke="#ddd4c2" strokeDasharray="2 4" />
            <XAxis
              dataKey="x"
              type="number"
              domain={[from, to]}
              allowDataOverflow
              tickFormatter={fmt}
              label={{ value: "r", position: "insideBottomRight", offset: -12 }}
              stroke="#625c52"
            />
            <YAxis tickFormatter={fmt} stroke="#625c52" width={64} label={{ value: "V_eff / μc²", angle: -90, position: "insideLeft", offset: 4 }} />
            <Tooltip
              formatter={(value) => [typeof value === "number" ? fmt(value) : String(value), "V_eff"]}
              labelFormatter={(label) => `r = ${typeof label === "number" ? fmt(label) : String(label)}`}
              contentStyle={{ background: "#fbf8f1", border: "1px solid #ddd4c2", fontFamily: "var(--font-sans)", fontSize: 12 }}
            />
            <ReferenceLine y={0} stroke="#625c52" strokeWidth={0.8} />
            {marks.filter((m) => m.r >= from && m.r <= to).map((m) => (
              <ReferenceLine key={m.label} x={m.r} stroke="#3f3b35" strokeDasharray={m.dash} label={{ value: m.label, position: "top", fontSize: 11, fill: "#3f3b35" }} />
            ))}
            <Line type="monotone" dataKey="y" stroke="#1f5a55" strokeWidth={2} dot={false} connectNulls={false} isAnimationActive={false} name="V_eff" />
            {curve.circular.map((c) => (
              <ReferenceDot
                key={`${c.kind}-${c.x}`}
                x={c.x}
                y={c.y}
                r={5}
                fill={c.kind === "minimum" ? "#1f5a55" : "#fbf8f1"}
                stroke="#1f5a55"
                strokeWidth={2}
                label={{ value: c.kind === "minimum" ? "stable" : "unstable", position: c.kind === "minimum" ? "bottom" : "top", fontSize: 11 }}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
