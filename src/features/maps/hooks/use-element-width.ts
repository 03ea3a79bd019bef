import { useLayoutEffect, useState, type RefObject } from "react";

/**
 * The content width of an element, following resizes (ResizeObserver). Environments without
 * layout (jsdom) report 0; then `fallback` is used so charts still render.
 */
export function useElementWidth(ref: RefObject<HTMLElement | null>, fallback = 720): number {
  const [width, setWidth] = useState(0);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    setWidth(el.clientWidth);
    if (typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver((entries) => {
      const w = Math.floor(entries[0]?.contentRect.width ?? 0);
      setWidth((old) => (old === w ? old : w));
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref]);
  return width > 0 ? width : fallback;
}
