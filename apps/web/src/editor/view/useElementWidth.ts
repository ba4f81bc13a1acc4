import { useEffect, useState, type RefObject } from "react";

/** The element's content width in CSS px, following resizes. */
export function useElementWidth(ref: RefObject<HTMLElement | null>, fallback = 900): number {
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    setWidth(el.clientWidth || fallback);
    if (typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver((entries) => {
      const w = entries[0]?.contentRect.width;
      if (w) setWidth(Math.floor(w));
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref, fallback]);
  return width;
}
