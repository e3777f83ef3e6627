"use client";

import dynamic from "next/dynamic";
import { useEffect, useRef, useState } from "react";

import type { AdaptPanelProps } from "./adapt-panel";

// The panel carries the engine and its forms: a Library page reads first and adapts later, so the panel's
// code is not part of the page's first load.
const AdaptPanel = dynamic(() => import("./adapt-panel").then((m) => m.AdaptPanel), {
  ssr: false,
  loading: () => <PanelPlaceholder />,
});

function PanelPlaceholder() {
  return <div className="mt-3 h-72 animate-pulse rounded bg-stone-200/70" aria-label="Loading the calculator" />;
}

/** The adapt panel, loaded when it comes near the viewport, or once the browser is idle after the page loaded. */
export function LazyAdaptPanel(props: AdaptPanelProps) {
  const spot = useRef<HTMLDivElement>(null);
  const [wanted, setWanted] = useState(false);
  useEffect(() => {
    if (wanted || !spot.current) return;
    const want = () => setWanted(true);
    const observer = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && want(), { rootMargin: "600px 0px" });
    observer.observe(spot.current);
    // Safari has no requestIdleCallback: a timer stands in.
    const hasIdle = typeof window.requestIdleCallback === "function";
    const idle = hasIdle ? window.requestIdleCallback(want, { timeout: 4000 }) : window.setTimeout(want, 2000);
    return () => {
      observer.disconnect();
      if (hasIdle) window.cancelIdleCallback(idle);
      else window.clearTimeout(idle);
    };
  }, [wanted]);
  return wanted ? (
    <AdaptPanel {...props} />
  ) : (
    <div ref={spot}>
      <PanelPlaceholder />
    </div>
  );
}
