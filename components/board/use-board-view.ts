"use client";

import { useCallback, useEffect, useLayoutEffect, useRef, useState } from "react";
import { canvasHeightFor, fitToView, type Size, type View } from "@/lib/board/view";

/** px kept round the surface when it is fitted: room for two rows of dimension lines */
const FIT_MARGIN = 64;
const MIN_HEIGHT = 360;
/** the top bar and a little air above the canvas */
const WINDOW_RESERVE = 120;

// The canvas fills its column's width and as much of the window's height as the surface needs
// (a long wall gets a short canvas), following both as they change. The view fits the whole
// surface until the person zooms or pans themselves.
export function useBoardView(surface: Size) {
  const ref = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 900, height: 480 });
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    const measure = () => {
      const width = el.clientWidth;
      const max = Math.max(MIN_HEIGHT, window.innerHeight - WINDOW_RESERVE);
      const height = canvasHeightFor(surface, width, { min: MIN_HEIGHT, max, margin: FIT_MARGIN });
      setSize((s) => (s.width === width && s.height === height ? s : { width, height }));
    };
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    window.addEventListener("resize", measure);
    return () => {
      ro.disconnect();
      window.removeEventListener("resize", measure);
    };
  }, [surface.width, surface.height]); // eslint-disable-line react-hooks/exhaustive-deps

  const [view, setView] = useState<View>(() => fitToView(surface, size, FIT_MARGIN));
  const userMoved = useRef(false);
  useEffect(() => {
    if (!userMoved.current && size.width > 0) setView(fitToView(surface, size, FIT_MARGIN));
  }, [size, surface]);
  const moveView = useCallback((f: (v: View) => View) => {
    userMoved.current = true;
    setView(f);
  }, []);
  const fit = useCallback(() => {
    userMoved.current = false;
    setView(fitToView(surface, size, FIT_MARGIN));
  }, [surface, size]);
  return { ref, size, view, moveView, fit };
}
