// Digitised horizons, regionals, pins and excess-area fills (section workspace). Nothing here listens:
// the tools pick shapes from the document themselves. Each shape selects only its own data. Long lines
// are drawn decimated to screen-pixel resolution (decimatePolyline) and again on every zoom; the
// document, the tools and the analysis keep every vertex.
import { memo, useMemo } from 'react';
import { Circle, Group, Layer, Line } from 'react-konva';
import { useShallow } from 'zustand/react/shallow';
import { pinXs } from '../core/model/commands/pinXs';
import { sectionFrame } from '../core/model/commands/sectionFrame';
import type { ClippedPolyline } from '../core/geometry/clipPolylineToPins';
import { keptClippedLine } from '../state/selectors';
import { activeScenario } from '../core/model/docToSection';
import type { DocHorizon, ImagePx } from '../core/model/projectDoc';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { DECIMATE_ABOVE_VERTICES, decimateAfterPrefix, decimatePolyline, decimatePrefix, type DecimatedPrefix } from './decimatePolyline';
import { clippedHorizonPx, excessFillSides, type ClippedHorizonPx } from './excessFillGeometry';
import { EXCESS_FILL, fillRgba, MARK_COLOURS } from '../core/model/horizonPalette';
import { joinedLinePx, type JoinedLinePx } from './joinedLinePx';
import { pieceEndsOffFault } from '../tools/faultHits';
import { FAULT_DASH, FAULT_WIDTH } from '../tools/faultStyle';
import { pinLinePx } from './pinLinePx';
import { useShapesInSteps } from './useShapesInSteps';

export const FILL_ABOVE = fillRgba(EXCESS_FILL.above);
export const FILL_BELOW = fillRgba(EXCESS_FILL.below);
const PROJECTED_DASH = [7, 5];
const REGIONAL_DASH = [14, 4, 3, 4];

/** Splits a horizon into runs of solid and projected segments, as flat point arrays; no run crosses from one piece to the next. */
function runsOf(h: DocHorizon): { points: number[]; projected: boolean }[] {
  const n = h.pointsPx.length;
  // Most lines are one solid run: flattened in a plain loop (a big document's lines are 100,000 vertices each).
  if (n >= 2 && h.projected.length === 0 && h.joins.length === 0) return [{ projected: false, points: flatOf(h.pointsPx) }];
  const flags = new Array<boolean>(Math.max(0, n - 1)).fill(false);
  for (const [a, b] of h.projected) for (let s = Math.max(0, a); s < Math.min(b, n - 1); s++) flags[s] = true;
  const gaps = new Set(h.joins.map((j) => j.at - 1));
  const runs: { points: number[]; projected: boolean }[] = [];
  let broken = true;
  for (let s = 0; s < n - 1; s++) {
    if (gaps.has(s)) {
      broken = true;
      continue;
    }
    const last = runs[runs.length - 1];
    const carryOn = !broken && last && last.projected === flags[s];
    broken = false;
    if (carryOn) last.points.push(h.pointsPx[s + 1][0], h.pointsPx[s + 1][1]);
    else runs.push({ projected: flags[s], points: [h.pointsPx[s][0], h.pointsPx[s][1], h.pointsPx[s + 1][0], h.pointsPx[s + 1][1]] });
  }
  if (n === 1) runs.push({ projected: false, points: [h.pointsPx[0][0], h.pointsPx[0][1]] });
  return runs;
}

/** The points as one flat [u0, v0, u1, v1, …] array. */
function flatOf(points: readonly ImagePx[]): number[] {
  const flat = new Array<number>(2 * points.length);
  for (let i = 0; i < points.length; i++) {
    flat[2 * i] = points[i][0];
    flat[2 * i + 1] = points[i][1];
  }
  return flat;
}

/** How a long line is drawn: the zoom (screen px per image px) and the window of pixel columns (u · scale) kept in detail. */
interface Decimation { scale: number; columns: [number, number] }

/**
 * Returns the decimation for a line of `vertices` (null for a line short enough to draw whole, which then does not
 * redraw on zoom or pan). The window is the view with a view's width each side, moved in steps of a view's width,
 * so a pan redraws a long line once per view width rather than every frame.
 */
function useDecimation(vertices: number): Decimation | null {
  const long = vertices > DECIMATE_ABOVE_VERTICES;
  const scale = useSessionStore((s) => (long ? s.camera.scale : 0));
  const width = useSessionStore((s) => (long ? Math.max(1, Math.ceil(s.viewport.width)) : 1));
  // Screen x = u · scale + camera.x: the view's left edge is pixel column −camera.x.
  const step = useSessionStore((s) => (long ? Math.floor(-s.camera.x / Math.max(1, Math.ceil(s.viewport.width))) : 0));
  return useMemo(() => (long ? { scale, columns: [(step - 1) * width, (step + 2) * width] } : null), [long, scale, width, step]);
}

/** Returns the flat line as drawn: decimated, or itself without a decimation. */
const drawnPoints = (flat: number[], d: Decimation | null): number[] => (d ? decimatePolyline(flat, d.scale, d.columns) : flat);

/** The stretches of the joined line that run along a fault (between cutoffs), as flat point arrays. */
function faultStretches(joined: JoinedLinePx): number[][] {
  const out: number[][] = [];
  let run: number[] | null = null;
  joined.alongFault.forEach((along, s) => {
    if (!along) {
      run = null;
      return;
    }
    const [a, b] = [joined.points[s], joined.points[s + 1]];
    if (!run) out.push((run = [a[0], a[1]]));
    run.push(b[0], b[1]);
  });
  return out;
}

/** A piece end that has left its fault: a red ring, with the problem named in the interpretation pane. */
const OFF_FAULT = '#c62828';
/** How near a piece end must be to its fault, as a share of the pin width (the analysis's rule). */
const ON_FAULT_SHARE = 1e-6;

function OffFaultMarks({ points }: { points: ImagePx[] }) {
  const scale = useSessionStore((s) => s.camera.scale);
  return (
    <>
      {points.map(([u, v], i) => (
        <Circle key={i} x={u} y={v} radius={8 / scale} stroke={OFF_FAULT} strokeWidth={2.5} strokeScaleEnabled={false} perfectDrawEnabled={false} listening={false} name="off-fault" />
      ))}
    </>
  );
}

/** The joined line of a horizon (its pieces along their faults), memoised on the horizon and the faults. */
function useJoinedLine(h: DocHorizon | undefined): JoinedLinePx | null {
  const faults = useDocStore((s) => (h && h.joins.length ? s.doc.faults : null));
  return useMemo(() => (h ? joinedLinePx(h.pointsPx, h.joins, faults ?? []) : null), [h, faults]);
}

/** The piece ends of a horizon that are not on their fault (image px). */
function useEndsOffFault(h: DocHorizon | undefined): ImagePx[] {
  const faults = useDocStore((s) => (h && h.joins.length ? s.doc.faults : null));
  const pins = useDocStore((s) => activeScenario(s.doc).pinsPx);
  return useMemo(() => {
    if (!h || !faults) return [];
    // As near as the analysis asks a piece end to be (a millionth of the pin width), in image px.
    const width = pins ? Math.abs(pins[1][0] - pins[0][0]) : 1000;
    return pieceEndsOffFault(h.pointsPx, h.joins, faults, ON_FAULT_SHARE * width).map((e) => h.pointsPx[e.index]);
  }, [h, faults, pins]);
}

const HorizonShape = memo(function HorizonShape({ id }: { id: string }) {
  const h = useDocStore((s) => s.doc.horizons.find((k) => k.id === id));
  const selected = useSessionStore((s) => s.selectedHorizonId === id);
  const decimation = useDecimation(h?.pointsPx.length ?? 0);
  const runs = useMemo(() => (h ? runsOf(h) : []), [h]);
  const drawn = useMemo(() => runs.map((r) => ({ ...r, points: drawnPoints(r.points, decimation) })), [runs, decimation]);
  const joined = useJoinedLine(h?.joins.length ? h : undefined);
  const stretches = useMemo(() => (joined ? faultStretches(joined) : []), [joined]);
  const off = useEndsOffFault(h);
  if (!h || !h.visible) return null;
  return (
    <Group>
      {stretches.map((points, i) => (
        <Line key={`fault-${i}`} points={points} stroke={h.colour} strokeWidth={1.2} strokeScaleEnabled={false} lineJoin="round" lineCap="round" perfectDrawEnabled={false} listening={false} />
      ))}
      {off.length > 0 && <OffFaultMarks points={off} />}
      {drawn.map((r, i) => (
        <Line key={`halo-${i}`} points={r.points} stroke={HALO} opacity={HALO_OPACITY} strokeWidth={(selected ? 3.5 : 2.2) + HALO_WIDTH} strokeScaleEnabled={false} lineJoin="round" lineCap="round"
          dash={r.projected ? PROJECTED_DASH : undefined} perfectDrawEnabled={false} listening={false} />
      ))}
      {drawn.map((r, i) => (
        <Line key={i} points={r.points} stroke={h.colour} strokeWidth={selected ? 3.5 : 2.2} strokeScaleEnabled={false} lineJoin="round" lineCap="round"
          dash={r.projected ? PROJECTED_DASH : undefined} perfectDrawEnabled={false} listening={false} />
      ))}
    </Group>
  );
});

/** The outline drawn under regionals, horizons and pins so they stand out on the fills and the scan. */
const HALO = '#ffffff';
const HALO_OPACITY = 0.85;
const HALO_WIDTH = 3;

const RegionalShape = memo(function RegionalShape({ id }: { id: string }) {
  const regional = useDocStore((s) => activeScenario(s.doc).regionals[id]);
  const h = useDocStore((s) => s.doc.horizons.find((k) => k.id === id));
  const selected = useSessionStore((s) => s.selectedHorizonId === id);
  const decimation = useDecimation(regional?.length ?? 0);
  const points = useMemo(() => drawnPoints(regional ? regional.flat() : [], decimation), [regional, decimation]);
  if (!regional || !h || !h.visible) return null;
  const width = selected ? 2.5 : 1.6;
  // A pale outline under the dashes keeps a regional visible over a fill of its own colour.
  return (
    <Group listening={false}>
      <Line points={points} stroke={HALO} opacity={HALO_OPACITY} strokeWidth={width + HALO_WIDTH} dash={REGIONAL_DASH} strokeScaleEnabled={false} perfectDrawEnabled={false} listening={false} />
      <Line points={points} stroke={h.colour} opacity={0.9} strokeWidth={width} dash={REGIONAL_DASH} strokeScaleEnabled={false} perfectDrawEnabled={false} listening={false} />
    </Group>
  );
});

function clipTo(poly: number[]) {
  return (ctx: { beginPath: () => void; moveTo: (x: number, y: number) => void; lineTo: (x: number, y: number) => void; closePath: () => void }) => {
    ctx.beginPath();
    ctx.moveTo(poly[0], poly[1]);
    for (let i = 2; i < poly.length; i += 2) ctx.lineTo(poly[i], poly[i + 1]);
    ctx.closePath();
  };
}

// The horizon's side of a fill and its decimated prefix outlive the component that drew them: a fill moves to the
// moving canvas when its regional starts to move and back at the release (a remount), and finds them here.
const headCache = new WeakMap<readonly ImagePx[], { pins: [number, number]; frame: FittedCalibration; head: ClippedHorizonPx | null }>();
const prefixCache = new WeakMap<ClippedHorizonPx, { decimation: Decimation; prefix: DecimatedPrefix }>();

/**
 * Returns the horizon's line clipped to the pins for its fill, from the cache when the line, pins and calibration are
 * the same; else from the analysis's own clipped line when it has one for an unbroken line (the same clip of the same
 * section coordinates), else clipped here.
 */
function cachedHead(line: readonly ImagePx[], pins: [number, number], frame: FittedCalibration, clipped: () => ClippedPolyline | null): ClippedHorizonPx | null {
  const kept = headCache.get(line);
  if (kept && kept.frame === frame && kept.pins[0] === pins[0] && kept.pins[1] === pins[1]) return kept.head;
  const head = clippedHorizonPx(line as ImagePx[], pins, frame, clipped());
  headCache.set(line, { pins, frame, head });
  return head;
}

/** Returns the head's decimated prefix, from the cache when the decimation is the same. */
function cachedPrefix(head: ClippedHorizonPx, d: Decimation): DecimatedPrefix {
  const kept = prefixCache.get(head);
  if (kept && kept.decimation.scale === d.scale && kept.decimation.columns[0] === d.columns[0] && kept.decimation.columns[1] === d.columns[1]) return kept.prefix;
  const prefix = decimatePrefix(head.loopHead, d.scale, d.columns);
  prefixCache.set(head, { decimation: d, prefix });
  return prefix;
}

const FillShape = memo(function FillShape({ id }: { id: string }) {
  const regional = useDocStore((s) => activeScenario(s.doc).regionals[id]);
  const h = useDocStore((s) => s.doc.horizons.find((k) => k.id === id));
  const frame = useDocStore((s) => sectionFrame(s.doc));
  const pinsPx = useDocStore((s) => activeScenario(s.doc).pinsPx);
  // The horizon's side of the loop is kept, and decimated once, while only its regional moves (a regional drag):
  // each move rebuilds and decimates only the regional's side (decimateAfterPrefix: the same points as the whole).
  const pins = useMemo(() => (pinsPx ? pinXs(pinsPx, frame) : null), [pinsPx, frame]);
  // A horizon in pieces is filled along its joined line (the line the analysis measures).
  const joined = useJoinedLine(h?.joins.length ? h : undefined);
  const head = useMemo(() => (h && pins
    ? cachedHead(joined ? joined.points : h.pointsPx, pins, frame, () => (joined ? null : keptClippedLine(useDocStore.getState().doc, h.id, pins, frame)))
    : null), [h, joined, pins, frame]);
  const geometry = useMemo(() => (head && regional && pins ? excessFillSides(regional, pins, frame, head) : null), [regional, pins, frame, head]);
  // The loop follows the horizon between the pins: as long, and decimated the same way.
  const decimation = useDecimation(head && geometry ? (head.loopHead.length + geometry.loopTail.length) / 2 : 0);
  const prefix = useMemo(() => (head && decimation ? cachedPrefix(head, decimation) : null), [head, decimation]);
  const loop = useMemo(() => {
    if (!head || !geometry) return [];
    if (prefix && decimation) return decimateAfterPrefix(prefix, geometry.loopTail, decimation.scale, decimation.columns);
    return head.loopHead.concat(geometry.loopTail);
  }, [head, geometry, prefix, decimation]);
  if (!geometry || !h?.visible) return null;
  return (
    <Group listening={false}>
      <Group clipFunc={clipTo(geometry.above)}>
        <Line points={loop} closed fill={FILL_ABOVE} perfectDrawEnabled={false} listening={false} />
      </Group>
      <Group clipFunc={clipTo(geometry.below)}>
        <Line points={loop} closed fill={FILL_BELOW} perfectDrawEnabled={false} listening={false} />
      </Group>
    </Group>
  );
});

const FaultShape = memo(function FaultShape({ id }: { id: string }) {
  const f = useDocStore((s) => s.doc.faults.find((k) => k.id === id));
  const decimation = useDecimation(f?.pointsPx.length ?? 0);
  const points = useMemo(() => drawnPoints(f ? f.pointsPx.flat() : [], decimation), [f, decimation]);
  if (!f || !f.visible) return null;
  return (
    <Group listening={false}>
      <Line points={points} stroke={HALO} opacity={HALO_OPACITY} strokeWidth={FAULT_WIDTH + HALO_WIDTH} strokeScaleEnabled={false} lineJoin="round" perfectDrawEnabled={false} listening={false} />
      <Line points={points} stroke={f.colour} strokeWidth={FAULT_WIDTH} dash={FAULT_DASH} strokeScaleEnabled={false} lineJoin="round" perfectDrawEnabled={false} listening={false} />
    </Group>
  );
});

const PinLines = memo(function PinLines() {
  const pinsPx = useDocStore((s) => activeScenario(s.doc).pinsPx);
  const frame = useDocStore((s) => sectionFrame(s.doc));
  const scan = useDocStore((s) => s.doc.scan);
  if (!pinsPx) return null;
  return (
    <>
      {pinsPx.map((p: ImagePx, i) => {
        const x = frame.a[0] + frame.a[1] * p[0] + frame.a[2] * p[1];
        const line = pinLinePx(frame, x, scan);
        return (
          <Group key={i} listening={false}>
            <Line points={line} stroke={HALO} opacity={HALO_OPACITY} strokeWidth={1.8 + HALO_WIDTH} dash={[10, 4]} strokeScaleEnabled={false} listening={false} perfectDrawEnabled={false} />
            <Line points={line} stroke={MARK_COLOURS.pin} strokeWidth={1.8} dash={[10, 4]} strokeScaleEnabled={false} listening={false} perfectDrawEnabled={false} />
          </Group>
        );
      })}
    </>
  );
});

const NO_IDS: string[] = [];

/**
 * Returns the ids of the horizons whose regional the gesture in progress moves, in document order (none outside a
 * gesture): those its press named (the docStore's gestureRegionals) and any other it has moved.
 */
function useMovingRegionalIds(): string[] {
  return useDocStore(useShallow((s) => {
    if (!s.gestureStart) return NO_IDS;
    const now = activeScenario(s.doc).regionals;
    const was = activeScenario(s.gestureStart).regionals;
    const named = s.gestureRegionals;
    if (now === was && named.length === 0) return NO_IDS;
    const moved = s.doc.horizons.filter((h) => now[h.id] !== was[h.id] || named.includes(h.id)).map((h) => h.id);
    return moved.length ? moved : NO_IDS;
  }));
}

/**
 * Three canvases, drawn in this order: the fills and regionals that stand still, those whose regional is being
 * dragged, then the faults, horizons and pins over them. A regional drag changes only the second: each move redraws
 * (and the browser rasterises) the one or few fills and regionals that move, and the others, like the long horizon
 * lines, stay as they were drawn. A fill moves to the second canvas at the drag's first move and back at the
 * release (its clipped line and decimation are kept, so neither is made again); meanwhile it lies over the still
 * regionals rather than under them. A drag whose press names the regionals it moves (the regional tool's) moves
 * their fills at the press instead: the still canvas is redrawn without them then, not in the first move's frame.
 */
export function ShapesLayer() {
  const allIds = useDocStore(useShallow((s) => s.doc.horizons.map((h) => h.id)));
  const lines = useDocStore(useShallow((s) => s.doc.horizons.map((h) => h.pointsPx)));
  // A big document's horizons are drawn a few a task as it opens (useShapesInSteps), not all in one commit.
  const ids = useShapesInSteps(allIds, lines);
  const showFills = useDocStore((s) => s.doc.settings.showFills);
  const faultIds = useDocStore(useShallow((s) => s.doc.faults.map((f) => f.id)));
  const movingIds = useMovingRegionalIds();
  const moving = useMemo(() => new Set(movingIds), [movingIds]);
  const still = useMemo(() => (moving.size ? ids.filter((id) => !moving.has(id)) : ids), [ids, moving]);
  const moved = useMemo(() => ids.filter((id) => moving.has(id)), [ids, moving]);
  return (
    <>
      <Layer listening={false} name="fills-and-regionals">
        {showFills && still.map((id) => <FillShape key={`f-${id}`} id={id} />)}
        {still.map((id) => <RegionalShape key={`r-${id}`} id={id} />)}
      </Layer>
      <Layer listening={false} name="moving-fills-and-regionals">
        {showFills && moved.map((id) => <FillShape key={`f-${id}`} id={id} />)}
        {moved.map((id) => <RegionalShape key={`r-${id}`} id={id} />)}
      </Layer>
      <Layer listening={false} name="horizons-and-faults">
        {faultIds.map((id) => <FaultShape key={`k-${id}`} id={id} />)}
        {ids.map((id) => <HorizonShape key={`h-${id}`} id={id} />)}
        <PinLines />
      </Layer>
    </>
  );
}
