// The proposed detachment drawn back onto the section, with its 95% band (interpretation pane).
// Derived from the document through the selectors, so it follows a regional or pin while it is dragged.
import { useMemo } from 'react';
import { Label, Layer, Line, Tag, Text } from 'react-konva';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { selectLiveAnalysis } from '../state/selectors';
import { useCrossingChecks } from '../state/crossingChecks';
import { sectionToImage } from '../core/calibration/mapPoints';
import { EXACT_FIT_TEXT, formatInterval, formatLength } from '../format/formatQuantity';
import { detachmentTrace } from './detachmentTrace';
import { MARK_COLOURS } from '../core/model/horizonPalette';

const COLOUR = MARK_COLOURS.detachment;
// Screen pixels: small type on a translucent white backing, so it stays legible over scan art and
// hides little of it.
const FONT = 11;
const LINE_HEIGHT = 1.2;
const PAD = 3;

export function DetachmentLayer() {
  const doc = useDocStore((s) => s.doc);
  const gestureStart = useDocStore((s) => s.gestureStart);
  const scale = useSessionStore((s) => s.camera.scale);
  // A self-crossing verdict changes the analysis of the same document (crossingChecks.ts): read it again then.
  const answered = useCrossingChecks((s) => s.answered);
  const shapes = useMemo(() => {
    if (!doc.settings.showDetachment) return null;
    const { docSection, outcome } = selectLiveAnalysis(doc, gestureStart);
    if (!docSection.ok || !outcome?.ok) return null;
    const trace = detachmentTrace(docSection.section, outcome.analysis);
    if (!trace) return null;
    const px = (pts: [number, number][]) => pts.flatMap((q) => sectionToImage(docSection.fit, q));
    const u = outcome.analysis.units;
    // The one formatting rule (src/format), so the section, the strip and the pane show one number.
    const len = (v: number) => formatLength(v, u);
    const e = trace.elevationInterval;
    const interval = e === 'unbounded' ? '95% interval unbounded' : e === 'none' ? 'no interval (two horizons)' : e === 'exact' ? EXACT_FIT_TEXT
      : `95%: ${formatInterval(e, u)}`;
    return {
      line: px(trace.line),
      band: trace.band ? px([trace.band.upper[0], trace.band.upper[1], trace.band.lower[1], trace.band.lower[0]]) : null,
      label: `Proposed detachment ${len(trace.elevation)}\ndepth ${len(trace.depth)} below ${len(outcome.analysis.referenceElevation)}; ${interval}`,
      // Just under the line where it crosses the left pin: nothing is drawn below a basal detachment
      // (every horizon lies above it, and the beds at a pin are back at their regional), so the label
      // covers the least of the section there; only the faint 95% band runs under it.
      anchor: sectionToImage(docSection.fit, trace.atLeftPin),
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- `answered` stands for the verdicts selectLiveAnalysis reads
  }, [doc, gestureStart, answered]);
  if (!shapes) return <Layer listening={false} />;
  const k = 1 / scale;
  return (
    <Layer listening={false}>
      {shapes.band && <Line points={shapes.band} closed fill={COLOUR} opacity={0.14} perfectDrawEnabled={false} />}
      <Line points={shapes.line} stroke={COLOUR} strokeWidth={2.2 * k} dash={[12 * k, 6 * k]} perfectDrawEnabled={false} />
      {/* The label is laid out in screen pixels and scaled to the view: a font of FONT / scale image pixels (over a
          thousand on a big document fitted to the view) made the canvas resolve a new font size on every zoom, and
          one that large took a tenth of a second to set. */}
      <Label x={shapes.anchor[0] + 4 * k} y={shapes.anchor[1] + 5 * k} scaleX={k} scaleY={k} listening={false}>
        <Tag fill="rgba(255, 255, 255, 0.78)" cornerRadius={2} perfectDrawEnabled={false} />
        <Text text={shapes.label} fontSize={FONT} lineHeight={LINE_HEIGHT} padding={PAD} fill={COLOUR} fontStyle="bold" perfectDrawEnabled={false} />
      </Label>
    </Layer>
  );
}
