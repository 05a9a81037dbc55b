/**
 * The plan canvas's view: its size (followed with a ResizeObserver), the view (origin and scale,
 * null until the first fit), fitting the layout when asked, wheel zoom about the cursor, and the
 * zoom buttons' zoom about the middle.
 */
import { useCallback, useEffect, useRef, useState } from "react";
import { sampleCentreLine, type LayoutDocument, type ResolvedSection } from "~/analysis";
import { fitView, layoutBounds, zoomAt, type View } from "~/lib/editor/view";

export function useCanvasView(doc: LayoutDocument, sections: ResolvedSection[], fitRequest: number) {
  const wrapper = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 0, height: 0 });
  const [view, setView] = useState<View | null>(null);

  const fit = useCallback(() => {
    if (!size.width) return;
    const line = sections.length ? sampleCentreLine(sections, 1) : null;
    setView(fitView(layoutBounds(doc, line), size.width, size.height));
    // Fitting reads the drawing only when asked, not on every change.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [size.width, size.height]);

  useEffect(() => {
    const el = wrapper.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) =>
      setSize({ width: Math.floor(entry.contentRect.width), height: Math.floor(entry.contentRect.height) }),
    );
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  const fitted = useRef(-1);
  useEffect(() => {
    if (size.width && fitted.current !== fitRequest) {
      fitted.current = fitRequest;
      fit();
    }
  }, [size.width, fitRequest, fit]);

  // Wheel zoom about the cursor; a native listener, since React's wheel listener is passive.
  useEffect(() => {
    const el = wrapper.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const rect = el.getBoundingClientRect();
      const at = { x: e.clientX - rect.left, y: e.clientY - rect.top };
      setView((v) => (v ? zoomAt(v, at, Math.exp(-e.deltaY * 0.0015)) : v));
    };
    el.addEventListener("wheel", onWheel, { passive: false });
    return () => el.removeEventListener("wheel", onWheel);
  }, []);

  /** Zoom by `factor` about the middle of the canvas (the + and − buttons). */
  const zoomBy = (factor: number) =>
    setView((v) => (v ? zoomAt(v, { x: size.width / 2, y: size.height / 2 }, factor) : v));

  return { wrapper, size, view, setView, fit, zoomBy };
}
