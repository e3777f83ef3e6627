"use client";

import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

export type VersionOutcomePoint = { label: string; asWritten: number; afterChanges: number; failed: number };

// Colours chosen for contrast against white and each other; the figcaption carries the same numbers as text.
const SERIES = [
  { key: "asWritten", name: "Worked as written", fill: "#3f7d4e" },
  { key: "afterChanges", name: "Worked after changes", fill: "#c28a1c" },
  { key: "failed", name: "Failed", fill: "#a8322d" },
] as const;

/** Outcome reports per version, stacked by result. */
export function VersionOutcomesChart({ data }: { data: VersionOutcomePoint[] }) {
  return (
    <figure aria-label="Outcome reports per version">
      <div style={{ height: 240 }}>
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} margin={{ left: 0, right: 16, top: 8 }}>
            <CartesianGrid strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="label" />
            <YAxis allowDecimals={false} />
            <Tooltip />
            <Legend />
            {SERIES.map((s) => (
              <Bar key={s.key} dataKey={s.key} name={s.name} stackId="outcomes" fill={s.fill} />
            ))}
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="sr-only">
        {data.map((d) => `${d.label}: ${d.asWritten} worked as written, ${d.afterChanges} after changes, ${d.failed} failed`).join("; ")}
      </figcaption>
    </figure>
  );
}
