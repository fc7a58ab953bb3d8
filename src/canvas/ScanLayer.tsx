// The scan, drawn beneath everything and never listening for events. The image is tiled (scanTilesPyramid)
// and only the tiles on screen, at the level that fits the zoom, are in the layer: Konva draws every node
// it holds, so tiles off screen are removed from view here rather than left to the canvas to clip.
import { memo, useEffect, useRef, useState, useSyncExternalStore } from 'react';
import Konva from 'konva';
import { Layer, Group, Image as KonvaImage, Rect } from 'react-konva';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { getScan, scanCacheVersion, subscribeScans } from '../state/scanCache';
import { TILE_PX, visibleTiles } from '../state/scanTiles';
import { ensureTilePyramid, getTilePyramid, type TilePyramid } from '../state/scanTilesPyramid';

/** Screen pixels past the view's edge that are kept drawn, so a short pan never shows a gap. */
const MARGIN_PX = 64;
/** Above this zoom the scan's pixels are shown as crisp squares rather than smoothed. */
const CRISP_ABOVE_SCALE = 2;

function useTilePyramid(scanId: string | undefined, bitmap: ImageBitmap | undefined): TilePyramid | null {
  const [built, setBuilt] = useState<{ id: string; pyramid: TilePyramid } | null>(null);
  const ready = scanId ? getTilePyramid(scanId) : undefined;
  useEffect(() => {
    if (!scanId || !bitmap || ready) return;
    let live = true;
    ensureTilePyramid(scanId, bitmap).then(
      (pyramid) => live && setBuilt({ id: scanId, pyramid }),
      () => live && useSessionStore.getState().showMessage('error', 'The scan could not be prepared for display (out of memory?).'),
    );
    return () => {
      live = false;
    };
  }, [scanId, bitmap, ready]);
  if (ready) return ready;
  return built && built.id === scanId ? built.pyramid : null;
}

export const ScanLayer = memo(function ScanLayer() {
  const scan = useDocStore((s) => s.doc.scan);
  useSyncExternalStore(subscribeScans, scanCacheVersion);
  const cached = getScan(scan?.id);
  const bitmap = cached?.bitmap ?? undefined;
  // A scan kept but not shown (scanCache) draws nothing, not even tiles cut earlier under the same id.
  const pyramid = useTilePyramid(bitmap ? scan?.id : undefined, bitmap);
  const layerRef = useRef<Konva.Layer>(null);
  const groupRef = useRef<Konva.Group>(null);

  useEffect(() => {
    const group = groupRef.current;
    const layer = layerRef.current;
    if (!pyramid || !group || !layer) return;
    const nodes = new Map<string, Konva.Image>();
    let shownLevel = -1;
    const update = () => {
      const { camera, viewport } = useSessionStore.getState();
      const ratio = layer.getCanvas().getPixelRatio();
      const { level, tiles } = visibleTiles(camera, viewport.width, viewport.height, pyramid.widthPx, pyramid.heightPx, ratio, MARGIN_PX);
      const wanted = new Set<string>();
      const lv = pyramid.levels[level];
      for (const t of tiles) {
        wanted.add(t.key);
        if (nodes.has(t.key)) continue;
        const bitmap = pyramid.tiles[level][t.row * lv.cols + t.col];
        const node = new Konva.Image({
          image: bitmap,
          x: t.col * TILE_PX * lv.factor,
          y: t.row * TILE_PX * lv.factor,
          width: bitmap.width * lv.factor,
          height: bitmap.height * lv.factor,
          listening: false,
          perfectDrawEnabled: false,
        });
        nodes.set(t.key, node);
        group.add(node);
      }
      for (const [key, node] of nodes) {
        if (wanted.has(key)) continue;
        node.destroy();
        nodes.delete(key);
      }
      const crisp = camera.scale > CRISP_ABOVE_SCALE;
      if (layer.imageSmoothingEnabled() === crisp) layer.imageSmoothingEnabled(!crisp);
      if (level !== shownLevel) layer.batchDraw();
      shownLevel = level;
    };
    update();
    layer.batchDraw();
    const unsubscribe = useSessionStore.subscribe((s, prev) => {
      if (s.camera !== prev.camera || s.viewport !== prev.viewport) update();
    });
    return () => {
      unsubscribe();
      nodes.forEach((n) => n.destroy());
      nodes.clear();
      layer.batchDraw();
    };
  }, [pyramid]);

  if (!scan) return <Layer listening={false} />;
  return (
    <Layer listening={false} ref={layerRef}>
      <Rect x={0} y={0} width={scan.widthPx} height={scan.heightPx} fill="#ffffff" perfectDrawEnabled={false} />
      {/* Until the tiles are cut (a scan restored from a saved project or the demo), the whole bitmap is drawn. */}
      {!pyramid && bitmap && <KonvaImage image={bitmap} x={0} y={0} width={scan.widthPx} height={scan.heightPx} perfectDrawEnabled={false} />}
      <Group ref={groupRef} />
    </Layer>
  );
});
