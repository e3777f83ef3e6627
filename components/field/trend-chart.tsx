"use client";

import { Bar, CartesianGrid, ComposedChart, Legend, Line, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

export type TrendPoint = { week: string; label: string; reports: number; failedPct: number | null; published: string };

/** Reports per week as bars, the failure share as a line, and a marker at each week a version was published. */
export function TrendChart({ data }: { data: TrendPoint[] }) {
  return (
    <figure aria-label="Outcome reports and failure share per week">
      <div style={{ height: 260 }}>
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={data} margin={{ left: 0, right: 8, top: 16 }}>
            <CartesianGrid strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="label" minTickGap={16} />
            <YAxis yAxisId="reports" allowDecimals={false} />
            <YAxis yAxisId="share" orientation="right" domain={[0, 100]} unit=" %" />
            <Tooltip />
            <Legend />
            <Bar yAxisId="reports" dataKey="reports" name="Reports" fill="#57534e" />
            <Line
              yAxisId="share"
              dataKey="failedPct"
              name="Failed (% of reports)"
              stroke="#a8322d"
              strokeWidth={2}
              connectNulls
              dot={false}
            />
            {data
              .filter((d) => d.published)
              .map((d) => (
                <ReferenceLine
                  key={d.week}
                  yAxisId="reports"
                  x={d.label}
                  stroke="#1d4ed8"
                  strokeDasharray="4 2"
                  label={{ value: d.published, position: "top", fill: "#1d4ed8", fontSize: 12 }}
                />
              ))}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="sr-only">The table below holds the same numbers.</figcaption>
    </figure>
  );
}
