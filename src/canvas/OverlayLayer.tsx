// Handles, previews and calibration marks drawn above the shapes (section workspace). Handles are one
// custom shape each (thousands of vertices stay cheap), for the vertices in view only (handlesInView); the tool preview is drawn from the ephemeral
// preview outside React and redrawn with batchDraw when it changes.
import { memo, useEffect, useRef } from 'react';
import { Label, Layer, Shape, Tag, Text } from 'react-konva';
import type Konva from 'konva';
import { calibrationPoints } from '../core/model/commands/calibrationPointRef';
import { sectionFrame } from '../core/model/commands/sectionFrame';
import { activeScenario } from '../core/model/docToSection';
import type { ImagePx } from '../core/model/projectDoc';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { handlesInView } from './handlesInView';
import { getToolPreview, subscribeToolPreview } from './toolDispatch';
import { pinLinePx } from './pinLinePx';

type Ctx = Konva.Context;

function squares(ctx: Ctx, points: readonly ImagePx[], half: number): void {
  ctx.beginPath();
  for (const [u, v] of points) ctx.rect(u - half, v - half, 2 * half, 2 * half);
}

/** Most vertex handles drawn at once; past it the user is asked to zoom in (handlesInView). */
const HANDLE_CAP = 3000;

const VertexHandles = memo(function VertexHandles({ scale }: { scale: number }) {
  const tool = useSessionStore((s) => s.activeTool);
  const selectedId = useSessionStore((s) => s.selectedHorizonId);
  const camera = useSessionStore((s) => s.camera);
  const viewport = useSessionStore((s) => s.viewport);
  const inset = useSessionStore((s) => s.viewInsetBottom);
  const h = useDocStore((s) => s.doc.horizons.find((k) => k.id === selectedId));
  if (!h || !h.visible || (tool !== 'edit' && tool !== 'projected')) return null;
  const half = 3.5 / scale;
  const seen = handlesInView(h.pointsPx, { ...camera, ...viewport }, HANDLE_CAP);
  if (!seen.points) {
    // At the view's bottom left above the results strip (messages float at its top), in image px, drawn at screen size.
    return (
      <Label x={(12 - camera.x) / scale} y={(viewport.height - inset - 40 - camera.y) / scale} scaleX={1 / scale} scaleY={1 / scale} listening={false}>
        <Tag fill="#ffffff" opacity={0.92} stroke="#90a4ae" strokeWidth={1} cornerRadius={3} />
        <Text text={`${seen.count.toLocaleString('en')} vertices of “${h.name}” in view: zoom in to see and drag single vertices`}
          fontSize={13} fill="#1d2a33" padding={6} />
      </Label>
    );
  }
  const points = seen.points;
  return (
    <Shape listening={false} perfectDrawEnabled={false} fill="#ffffff" stroke={h.colour} strokeWidth={1.5} strokeScaleEnabled={false}
      sceneFunc={(ctx, shape) => {
        squares(ctx, points, half);
        ctx.fillStrokeShape(shape);
      }} />
  );
});

const RegionalHandles = memo(function RegionalHandles({ scale }: { scale: number }) {
  const tool = useSessionStore((s) => s.activeTool);
  const selectedId = useSessionStore((s) => s.selectedHorizonId);
  const regionals = useDocStore((s) => activeScenario(s.doc).regionals);
  const horizons = useDocStore((s) => s.doc.horizons);
  if (tool !== 'regional') return null;
  return (
    <>
      {horizons.filter((h) => h.visible && regionals[h.id]).map((h) => {
        const half = (h.id === selectedId ? 5 : 3.5) / scale;
        return (
          <Shape key={h.id} listening={false} perfectDrawEnabled={false} fill={h.colour} stroke="#ffffff" strokeWidth={1.5} strokeScaleEnabled={false}
            sceneFunc={(ctx, shape) => {
              ctx.beginPath();
              for (const [u, v] of regionals[h.id]) {
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
        raw.strokeStyle = preview.colour ?? '#111111';
        raw.setLineDash([6 / scale, 4 / scale]);
        if (preview.line && preview.line.length > 1) {
          raw.beginPath();
          preview.line.forEach(([u, v], i) => (i === 0 ? raw.moveTo(u, v) : raw.lineTo(u, v)));
          raw.stroke();
        }
        if (preview.pinXs) {
          const doc = useDocStore.getState().doc;
          const frame = sectionFrame(doc);
          raw.strokeStyle = '#263238';
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
          raw.strokeStyle = preview.colour ?? '#111111';
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
    <Layer listening={false}>
      <VertexHandles scale={scale} />
      <RegionalHandles scale={scale} />
      <CalibrationMarks scale={scale} />
      <ToolPreviewShape />
    </Layer>
  );
}
