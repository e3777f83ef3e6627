"use client";

import { useEffect } from "react";

// A sheet version adapted to one machine counts once per browser tab, however many operation panels
// the page shows and however often the reader changes ae or ap; a machine typed in counts once it has
// settled for a moment. Counting is best effort: a failed beacon is never shown to anyone.
const reported = new Set<string>();
const SETTLE_MS = 1500;

export function useAdaptationBeacon({
  vendorSlug,
  versionId,
  adaptationKey,
  ok,
}: {
  vendorSlug: string;
  versionId: string;
  adaptationKey: string;
  ok: boolean;
}) {
  useEffect(() => {
    if (!ok) return;
    const key = `${versionId}|${adaptationKey}`;
    if (reported.has(key)) return;
    const timer = setTimeout(() => {
      reported.add(key);
      fetch(`/api/v1/vendors/${encodeURIComponent(vendorSlug)}/activity`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ versionId, kind: "adaptation" }),
        keepalive: true,
      }).catch(() => undefined);
    }, SETTLE_MS);
    return () => clearTimeout(timer);
  }, [vendorSlug, versionId, adaptationKey, ok]);
}
