"use client";

import dynamic from "next/dynamic";

import { useNearViewport } from "@/components/ui/use-near-viewport";

import type { FeedSpeedChartProps } from "./feed-speed-chart";

// recharts is the heaviest download of the adapt panel and draws nothing useful on the server: the chart
// loads in the browser only, when it comes near the viewport.
const FeedSpeedChart = dynamic(() => import("./feed-speed-chart").then((m) => m.FeedSpeedChart), {
  ssr: false,
  loading: () => <ChartPlaceholder />,
});

function ChartPlaceholder() {
  return <div className="mt-4 h-72 animate-pulse rounded bg-stone-200/70" aria-label="Loading the chart" />;
}

/** The feed-against-speed chart, loaded when it comes within a screen of the viewport. */
export function LazyFeedSpeedChart(props: FeedSpeedChartProps) {
  const { ref, near } = useNearViewport<HTMLDivElement>({ rootMargin: "400px 0px" });
  return near ? (
    <FeedSpeedChart {...props} />
  ) : (
    <div ref={ref}>
      <ChartPlaceholder />
    </div>
  );
}
