"use client";

import { useLayoutEffect, useRef, useState, type RefObject } from "react";

/** Width used before the browser has measured (server rendering, first paint, tests). */
export const FALLBACK_WIDTH_PX = 720;

/**
 * Width of an element in px, kept up to date by a ResizeObserver; `fallback` until measured (on the server
 * and where ResizeObserver is missing). Widths are rounded down to whole px so sub-pixel jitter does not
 * re-render the plot.
 */
export function useElementWidth<T extends HTMLElement>(fallback = FALLBACK_WIDTH_PX): [RefObject<T | null>, number] {
  const ref = useRef<T | null>(null);
  const [width, setWidth] = useState(fallback);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    const measure = (w: number) => {
      const next = Math.floor(w);
      if (next > 0) setWidth((prev) => (prev === next ? prev : next));
    };
    measure(el.getBoundingClientRect().width);
    if (typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver((entries) => {
      for (const e of entries) measure(e.contentRect.width);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return [ref, width];
}
