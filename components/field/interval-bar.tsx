import { percent } from "@/lib/field/confidence";
import type { Interval } from "@/lib/field/wilson";

/** The failure share as a dot on its confidence interval, 0–100 %; the numbers are always written beside it. */
export function IntervalBar({ interval, label }: { interval: Interval; label: string }) {
  const left = `${interval.lower * 100}%`;
  const width = `${Math.max(0.5, (interval.upper - interval.lower) * 100)}%`;
  return (
    <div className="flex min-w-48 items-center gap-2">
      <div className="relative h-3 w-28 shrink-0 rounded-full bg-stone-200" aria-hidden="true">
        <div className="absolute inset-y-0 rounded-full bg-red-300" style={{ left, width }} />
        <div
          className="absolute top-1/2 size-2.5 -translate-x-1/2 -translate-y-1/2 rounded-full border border-white bg-red-800"
          style={{ left: `${interval.share * 100}%` }}
        />
      </div>
      <span className="num text-sm" title={`${label} interval of the failure share`}>
        {percent(interval.lower)}–{percent(interval.upper)}
      </span>
    </div>
  );
}
