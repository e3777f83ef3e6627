"use client";

import { lazy, Suspense } from "react";

import { useNearViewport } from "@/components/ui/use-near-viewport";

import type { AdaptPanelProps } from "./adapt-panel";

// The panel carries the engine and its forms: a Library page reads first and adapts later, so the panel's
// code is not part of the page's first load. React.lazy rather than next/dynamic: the panel never renders on
// the server here (it waits for the viewport), and next/dynamic's own code would join the first load.
const AdaptPanel = lazy(() => import("./adapt-panel").then((m) => ({ default: m.AdaptPanel })));

function PanelPlaceholder() {
  return <div className="mt-3 h-72 animate-pulse rounded bg-stone-200/70" aria-label="Loading the calculator" />;
}

/** The adapt panel, loaded when it comes near the viewport, or once the browser is idle after the page loaded. */
export function LazyAdaptPanel(props: AdaptPanelProps) {
  const { ref, near } = useNearViewport<HTMLDivElement>({ rootMargin: "600px 0px", whenIdle: true });
  return near ? (
    <Suspense fallback={<PanelPlaceholder />}>
      <AdaptPanel {...props} />
    </Suspense>
  ) : (
    <div ref={ref}>
      <PanelPlaceholder />
    </div>
  );
}
