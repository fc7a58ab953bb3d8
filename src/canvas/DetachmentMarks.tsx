// The proposed detachment drawn back onto the section, with its 95% band (interpretation pane). Derived from the
// one live analysis, so it follows a regional or pin while it is dragged. Per-frame work stays out of React: a store
// subscription writes the line, band and label into their Konva nodes and asks the layer for one batched draw; React
// renders only when what is drawn changes kind (a band comes or goes, the detachment appears or goes).
// A group at the bottom of the overlay's layer (OverlayLayer), not a canvas of its own: during a regional or pin
// drag it changes with the handles over it, so the two are one canvas redrawn and sent to the screen, not two.
import { memo, useLayoutEffect, useRef, useState } from 'react';
import { Group, Line, Shape } from 'react-konva';
import type Konva from 'konva';
import type { ProjectDoc } from '../core/model/projectDoc';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { selectLiveAnalysis } from '../state/selectors';
import { useCrossingChecks } from '../state/crossingChecks';
import { sectionToImage } from '../core/calibration/mapPoints';
import { EXACT_FIT_TEXT, formatInterval, formatLength } from '../format/formatQuantity';
import { detachmentTrace } from './detachmentTrace';
import { MARK_COLOURS } from '../core/model/horizonPalette';
import { drawLabelPicture, labelPicture, paintLabelPicture } from './labelPicture';

const COLOUR = MARK_COLOURS.detachment;
// Screen pixels: small type on a translucent white backing, so it stays legible over scan art and
// hides little of it.
const FONT = 11;
const LINE_HEIGHT = 1.2;
const PAD = 3;

interface Drawn { line: number[]; band: number[] | null; label: string; anchor: [number, number] }

/** The detachment of a document as drawn on the section (image px), or null when there is none to show. */
function detachmentDrawn(doc: ProjectDoc, gestureStart: ProjectDoc | null): Drawn | null {
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
}

type Kind = 'none' | 'line' | 'band';
const kindOf = (d: Drawn | null): Kind => (d ? (d.band ? 'band' : 'line') : 'none');

export const DetachmentMarks = memo(function DetachmentMarks() {
  const [kind, setKind] = useState<Kind>('none');
  const group = useRef<Konva.Group>(null);
  const band = useRef<Konva.Line>(null);
  const line = useRef<Konva.Line>(null);
  const label = useRef<Konva.Shape>(null);
  // The label's text is drawn once per text into a canvas of its own, kept between texts (labelPicture.ts).
  const [picture] = useState(() => labelPicture(
    { fill: 'rgba(255, 255, 255, 0.78)', cornerRadius: 2, perfectDrawEnabled: false },
    { fontSize: FONT, lineHeight: LINE_HEIGHT, padding: PAD, fill: COLOUR, fontStyle: 'bold', perfectDrawEnabled: false },
  ));

  useLayoutEffect(() => {
    // The inputs last drawn: the document and its gesture's start, the zoom, and the self-crossing verdicts (a
    // verdict changes the analysis of the same document, crossingChecks.ts).
    let last: unknown[] = [];
    let drawn: Drawn | null = null;
    const write = () => {
      const scale = useSessionStore.getState().camera.scale;
      const k = 1 / scale;
      if (!drawn) return;
      band.current?.points(drawn.band ?? []);
      line.current?.setAttrs({ points: drawn.line, strokeWidth: 2.2 * k, dash: [12 * k, 6 * k] });
      // The label is laid out in screen pixels and scaled to the view: a font of FONT / scale image pixels (over a
      // thousand on a big document fitted to the view) made the canvas resolve a new font size on every zoom, and
      // one that large took a tenth of a second to set. It is drawn once per text into a canvas of its own: setting
      // the font on the view's canvas made the browser bring the page's style up to date in each frame of a drag.
      paintLabelPicture(picture, drawn.label, window.devicePixelRatio || 1);
      label.current?.setAttrs({ x: drawn.anchor[0] + 4 * k, y: drawn.anchor[1] + 5 * k, scaleX: k, scaleY: k, label: drawn.label });
    };
    const update = () => {
      const { doc, gestureStart } = useDocStore.getState();
      const scale = useSessionStore.getState().camera.scale;
      const answered = useCrossingChecks.getState().answered;
      const now = [doc, gestureStart, scale, answered];
      if (now.every((v, i) => v === last[i])) return;
      const moved = doc !== last[0] || gestureStart !== last[1] || answered !== last[3];
      last = now;
      if (moved) drawn = detachmentDrawn(doc, gestureStart);
      const want = kindOf(drawn);
      // A new kind is mounted by React, and written by the layout effect below.
      if (want !== kind) return setKind(want);
      write();
      group.current?.getLayer()?.batchDraw();
    };
    update();
    const stop = [useDocStore.subscribe(update), useSessionStore.subscribe(update), useCrossingChecks.subscribe(update)];
    return () => stop.forEach((s) => s());
  }, [kind, picture]);

  return (
    <Group ref={group} name="detachment" listening={false}>
      {kind === 'band' && <Line ref={band} closed fill={COLOUR} opacity={0.14} perfectDrawEnabled={false} listening={false} />}
      {kind !== 'none' && (
        <>
          <Line ref={line} stroke={COLOUR} perfectDrawEnabled={false} listening={false} />
          <Shape ref={label} name="detachment-label" listening={false} perfectDrawEnabled={false}
            sceneFunc={(ctx) => drawLabelPicture(ctx, picture)} />
        </>
      )}
    </Group>
  );
});
