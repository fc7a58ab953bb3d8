// The scan, drawn beneath everything and never listening for events. Only the tiles on screen, at the level that
// fits the zoom, are in the layer (Konva draws every node it holds, so tiles off screen are removed from view here
// rather than left to the canvas to clip). Full resolution is the decoded bitmap itself, drawn a tile-sized crop at
// a time; reduced levels come from the scan's tile pyramid (state/scanTilesPyramid) as they are made, and until the
// level a zoom wants is made the whole bitmap is drawn as one image.
// What the layer last drew is written on the section view's element as data-scan-drawn, set when the layer has
// drawn it: "tiles" (the tiles the zoom wants, at their level), "whole" (the whole bitmap standing in for a level
// not made yet) or "drawing" (the view changed and the layer has not drawn it yet); absent without a scan. A
// picture of the scan is final once it reads "tiles" (the browser tests wait for that instead of for time).
// A task after the layer first draws a newly opened scan (the frame that shows it is then done), it says so
// (noteScanShown): the scan's reduced views start then, and the benchmark reads the mark that sets.
// The optional grid (GridShape) is drawn over the scan in the same layer: both change only with the camera.
import { memo, useEffect, useRef, useSyncExternalStore, type RefObject } from 'react';
import Konva from 'konva';
import { Layer, Group, Rect } from 'react-konva';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { getScan, scanCacheVersion, subscribeScans } from '../state/scanCache';
import { TILE_PX, visibleTiles } from '../state/scanTiles';
import { getTilePyramid, noteScanShown, pyramidsVersion, subscribePyramids } from '../state/scanTilesPyramid';
import { GridShape } from './GridShape';

/** Screen pixels past the view's edge that are kept drawn, so a short pan never shows a gap. */
const MARGIN_PX = 64;
/** Above this zoom the scan's pixels are shown as crisp squares rather than smoothed. */
const CRISP_ABOVE_SCALE = 2;

export type ScanDrawn = 'tiles' | 'whole' | 'drawing';

export const ScanLayer = memo(function ScanLayer({ viewRef }: { viewRef: RefObject<HTMLElement | null> }) {
  const scan = useDocStore((s) => s.doc.scan);
  useSyncExternalStore(subscribeScans, scanCacheVersion);
  useSyncExternalStore(subscribePyramids, pyramidsVersion);
  // A scan kept but not shown (scanCache) draws nothing, not even tiles cut earlier under the same id.
  const bitmap = getScan(scan?.id)?.bitmap ?? null;
  const pyramid = bitmap ? getTilePyramid(scan?.id) : undefined;
  const layerRef = useRef<Konva.Layer>(null);
  const groupRef = useRef<Konva.Group>(null);

  useEffect(() => {
    const group = groupRef.current;
    const layer = layerRef.current;
    const view = viewRef.current;
    if (!bitmap || !group || !layer) return;
    const nodes = new Map<string, Konva.Image>();
    let drawing: ScanDrawn = 'tiles';
    const mark = (drawn: ScanDrawn) => view?.setAttribute('data-scan-drawn', drawn);
    let shown = false;
    // Fired by Konva once the layer's scene is on its canvas.
    layer.on('draw.scanDrawn', () => {
      mark(drawing);
      if (shown) return;
      shown = true;
      // The first drawing of this bitmap: the frame that puts it on screen ends with this task.
      setTimeout(() => noteScanShown(bitmap, useDocStore.getState().doc.scan?.name ?? ''), 0);
    });
    const place = (key: string, attrs: Konva.ImageConfig) => {
      if (nodes.has(key)) return;
      const node = new Konva.Image({ ...attrs, listening: false, perfectDrawEnabled: false });
      nodes.set(key, node);
      group.add(node);
    };
    const update = () => {
      const { camera, viewport } = useSessionStore.getState();
      const ratio = layer.getCanvas().getPixelRatio();
      const { level, tiles } = visibleTiles(camera, viewport.width, viewport.height, bitmap.width, bitmap.height, ratio, MARGIN_PX);
      const levelTiles = pyramid?.tiles[level];
      const wanted = new Set<string>();
      if (level > 0 && !levelTiles) {
        // That level is not made yet: the whole bitmap, reduced by the canvas.
        wanted.add('full');
        place('full', { image: bitmap, x: 0, y: 0, width: bitmap.width, height: bitmap.height });
      } else {
        const lv = pyramid?.levels[level] ?? { cols: Math.ceil(bitmap.width / TILE_PX), factor: 1 };
        for (const t of tiles) {
          wanted.add(t.key);
          const x = t.col * TILE_PX * lv.factor;
          const y = t.row * TILE_PX * lv.factor;
          if (levelTiles) {
            const tile = levelTiles[t.row * lv.cols + t.col];
            place(t.key, { image: tile, x, y, width: tile.width * lv.factor, height: tile.height * lv.factor });
          } else {
            // Full resolution: a tile-sized crop of the decoded bitmap itself.
            const width = Math.min(TILE_PX, bitmap.width - x);
            const height = Math.min(TILE_PX, bitmap.height - y);
            place(t.key, { image: bitmap, x, y, width, height, crop: { x, y, width, height } });
          }
        }
      }
      for (const [key, node] of nodes) {
        if (wanted.has(key)) continue;
        node.destroy();
        nodes.delete(key);
      }
      const crisp = camera.scale > CRISP_ABOVE_SCALE;
      if (layer.imageSmoothingEnabled() === crisp) layer.imageSmoothingEnabled(!crisp);
      drawing = wanted.has('full') ? 'whole' : 'tiles';
      // A new camera redraws the layer in the next frame even with the same tiles (batchDraw joins that draw).
      mark('drawing');
      layer.batchDraw();
    };
    update();
    const unsubscribeCamera = useSessionStore.subscribe((s, prev) => {
      if (s.camera !== prev.camera || s.viewport !== prev.viewport) update();
    });
    // A reduced level made while this scan is shown takes the place of the whole bitmap at once.
    const unsubscribeLevels = subscribePyramids(update);
    return () => {
      unsubscribeCamera();
      unsubscribeLevels();
      layer.off('draw.scanDrawn');
      view?.removeAttribute('data-scan-drawn');
      nodes.forEach((n) => n.destroy());
      nodes.clear();
      layer.batchDraw();
    };
  }, [bitmap, pyramid, viewRef]);

  if (!scan) return <Layer listening={false} name="scan" />;
  return (
    <Layer listening={false} ref={layerRef} name="scan">
      <Rect x={0} y={0} width={scan.widthPx} height={scan.heightPx} fill="#ffffff" perfectDrawEnabled={false} />
      <Group ref={groupRef} />
      <GridShape />
    </Layer>
  );
});
