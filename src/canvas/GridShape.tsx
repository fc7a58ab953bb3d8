// An optional grid in section units above the scan, with labels along the view's top and left edges.
// Drawn in screen pixels (lines stay one pixel wide at every zoom); it reads the camera when the layer
// draws, so panning redraws it without re-rendering React. It is a shape of the scan's layer (ScanLayer), not a
// canvas of its own: the two change together (with the camera), and one full-view canvas fewer is sent to the
// screen in every frame.
import { memo } from 'react';
import type Konva from 'konva';
import { Shape } from 'react-konva';
import { useDocStore } from '../state/docStore';
import { useFittedCalibration } from '../state/useFittedCalibration';
import { useSessionStore } from '../state/sessionStore';
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { formatFixed } from '../format/formatQuantity';
import { gridLines, type GridLine } from './gridTicks';

const LINE = 'rgba(31, 111, 139, 0.45)';
const LABEL = '#17404f';
const LABEL_BACK = 'rgba(255, 255, 255, 0.8)';

/** Where a grid line crosses the horizontal screen line y (or vertical line x), or null if it runs along it. */
function crossing(l: GridLine, along: 'x' | 'y', at: number): number | null {
  const [a, b] = along === 'y' ? [1, 0] : [0, 1];
  const d = l.to[a] - l.from[a];
  if (Math.abs(d) < 1e-9) return null;
  const t = (at - l.from[a]) / d;
  return l.from[b] + t * (l.to[b] - l.from[b]);
}

function drawGrid(ctx: Konva.Context, shape: Konva.Shape, fit: FittedCalibration | null, unit: string): void {
  const { camera, viewport } = useSessionStore.getState();
  const ratio = shape.getLayer()?.getCanvas().getPixelRatio() ?? 1;
  ctx.setTransform(ratio, 0, 0, ratio, 0, 0);
  const grid = gridLines(fit, camera, viewport.width, viewport.height);
  ctx.beginPath();
  for (const l of [...grid.x, ...grid.z]) {
    ctx.moveTo(Math.round(l.from[0]) + 0.5, Math.round(l.from[1]) + 0.5);
    ctx.lineTo(Math.round(l.to[0]) + 0.5, Math.round(l.to[1]) + 0.5);
  }
  ctx.setAttr('strokeStyle', LINE);
  ctx.setAttr('lineWidth', 1);
  ctx.stroke();
  ctx.setAttr('font', '11px system-ui, sans-serif');
  ctx.setAttr('textBaseline', 'middle');
  const label = (text: string, x: number, y: number) => {
    const w = ctx.measureText(text).width;
    ctx.setAttr('fillStyle', LABEL_BACK);
    ctx.fillRect(x - 2, y - 7, w + 4, 14);
    ctx.setAttr('fillStyle', LABEL);
    ctx.fillText(text, x, y);
  };
  const suffix = fit ? ` ${unit}` : ' px';
  for (const l of grid.x) {
    const sx = crossing(l, 'y', 10);
    if (sx !== null && sx > 40 && sx < viewport.width - 220) label(`${fit ? 'x' : 'u'} ${formatFixed(l.value, grid.decimalsX)}${suffix}`, sx + 3, 10);
  }
  for (const l of grid.z) {
    const sy = crossing(l, 'x', 4);
    if (sy !== null && sy > 24 && sy < viewport.height - 12) label(`${fit ? 'z' : 'v'} ${formatFixed(l.value, grid.decimalsZ)}${suffix}`, 4, sy - 8);
  }
}

export const GridShape = memo(function GridShape() {
  const show = useDocStore((s) => s.doc.settings.showGrid && s.doc.scan !== null);
  const unit = useDocStore((s) => s.doc.units);
  const fit = useFittedCalibration();
  if (!show) return null;
  return <Shape listening={false} perfectDrawEnabled={false} sceneFunc={(ctx, shape) => drawGrid(ctx, shape, fit, unit)} />;
});
