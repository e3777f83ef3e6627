"use client";

import dynamic from "next/dynamic";

import type { TrendPoint } from "./trend-chart";

// recharts draws nothing useful on the server and is heavy: it loads in the browser, after the table.
const TrendChart = dynamic(() => import("./trend-chart").then((m) => m.TrendChart), {
  ssr: false,
  loading: () => <div className="h-[260px] animate-pulse rounded bg-stone-100" aria-hidden="true" />,
});

export function LazyTrendChart({ data }: { data: TrendPoint[] }) {
  return <TrendChart data={data} />;
}
