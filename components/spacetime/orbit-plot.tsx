"use client";

import { CartesianGrid, ReferenceDot, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import type { OrbitTrajectory } from "@/cas/spacetime/orbit-trajectory";

const fmt = (x: number) => (Math.abs(x) >= 1e4 ? x.toExponential(2) : x.toPrecision(3));

/** The integrated orbit in its plane (x = r cos φ, y = r sin φ), equal scales on both axes, the centre marked. */
export function OrbitPlot({ trajectory, horizon }: { trajectory: OrbitTrajectory; horizon: number | null }) {
  const reach = Math.max(...trajectory.points.map((p) => Math.max(Math.abs(p.x), Math.abs(p.y)))) * 1.08;
  const domain: [number, number] = [-reach, reach];
  return (
    <figure aria-label="Orbit plot" className="mx-auto w-full max-w-md">
      <ResponsiveContainer width="100%" aspect={1}>
        <ScatterChart margin={{ top: 12, right: 12, bottom: 12, left: 12 }}>
          <CartesianGrid stroke="#ddd4c2" strokeDasharray="2 4" />
          <XAxis dataKey="x" type="number" domain={domain} tickFormatter={fmt} stroke="#625c52" name="x" allowDataOverflow />
          <YAxis dataKey="y" type="number" domain={domain} tickFormatter={fmt} stroke="#625c52" name="y" width={56} allowDataOverflow />
          <Tooltip formatter={(v) => (typeof v === "number" ? fmt(v) : String(v))} contentStyle={{ background: "#fbf8f1", border: "1px solid #ddd4c2", fontSize: 12 }} />
          <Scatter data={[...trajectory.points]} line={{ stroke: "#1f5a55", strokeWidth: 1.5 }} shape={() => <g />} isAnimationActive={false} name="orbit" />
          <ReferenceDot x={0} y={0} r={horizon ? Math.max(3, Math.min(40, (horizon / reach) * 180)) : 3} fill="#1d1b18" stroke="none" label={{ value: "centre", position: "bottom", fontSize: 11 }} />
          <ReferenceDot x={trajectory.points[0].x} y={0} r={4} fill="#fbf8f1" stroke="#8c2f1c" label={{ value: "start (perihelion)", position: "right", fontSize: 11 }} />
        </ScatterChart>
      </ResponsiveContainer>
    </figure>
  );
}
