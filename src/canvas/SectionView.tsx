// The section view: a react-konva Stage filling its box. Wheel zooms about the cursor; dragging with the
// space bar held (app/useKeys sets it) or the middle button pans. The camera is the Stage's own scale and position. The box
// takes the keyboard focus when pressed (and by Tab), so that Enter and Space go to the tools from here
// while a focused button or field elsewhere keeps its own (keyForTools).
// Per-frame work stays out of React: the camera is set on the Stage from a store subscription (a pan
// frame re-renders nothing), and the Stage's place on the page, which Konva would otherwise read with
// getBoundingClientRect (a forced layout) on every pointer move, is read when the box changes size, the
// page scrolls or resizes, or the pointer enters or presses in the box (viewBoxRect.ts).
import { useCallback, useEffect, useRef } from 'react';
import { Stage } from 'react-konva';
import type Konva from 'konva';
import { useSessionStore } from '../state/sessionStore';
import { zoomAbout } from '../state/camera';
import { ScanLayer } from './ScanLayer';
import { ShapesLayer } from './ShapesLayer';
import { OverlayLayer } from './OverlayLayer';
import { CursorReadout } from './CursorReadout';
import { usePinchZoom } from './usePinchZoom';
import { toolPointerDown, useToolDispatch } from './toolDispatch';
import { cachedClientRect, invalidateViewRects } from './viewBoxRect';
import { useToolSession } from '../state/toolSessionStore';

const WHEEL_ZOOM_STEP = 1.0015;
/** A trackpad pinch arrives as a wheel with ctrlKey and small deltas: a stronger step per unit. */
const PINCH_ZOOM_STEP = 1.01;

export function SectionView() {
  const boxRef = useRef<HTMLDivElement>(null);
  const stageRef = useRef<Konva.Stage>(null);
  useToolDispatch(boxRef);
  const viewport = useSessionStore((s) => s.viewport);
  const spaceHeld = useToolSession((s) => s.spaceHeld);
  const panning = useToolSession((s) => s.panning);
  const panStart = useRef<{ px: number; py: number; cx: number; cy: number } | null>(null);
  usePinchZoom(boxRef);

  useEffect(() => {
    const box = boxRef.current;
    if (!box) return;
    const refresh = invalidateViewRects;
    const ro = new ResizeObserver(() => {
      refresh();
      useSessionStore.getState().setViewport(box.clientWidth, box.clientHeight);
    });
    ro.observe(box);
    refresh();
    useSessionStore.getState().setViewport(box.clientWidth, box.clientHeight);
    window.addEventListener('resize', refresh);
    window.addEventListener('scroll', refresh, { capture: true, passive: true });
    box.addEventListener('pointerenter', refresh);
    // Before Konva's own listener on the content below: a press measures afresh (one read per gesture).
    box.addEventListener('pointerdown', refresh, { capture: true });
    return () => {
      box.removeEventListener('pointerdown', refresh, { capture: true });
      ro.disconnect();
      window.removeEventListener('resize', refresh);
      window.removeEventListener('scroll', refresh, { capture: true });
      box.removeEventListener('pointerenter', refresh);
    };
  }, []);

  useEffect(() => {
    const stage = stageRef.current;
    if (!stage) return;
    // Konva reads the content's client rect on every pointer event; the cached one is the same rect.
    const withRect = stage as unknown as { _getContentPosition: () => { top: number; left: number; scaleX: number; scaleY: number } };
    const content = stage.content;
    withRect._getContentPosition = () => {
      const r = cachedClientRect(content);
      return { top: r.top, left: r.left, scaleX: 1, scaleY: 1 };
    };
    const place = (c: { scale: number; x: number; y: number }) => {
      stage.setAttrs({ x: c.x, y: c.y, scaleX: c.scale, scaleY: c.scale });
      stage.batchDraw();
    };
    place(useSessionStore.getState().camera);
    return useSessionStore.subscribe((s, prev) => {
      if (s.camera !== prev.camera) place(s.camera);
    });
  }, []);

  useEffect(() => {
    // Space is pressed and released through the page's keys (app/useKeys); a lost window lets go of both.
    const blur = () => {
      useToolSession.getState().setSpaceHeld(false);
      useToolSession.getState().setPanning(false);
      panStart.current = null;
    };
    window.addEventListener('blur', blur);
    return () => window.removeEventListener('blur', blur);
  }, []);

  const onWheel = useCallback((e: Konva.KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const stage = e.target.getStage();
    const p = stage?.getPointerPosition();
    if (!p) return;
    const { camera: cam, setCamera } = useSessionStore.getState();
    setCamera(zoomAbout(cam, p.x, p.y, Math.pow(e.evt.ctrlKey ? PINCH_ZOOM_STEP : WHEEL_ZOOM_STEP, -e.evt.deltaY)));
  }, []);

  const onPointerDown = useCallback(
    (e: Konva.KonvaEventObject<PointerEvent>) => {
      // Pressed, the view has the keyboard: Enter and Space now go to the tools, not to the last button pressed.
      boxRef.current?.focus({ preventScroll: true });
      if (!(spaceHeld || e.evt.button === 1)) {
        toolPointerDown(e.evt);
        return;
      }
      e.evt.preventDefault();
      e.cancelBubble = true;
      const cam = useSessionStore.getState().camera;
      panStart.current = { px: e.evt.clientX, py: e.evt.clientY, cx: cam.x, cy: cam.y };
      useToolSession.getState().setPanning(true);
    },
    [spaceHeld],
  );

  const onPointerMove = useCallback((e: Konva.KonvaEventObject<PointerEvent>) => {
    const start = panStart.current;
    if (!start) return;
    const { camera: cam, setCamera } = useSessionStore.getState();
    setCamera({ ...cam, x: start.cx + e.evt.clientX - start.px, y: start.cy + e.evt.clientY - start.py });
  }, []);

  const endPan = useCallback(() => {
    panStart.current = null;
    useToolSession.getState().setPanning(false);
  }, []);

  const cursor = panning ? 'grabbing' : spaceHeld ? 'grab' : 'crosshair';
  return (
    <div ref={boxRef} className="section-view" data-testid="section-view" tabIndex={0} role="application" aria-label="Section view" style={{ cursor }} onContextMenu={(e) => e.preventDefault()} onAuxClick={(e) => e.preventDefault()}>
      <Stage
        ref={stageRef}
        width={viewport.width}
        height={viewport.height}
        onWheel={onWheel}
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={endPan}
        onPointerLeave={endPan}
      >
        <ScanLayer viewRef={boxRef} />
        <ShapesLayer />
        <OverlayLayer />
      </Stage>
      <CursorReadout />
    </div>
  );
}
