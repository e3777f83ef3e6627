"use client";

import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

export type SymptomPoint = { symptom: string } & Record<string, number | string>;

const SHADES = ["#7a8fa6", "#2f5d8a", "#1d3a57", "#5b7f5b", "#8a5a2f"];

/** Failed reports by symptom, one bar per version, so a fix shows as a bar that shrinks. */
export function SymptomChart({ data, versions }: { data: SymptomPoint[]; versions: string[] }) {
  return (
    <figure aria-label="Failed reports by symptom and version">
      <div style={{ height: 240 }}>
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} margin={{ left: 0, right: 16, top: 8 }}>
            <CartesianGrid strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="symptom" tick={{ fontSize: 12 }} />
            <YAxis allowDecimals={false} />
            <Tooltip />
            <Legend />
            {versions.map((v, i) => (
              <Bar key={v} dataKey={v} name={v} fill={SHADES[i % SHADES.length]} />
            ))}
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="sr-only">
        {data.map((d) => `${d.symptom}: ${versions.map((v) => `${v} ${d[v]}`).join(", ")}`).join("; ")}
      </figcaption>
    </figure>
  );
}
