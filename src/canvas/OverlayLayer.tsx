// Handles, previews and calibration marks drawn above the shapes (section workspace). Handles are one
// custom shape each (thousands of vertices stay cheap), for the vertices in view only (handlesInView); the tool preview is drawn from the ephemeral
// preview outside React and redrawn with batchDraw when it changes. The proposed detachment (DetachmentMarks) is
// drawn first, under them, in the same layer.
import { memo, useEffect, useLayoutEffect, useRef, useState } from 'react';
import { Label, Layer, Shape, Tag, Text } from 'react-konva';
import type Konva from 'konva';
import { calibrationPoints } from '../core/model/commands/calibrationPointRef';
import { sectionFrame } from '../core/model/commands/sectionFrame';
import { activeScenario } from '../core/model/docToSection';
import { countText } from '../core/model/limits';
import type { ImagePx } from '../core/model/projectDoc';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { handlesInView, type HandlesInView } from './handlesInView';
import { getToolPreview, subscribeToolPreview } from './toolDispatch';
import { pinLinePx } from './pinLinePx';
import { MARK_COLOURS } from '../core/model/horizonPalette';
import { useShallow } from 'zustand/react/shallow';
import { DetachmentMarks } from './DetachmentMarks';

type Ctx = Konva.Context;

function squares(ctx: Ctx, points: readonly ImagePx[], half: number): void {
  ctx.beginPath();
  for (const [u, v] of points) ctx.rect(u - half, v - half, 2 * half, 2 * half);
}

/** Most vertex handles drawn at once; past it the user is asked to zoom in (handlesInView). */
const HANDLE_CAP = 3000;

// The handles in view change with every pan frame: they are found when the camera changes (a store
// subscription) and drawn from a ref, and React re-renders only when the note replaces the handles or
// the handles come back; the note's place and count are set on its Konva nodes directly.
const VertexHandles = memo(function VertexHandles() {
  const tool = useSessionStore((s) => s.activeTool);
  const selectedId = useSessionStore((s) => s.selectedHorizonId);
  const h = useDocStore((s) => s.doc.horizons.find((k) => k.id === selectedId));
  const shown = h && h.visible && (tool === 'edit' || tool === 'projected') ? h : null;
  const seen = useRef<HandlesInView | null>(null);
  const [tooMany, setTooMany] = useState(false);
  const shapeRef = useRef<Konva.Shape>(null);
  const labelRef = useRef<Konva.Label>(null);
  const textRef = useRef<Konva.Text>(null);
  const noteText = (count: number, name: string) => `${countText(count)} vertices of “${name}” in view: zoom in to see and drag single vertices`;

  useLayoutEffect(() => {
    if (!shown) {
      seen.current = null;
      return;
    }
    const update = () => {
      const { camera, viewport, viewInsetBottom } = useSessionStore.getState();
      const found = handlesInView(shown.pointsPx, { ...camera, ...viewport }, HANDLE_CAP);
      seen.current = found;
      setTooMany(found.points === null);
      // At the view's bottom left above the results strip (messages float at its top), in image px, drawn at screen size.
      const label = labelRef.current;
      if (label) {
        label.setAttrs({ x: (12 - camera.x) / camera.scale, y: (viewport.height - viewInsetBottom - 40 - camera.y) / camera.scale, scaleX: 1 / camera.scale, scaleY: 1 / camera.scale });
        textRef.current?.text(noteText(found.count, shown.name));
      }
      (label ?? shapeRef.current)?.getLayer()?.batchDraw();
    };
    update();
    return useSessionStore.subscribe((s, prev) => {
      if (s.camera !== prev.camera || s.viewport !== prev.viewport || s.viewInsetBottom !== prev.viewInsetBottom) update();
    });
  }, [shown, tooMany]);

  if (!shown) return null;
  if (tooMany) {
    return (
      <Label ref={labelRef} listening={false}>
        <Tag fill="#ffffff" opacity={0.92} stroke="#90a4ae" strokeWidth={1} cornerRadius={3} />
        <Text ref={textRef} text={noteText(seen.current?.count ?? 0, shown.name)} fontSize={13} fill="#1d2a33" padding={6} />
      </Label>
    );
  }
  return (
    <Shape ref={shapeRef} listening={false} perfectDrawEnabled={false} fill="#ffffff" stroke={shown.colour} strokeWidth={1.5} strokeScaleEnabled={false}
      sceneFunc={(ctx, shape) => {
        const points = seen.current?.points;
        if (!points) return;
        squares(ctx, points, 3.5 / useSessionStore.getState().camera.scale);
        ctx.fillStrokeShape(shape);
      }} />
  );
});

// Fault vertices are shown while a tool can move them or snap onto them (Edit, Fault, Draw horizon), for the faults in view.
const FAULT_HANDLE_TOOLS = new Set(['edit', 'fault', 'draw']);

const FaultHandles = memo(function FaultHandles() {
  const tool = useSessionStore((s) => s.activeTool);
  const faults = useDocStore((s) => s.doc.faults);
  if (!FAULT_HANDLE_TOOLS.has(tool)) return null;
  // Drawn from the camera at draw time (the layer redraws with the camera), not through React on every pan frame.
  return (
    <>
      {faults.filter((f) => f.visible).map((f) => (
        <Shape key={f.id} listening={false} perfectDrawEnabled={false} fill="#ffffff" stroke={f.colour} strokeWidth={1.5} strokeScaleEnabled={false}
          sceneFunc={(ctx, shape) => {
            const { camera, viewport } = useSessionStore.getState();
            const points = handlesInView(f.pointsPx, { ...camera, ...viewport }, HANDLE_CAP).points;
            if (!points) return;
            const half = (tool === 'draw' ? 2.5 : 3.5) / camera.scale;
            ctx.beginPath();
            for (const [u, v] of points) {
              ctx.moveTo(u, v - half);
              ctx.lineTo(u + half, v);
              ctx.lineTo(u, v + half);
              ctx.lineTo(u - half, v);
              ctx.closePath();
            }
            ctx.fillStrokeShape(shape);
          }} />
      ))}
    </>
  );
});

// A regional's handles are drawn from the store's document at draw time: a drag moves them without a React render,
// its move asking the layer for one batched draw.
const RegionalHandles = memo(function RegionalHandles({ scale }: { scale: number }) {
  const tool = useSessionStore((s) => s.activeTool);
  const selectedId = useSessionStore((s) => s.selectedHorizonId);
  const withRegional = useDocStore(useShallow((s) => {
    const regionals = activeScenario(s.doc).regionals;
    return s.doc.horizons.filter((h) => h.visible && regionals[h.id]).map((h) => h.id);
  }));
  const horizons = useDocStore((s) => s.doc.horizons);
  const first = useRef<Konva.Shape>(null);
  const on = tool === 'regional' && withRegional.length > 0;
  useEffect(() => {
    if (!on) return;
    return useDocStore.subscribe((s, prev) => {
      if (activeScenario(s.doc).regionals !== activeScenario(prev.doc).regionals) first.current?.getLayer()?.batchDraw();
    });
  }, [on]);
  if (!on) return null;
  return (
    <>
      {withRegional.map((id, i) => {
        const h = horizons.find((k) => k.id === id)!;
        const half = (h.id === selectedId ? 5 : 3.5) / scale;
        return (
          <Shape key={h.id} ref={i === 0 ? first : undefined} listening={false} perfectDrawEnabled={false} fill={h.colour} stroke="#ffffff" strokeWidth={1.5} strokeScaleEnabled={false}
            sceneFunc={(ctx, shape) => {
              const regional = activeScenario(useDocStore.getState().doc).regionals[h.id];
              if (!regional) return;
              ctx.beginPath();
              for (const [u, v] of regional) {
                ctx.moveTo(u + half, v);
                ctx.arc(u, v, half, 0, 2 * Math.PI, false);
              }
              ctx.fillStrokeShape(shape);
            }} />
        );
      })}
    </>
  );
});

const CalibrationMarks = memo(function CalibrationMarks({ scale }: { scale: number }) {
  const tool = useSessionStore((s) => s.activeTool);
  const cal = useDocStore((s) => s.doc.calibration);
  if (tool !== 'calibrate' || !cal) return null;
  const arm = 9 / scale;
  const points = calibrationPoints(cal);
  return (
    <>
      <Shape listening={false} perfectDrawEnabled={false} stroke="#b3001b" strokeWidth={2} strokeScaleEnabled={false}
        sceneFunc={(ctx, shape) => {
          ctx.beginPath();
          for (const p of points) {
            ctx.moveTo(p.u - arm, p.v);
            ctx.lineTo(p.u + arm, p.v);
            ctx.moveTo(p.u, p.v - arm);
            ctx.lineTo(p.u, p.v + arm);
            ctx.moveTo(p.u + arm / 2, p.v);
            ctx.arc(p.u, p.v, arm / 2, 0, 2 * Math.PI, false);
          }
          ctx.strokeShape(shape);
        }} />
      {points.map((p) => (
        <Text key={`${p.ref.list}-${p.ref.index}`} x={p.u + arm} y={p.v - arm * 1.6} scaleX={1 / scale} scaleY={1 / scale} listening={false}
          text={`${p.ref.list === 'points' ? '' : p.ref.list === 'xPoints' ? 'x' : 'z'}${p.ref.index + 1}`} fontSize={13} fontStyle="bold" fill="#b3001b" stroke="#ffffff" strokeWidth={3} fillAfterStrokeEnabled />
      ))}
    </>
  );
});

/** The user-timing mark set each time a tool's preview line is drawn (its detail: the line's point count, last point and whether part of it is a stand-in still tracing), so the UI benchmark can time the preview from the page itself; only the latest is kept. */
export const PREVIEW_DRAWN_MARK = 'foldroot-preview-drawn';

function ToolPreviewShape() {
  const ref = useRef<Konva.Shape>(null);
  useEffect(() => subscribeToolPreview(() => ref.current?.getLayer()?.batchDraw()), []);
  return (
    <Shape ref={ref} listening={false} perfectDrawEnabled={false}
      sceneFunc={(ctx) => {
        const preview = getToolPreview();
        if (!preview) return;
        const scale = useSessionStore.getState().camera.scale;
        const raw = ctx._context;
        raw.save();
        raw.lineWidth = 2 / scale;
        raw.strokeStyle = preview.colour ?? MARK_COLOURS.preview;
        raw.setLineDash([6 / scale, 4 / scale]);
        for (const line of preview.lines ?? (preview.line ? [preview.line] : [])) {
          if (line.length < 2) continue;
          raw.beginPath();
          line.forEach(([u, v], i) => (i === 0 ? raw.moveTo(u, v) : raw.lineTo(u, v)));
          raw.stroke();
        }
        if (preview.line && preview.line.length > 1) {
          performance.clearMarks(PREVIEW_DRAWN_MARK);
          performance.mark(PREVIEW_DRAWN_MARK, { detail: { points: preview.line.length, last: preview.line[preview.line.length - 1], tracing: preview.tracing ?? false } });
        }
        if (preview.pinXs) {
          const doc = useDocStore.getState().doc;
          const frame = sectionFrame(doc);
          raw.strokeStyle = MARK_COLOURS.pin;
          for (const x of preview.pinXs) {
            const l = pinLinePx(frame, x, doc.scan);
            raw.beginPath();
            raw.moveTo(l[0], l[1]);
            raw.lineTo(l[2], l[3]);
            raw.stroke();
          }
        }
        raw.setLineDash([]);
        if (preview.marks) {
          const half = 4 / scale;
          raw.fillStyle = '#ffffff';
          raw.strokeStyle = preview.colour ?? MARK_COLOURS.preview;
          raw.lineWidth = 2 / scale;
          for (const [u, v] of preview.marks) {
            raw.fillRect(u - half, v - half, 2 * half, 2 * half);
            raw.strokeRect(u - half, v - half, 2 * half, 2 * half);
          }
        }
        raw.restore();
      }} />
  );
}

export function OverlayLayer() {
  const scale = useSessionStore((s) => s.camera.scale);
  return (
    <Layer listening={false} name="overlay">
      <DetachmentMarks />
      <FaultHandles />
      <VertexHandles />
      <RegionalHandles scale={scale} />
      <CalibrationMarks scale={scale} />
      <ToolPreviewShape />
    </Layer>
  );
}
