"use client";

import { useEffect, useRef, useState } from "react";

type Options = {
  /** How far outside the viewport counts as near, as a CSS margin ("600px 0px"). */
  rootMargin: string;
  /** Also turn true once the browser is idle after the page loaded, wherever the element is. */
  whenIdle?: boolean;
};

/**
 * For code that loads when its part of the page comes into view: `near` turns true (and stays true) once the
 * element behind `ref` comes within `rootMargin` of the viewport. Without IntersectionObserver it is true at once.
 */
export function useNearViewport<T extends Element>({ rootMargin, whenIdle = false }: Options) {
  const ref = useRef<T>(null);
  const [near, setNear] = useState(false);
  useEffect(() => {
    if (near) return;
    const want = () => setNear(true);
    if (typeof IntersectionObserver === "undefined") return want();
    const observer = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && want(), { rootMargin });
    if (ref.current) observer.observe(ref.current);
    if (!whenIdle) return () => observer.disconnect();
    // Safari has no requestIdleCallback: a timer stands in.
    const hasIdle = typeof window.requestIdleCallback === "function";
    const idle = hasIdle ? window.requestIdleCallback(want, { timeout: 4000 }) : window.setTimeout(want, 2000);
    return () => {
      observer.disconnect();
      if (hasIdle) window.cancelIdleCallback(idle);
      else window.clearTimeout(idle);
    };
  }, [near, rootMargin, whenIdle]);
  return { ref, near };
}
