// The proposed detachment drawn back onto the section, with its 95% band (interpretation pane).
// Derived from the document through the selectors, so it follows a regional or pin while it is dragged.
import { useMemo } from 'react';
import { Layer, Line, Text } from 'react-konva';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { selectLiveAnalysis } from '../state/selectors';
import { sectionToImage } from '../core/calibration/mapPoints';
import { detachmentTrace } from './detachmentTrace';

const COLOUR = '#b3261e';

function fmt(v: number): string {
  const t = v.toFixed(0);
  return Number(t) === 0 ? '0' : t;
}

export function DetachmentLayer() {
  const doc = useDocStore((s) => s.doc);
  const gestureStart = useDocStore((s) => s.gestureStart);
  const scale = useSessionStore((s) => s.camera.scale);
  const shapes = useMemo(() => {
    if (!doc.settings.showDetachment) return null;
    const { docSection, outcome } = selectLiveAnalysis(doc, gestureStart);
    if (!docSection.ok || !outcome?.ok) return null;
    const trace = detachmentTrace(docSection.section, outcome.analysis);
    if (!trace) return null;
    const px = (pts: [number, number][]) => pts.flatMap((q) => sectionToImage(docSection.fit, q));
    const u = outcome.analysis.units;
    const interval = trace.elevationInterval === 'unbounded' ? '95% interval unbounded'
      : trace.elevationInterval === 'none' ? 'no interval (two horizons)'
        : `95%: ${fmt(trace.elevationInterval[0])} to ${fmt(trace.elevationInterval[1])} ${u}`;
    return {
      line: px(trace.line),
      band: trace.band ? px([trace.band.upper[0], trace.band.upper[1], trace.band.lower[1], trace.band.lower[0]]) : null,
      label: `Proposed detachment ${fmt(trace.elevation)} ${u}\ndepth ${fmt(trace.depth)} ${u} below ${fmt(outcome.analysis.referenceElevation)} ${u}; ${interval}`,
      anchor: sectionToImage(docSection.fit, trace.line[0]),
    };
  }, [doc, gestureStart]);
  if (!shapes) return <Layer listening={false} />;
  const k = 1 / scale;
  return (
    <Layer listening={false}>
      {shapes.band && <Line points={shapes.band} closed fill={COLOUR} opacity={0.14} perfectDrawEnabled={false} />}
      <Line points={shapes.line} stroke={COLOUR} strokeWidth={2.2 * k} dash={[12 * k, 6 * k]} perfectDrawEnabled={false} />
      <Text x={shapes.anchor[0] + 6 * k} y={shapes.anchor[1] - 34 * k} text={shapes.label} fontSize={12 * k} lineHeight={1.25} fill={COLOUR}
        fontStyle="bold" stroke="#ffffff" strokeWidth={3 * k} fillAfterStrokeEnabled perfectDrawEnabled={false} />
    </Layer>
  );
}
