"use client";

import { useRouter } from "next/navigation";
import { useEffect } from "react";

/** The generation job's progress; the page reloads its data every second and a half until the job is done. */
export function BatchProgress({ done, total }: { done: number; total: number }) {
  const router = useRouter();
  useEffect(() => {
    const timer = setInterval(() => router.refresh(), 1500);
    return () => clearInterval(timer);
  }, [router]);
  const pct = total ? Math.floor((100 * done) / total) : 0;
  return (
    <div role="status" aria-live="polite" className="flex flex-col gap-1">
      <label htmlFor="batch-progress" className="text-sm font-medium">
        Generating: <span className="num">{done}</span> of <span className="num">{total}</span> sheets ({pct} %)
      </label>
      <progress id="batch-progress" value={done} max={Math.max(total, 1)} className="h-3 w-full max-w-xl" />
    </div>
  );
}
