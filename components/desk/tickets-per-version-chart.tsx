"use client";

import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

/** Tickets per linked sheet version (recharts renders in the browser only). */
export function TicketsPerVersionChart({ data }: { data: { label: string; tickets: number }[] }) {
  if (!data.length) return <p className="text-sm text-stone-600">No tickets are linked to a sheet version yet.</p>;
  return (
    <figure aria-label="Tickets per sheet version">
      <div style={{ height: Math.max(180, data.length * 36) }}>
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} layout="vertical" margin={{ left: 16, right: 16 }}>
            <CartesianGrid strokeDasharray="3 3" horizontal={false} />
            <XAxis type="number" allowDecimals={false} />
            <YAxis type="category" dataKey="label" width={220} tick={{ fontSize: 12 }} />
            <Tooltip />
            <Bar dataKey="tickets" name="Tickets" fill="var(--accent, #2f5d8a)" />
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="sr-only">{data.map((d) => `${d.label}: ${d.tickets} tickets`).join("; ")}</figcaption>
    </figure>
  );
}
