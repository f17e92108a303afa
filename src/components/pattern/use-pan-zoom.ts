import { useCallback, useEffect, useLayoutEffect, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';

/** How the drawing is scaled: fitted to the box, at true size (calibrated), or where the user left it. */
export type ZoomMode = 'fit' | 'true' | 'free';

export interface View {
  mode: ZoomMode;
  /** CSS px per mm of the drawing. */
  scale: number;
  /** Where the drawing's top-left corner sits in the box, CSS px. */
  x: number;
  y: number;
}

// Most magnified: a 1 mm stitch hole about 40 px across; least: half the fitted size.
const MAX_PX_PER_MM = 40;
const PAD_PX = 8;
// At least this much of the drawing stays in the box when panning.
const KEEP_PX = 48;
const STEP = 1.25;

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/**
 * Pan and zoom of a drawing `sizeMm` big inside a box: wheel (zoom about the pointer),
 * one-finger or mouse drag (pan), two-finger pinch (pointer events), keys (+ - 0 arrows) and
 * the toolbar's calls. `truePxPerMm` is the calibrated screen ratio, null before calibration.
 */
export function usePanZoom(sizeMm: { w: number; h: number }, truePxPerMm: number | null) {
  const box = useRef<HTMLDivElement>(null);
  const [boxPx, setBoxPx] = useState({ w: 0, h: 0 });
  const [view, setView] = useState<View>({ mode: 'fit', scale: 1, x: PAD_PX, y: PAD_PX });
  const pointers = useRef(new Map<number, { x: number; y: number }>());

  const fitScale = boxPx.w > 0 && sizeMm.w > 0 ? Math.min((boxPx.w - 2 * PAD_PX) / sizeMm.w, (boxPx.h - 2 * PAD_PX) / Math.max(sizeMm.h, 1)) : 1;
  const minScale = fitScale / 2;

  // Keeps part of the drawing on screen whatever the pan.
  const bound = useCallback(
    (v: View): View => {
      const w = sizeMm.w * v.scale;
      const h = sizeMm.h * v.scale;
      return { ...v, x: clamp(v.x, Math.min(KEEP_PX - w, 0), Math.max(boxPx.w - KEEP_PX, 0)), y: clamp(v.y, Math.min(KEEP_PX - h, 0), Math.max(boxPx.h - KEEP_PX, 0)) };
    },
    [sizeMm.w, sizeMm.h, boxPx.w, boxPx.h],
  );

  useLayoutEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver(() => setBoxPx({ w: el.clientWidth, h: el.clientHeight }));
    ro.observe(el);
    setBoxPx({ w: el.clientWidth, h: el.clientHeight });
    return () => ro.disconnect();
  }, []);

  // The whole drawing, centred in the box.
  const fitView = useCallback((): View => ({ mode: 'fit', scale: fitScale, x: (boxPx.w - sizeMm.w * fitScale) / 2, y: (boxPx.h - sizeMm.h * fitScale) / 2 }), [fitScale, boxPx.w, boxPx.h, sizeMm.w, sizeMm.h]);

  // Fit follows the box and the drawing; the other modes stay where the user put them. A
  // layout effect: a new drawing is never painted at the previous drawing's scale first.
  useLayoutEffect(() => {
    setView((v) => (v.mode === 'fit' ? fitView() : v));
  }, [fitView]);

  const zoomAt = useCallback(
    (factor: number, px?: number, py?: number) => setView((v) => bound(zoomAbout(v, factor, px ?? boxPx.w / 2, py ?? boxPx.h / 2, minScale))),
    [minScale, boxPx.w, boxPx.h, bound],
  );
  const panBy = useCallback((dx: number, dy: number) => setView((v) => bound({ ...v, mode: v.mode === 'fit' ? 'free' : v.mode, x: v.x + dx, y: v.y + dy })), [bound]);
  const fit = useCallback(() => setView(fitView()), [fitView]);
  /** True size at the stored ratio, or at `pxPerMm` just calibrated. */
  const trueSize = useCallback(
    (pxPerMm?: number) => {
      const scale = pxPerMm ?? truePxPerMm;
      if (scale === null) return;
      setView({ mode: 'true', scale, x: PAD_PX, y: PAD_PX });
    },
    [truePxPerMm],
  );

  // Wheel zoom needs a non-passive listener to keep the page from scrolling under it.
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = el.getBoundingClientRect();
      if (Math.abs(e.deltaX) > Math.abs(e.deltaY)) panBy(-e.deltaX, 0);
      else zoomAt(Math.exp(-e.deltaY * 0.0015), e.clientX - r.left, e.clientY - r.top);
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => el.removeEventListener('wheel', onWheel);
  }, [zoomAt, panBy]);

  const onPointerDown = (e: PointerEvent<HTMLDivElement>) => {
    e.currentTarget.setPointerCapture(e.pointerId);
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
  };
  const onPointerMove = (e: PointerEvent<HTMLDivElement>) => {
    const ps = pointers.current;
    const prev = ps.get(e.pointerId);
    if (!prev) return;
    if (ps.size === 1) {
      panBy(e.clientX - prev.x, e.clientY - prev.y);
    } else if (ps.size === 2) {
      // Pinch: the change of the distance between the two fingers, about their midpoint.
      const other = [...ps.entries()].find(([id]) => id !== e.pointerId)?.[1];
      if (other) {
        const before = Math.hypot(prev.x - other.x, prev.y - other.y);
        const after = Math.hypot(e.clientX - other.x, e.clientY - other.y);
        const r = e.currentTarget.getBoundingClientRect();
        if (before > 0) zoomAt(after / before, (e.clientX + other.x) / 2 - r.left, (e.clientY + other.y) / 2 - r.top);
      }
    }
    ps.set(e.pointerId, { x: e.clientX, y: e.clientY });
  };
  const onPointerUp = (e: PointerEvent<HTMLDivElement>) => {
    pointers.current.delete(e.pointerId);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const step = e.shiftKey ? 160 : 40;
    const keys: Record<string, () => void> = {
      '+': () => zoomAt(STEP),
      '=': () => zoomAt(STEP),
      '-': () => zoomAt(1 / STEP),
      _: () => zoomAt(1 / STEP),
      '0': fit,
      ArrowLeft: () => panBy(step, 0),
      ArrowRight: () => panBy(-step, 0),
      ArrowUp: () => panBy(0, step),
      ArrowDown: () => panBy(0, -step),
    };
    const act = keys[e.key];
    if (!act) return;
    e.preventDefault();
    act();
  };

  return {
    box,
    view,
    fitScale,
    zoomIn: () => zoomAt(STEP),
    zoomOut: () => zoomAt(1 / STEP),
    fit,
    trueSize,
    handlers: { onPointerDown, onPointerMove, onPointerUp, onPointerCancel: onPointerUp, onKeyDown },
  };
}

/**
 * The view zoomed by `factor` about the box point (px, py): the point of the drawing under it
 * stays under it (wheel and pinch), the scale kept between `minScale` and 40 px per mm.
 */
export function zoomAbout(v: View, factor: number, px: number, py: number, minScale: number): View {
  const scale = clamp(v.scale * factor, minScale, MAX_PX_PER_MM);
  const k = scale / v.scale;
  return { mode: 'free', scale, x: px - (px - v.x) * k, y: py - (py - v.y) * k };
}

/** The drawing's size in mm from the SVG's own `width="..mm" height="..mm"`. */
export function svgSizeMm(svg: string): { w: number; h: number } {
  const w = /<svg[^>]*\swidth="([\d.]+)mm"/.exec(svg)?.[1];
  const h = /<svg[^>]*\sheight="([\d.]+)mm"/.exec(svg)?.[1];
  return { w: Number(w ?? 100), h: Number(h ?? 30) };
}
