"use client";

import { useId } from "react";
import {
  Area,
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceArea,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";

import type { FeedSpeedCurve } from "@/lib/bench/feed-speed-curve";
import type { UnitSystem } from "@/lib/machining";

export type FeedSpeedChartProps = { curve: FeedSpeedCurve; units: UnitSystem };

/** Feed against spindle speed across the machine's range, with the vc window and the rubbing zone shaded. */
export function FeedSpeedChart({ curve, units }: FeedSpeedChartProps) {
  const feedUnit = units === "imperial" ? "in/min" : "mm/min";
  const digits = units === "imperial" ? 1 : 0;
  const captionId = useId();
  const rpm = (v: number) => Math.round(v).toLocaleString("en-GB");
  const feed = (v: number) => `${v.toFixed(digits)} ${feedUnit}`;
  // What the picture shows, in words, for screen readers (the drawing itself is one image to them).
  const summary = [
    `Chart of feed rate against spindle speed from ${rpm(curve.points[0]?.rpm ?? 0)} to ${rpm(curve.points.at(-1)?.rpm ?? 0)} rpm.`,
    `The adapted point is ${rpm(curve.adapted.rpm)} rpm at ${feed(curve.adapted.feed)}; the machine's highest feed is ${feed(curve.maxFeed)}.`,
    curve.vcWindowRpm
      ? `The material's cutting-speed window lies between ${rpm(curve.vcWindowRpm[0])} and ${rpm(curve.vcWindowRpm[1])} rpm.`
      : "No speed on this machine reaches the material's cutting-speed window.",
  ].join(" ");
  return (
    <figure className="mt-4" aria-labelledby={`${captionId}-name`} aria-describedby={captionId}>
      <p id={`${captionId}-name`} className="text-sm font-semibold">
        Feed against spindle speed
      </p>
      <div className="h-64 w-full overflow-hidden" role="img" aria-label={summary}>
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={curve.points} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
            <CartesianGrid stroke="#e7e5e4" />
            <XAxis
              dataKey="rpm"
              type="number"
              domain={["dataMin", "dataMax"]}
              tickFormatter={(v: number) => `${(v / 1000).toFixed(v % 1000 ? 1 : 0)}k`}
              label={{ value: "n (rpm)", position: "insideBottom", offset: -12 }}
            />
            <YAxis
              tickFormatter={(v: number) => v.toFixed(digits)}
              label={{ value: `vf (${feedUnit})`, angle: -90, position: "insideLeft" }}
            />
            {curve.vcWindowRpm ? (
              <ReferenceArea
                x1={curve.vcWindowRpm[0]}
                x2={curve.vcWindowRpm[1]}
                fill="#16a34a"
                fillOpacity={0.08}
                label={{ value: "vc window", position: "insideBottomLeft" }}
              />
            ) : null}
            <Area
              type="linear"
              dataKey="rubbing"
              name="Below minimum chip load (rubbing)"
              fill="#f59e0b"
              fillOpacity={0.25}
              stroke="#b45309"
              strokeDasharray="4 3"
              isAnimationActive={false}
            />
            <Line
              type="linear"
              dataKey="feed"
              name="vf at this chip load"
              stroke="#292524"
              dot={false}
              strokeWidth={2}
              isAnimationActive={false}
            />
            <ReferenceLine
              y={curve.maxFeed}
              stroke="#78716c"
              strokeDasharray="2 2"
              label={{ value: "machine max feed", position: "insideTopRight" }}
            />
            <ReferenceDot
              x={curve.adapted.rpm}
              y={curve.adapted.feed}
              r={6}
              fill="var(--accent, #1d4ed8)"
              stroke="#0c0a09"
              label={{ value: "adapted", position: "left" }}
            />
            <Tooltip formatter={(value) => `${Number(value).toFixed(digits)} ${feedUnit}`} labelFormatter={(label) => `${label} rpm`} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption id={captionId} className="mt-1 text-xs text-stone-600">
        Green band: spindle speeds inside the material&apos;s cutting-speed window. Amber area: feeds below the minimum chip load, where the
        cutter rubs and plastics melt. Dot: the adapted point.
      </figcaption>
    </figure>
  );
}
