import { useMemo, useRef, useState } from 'react';
import { PanResponder, type GestureResponderEvent } from 'react-native';

interface View2D { x: number; y: number; k: number }
const MIN_SCALE = 0.15;
const MAX_SCALE = 2.5;
const clampK = (k: number) => Math.min(MAX_SCALE, Math.max(MIN_SCALE, k));

function spread(e: GestureResponderEvent) {
  const t = e.nativeEvent.touches;
  if (!t || t.length < 2) return null;
  const [a, b] = [t[0], t[1]];
  return { d: Math.hypot(a.pageX - b.pageX, a.pageY - b.pageY), cx: (a.locationX + b.locationX) / 2, cy: (a.locationY + b.locationY) / 2 };
}

/**
 * Drag to pan, pinch to zoom (two fingers), plus zoom and fit for buttons. A press that does not move is left to
 * the item under the finger, so tapping an item still opens it.
 */
export function usePanZoom(initial: View2D) {
  const [view, setView] = useState(initial);
  const viewRef = useRef(view);
  viewRef.current = view;
  const start = useRef<{ view: View2D; pinch: ReturnType<typeof spread> }>({ view: initial, pinch: null });

  const responder = useMemo(
    () => PanResponder.create({
      onMoveShouldSetPanResponder: (_e, g) => Math.abs(g.dx) + Math.abs(g.dy) > 6 || g.numberActiveTouches > 1,
      onPanResponderGrant: (e) => { start.current = { view: viewRef.current, pinch: spread(e) }; },
      onPanResponderMove: (e, g) => {
        const s = start.current;
        const now = spread(e);
        if (now && s.pinch) {
          const k = clampK((s.view.k * now.d) / s.pinch.d);
          // Keep the point between the fingers where it was.
          const ratio = k / s.view.k;
          setView({ k, x: s.pinch.cx - (s.pinch.cx - s.view.x) * ratio, y: s.pinch.cy - (s.pinch.cy - s.view.y) * ratio });
        } else {
          setView({ ...s.view, x: s.view.x + g.dx, y: s.view.y + g.dy });
        }
      },
      onPanResponderTerminationRequest: () => false,
    }),
    [],
  );

  /** Zoom by `factor` about a point of the frame (its centre for the buttons). */
  const zoom = (factor: number, cx: number, cy: number) =>
    setView((v) => { const k = clampK(v.k * factor); const r = k / v.k; return { k, x: cx - (cx - v.x) * r, y: cy - (cy - v.y) * r }; });

  return { view, setView, zoom, handlers: responder.panHandlers };
}

/** The view that shows a `w` × `h` drawing whole in a `fw` × `fh` frame, centred, never enlarged. */
export function fitView(w: number, h: number, fw: number, fh: number): View2D {
  const k = clampK(Math.min(1, fw / Math.max(w, 1), fh / Math.max(h, 1)));
  return { k, x: (fw - w * k) / 2, y: (fh - h * k) / 2 };
}

/**
 * Large rooms start readable rather than whole: at least this scale, with `focus` (a point of the drawing) in the
 * middle of the frame, or else the top of the drawing centred across.
 */
const START_SCALE = 0.6;
export function startView(w: number, fw: number, fh: number, focus?: { x: number; y: number }): View2D {
  if (focus) return { k: 1, x: fw / 2 - focus.x, y: fh / 2 - focus.y };
  const k = Math.max(START_SCALE, fitView(w, 0, fw, fh).k);
  return { k, x: (fw - w * k) / 2, y: 0 };
}

/**
 * The style transform that draws point p of the drawing at (x + k·p): a view scales about its own centre, so the
 * centre's shift is taken back in the translation.
 */
export function transformFor(v: View2D, w: number, h: number) {
  return [{ translateX: v.x - (w / 2) * (1 - v.k) }, { translateY: v.y - (h / 2) * (1 - v.k) }, { scale: v.k }];
}
