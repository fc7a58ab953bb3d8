// The scan, drawn beneath everything and never listening for events.
import { memo, useSyncExternalStore } from 'react';
import { Layer, Image as KonvaImage, Rect } from 'react-konva';
import { useDocStore } from '../state/docStore';
import { getScan, scanCacheVersion, subscribeScans } from '../state/scanCache';

export const ScanLayer = memo(function ScanLayer() {
  const scan = useDocStore((s) => s.doc.scan);
  useSyncExternalStore(subscribeScans, scanCacheVersion);
  const cached = getScan(scan?.id);
  if (!scan) return <Layer listening={false} />;
  return (
    <Layer listening={false}>
      <Rect x={0} y={0} width={scan.widthPx} height={scan.heightPx} fill="#ffffff" perfectDrawEnabled={false} />
      {cached && <KonvaImage image={cached.bitmap} x={0} y={0} width={scan.widthPx} height={scan.heightPx} perfectDrawEnabled={false} />}
    </Layer>
  );
});
