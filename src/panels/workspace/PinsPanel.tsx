// The two pins, typed as section x (or placed and dragged with the Pins tool). Typed values that would
// cross the other pin or lie far beyond the scan are refused with a message (pinValueProblem); the
// fields show x to 0.01 of the unit, while a pin placed by a click keeps its full precision.
import { useState } from 'react';
import { imageToSection, sectionToImage } from '../../core/calibration/mapPoints';
import { sectionFrame } from '../../core/model/commands/sectionFrame';
import { setPins } from '../../core/model/commands/setPins';
import { activeScenario } from '../../core/model/docToSection';
import type { ImagePx, ProjectDoc } from '../../core/model/projectDoc';
import { useDocStore } from '../../state/docStore';
import { formatNumber } from '../../format/formatQuantity';
import { NumberField } from './NumberField';
import { pinValueProblem } from './pinValueProblem';
import { roundForField } from './readNumberInput';
import { minOf, maxOf } from '../../core/stats/minMax';

/** Decimals shown in the pin fields: 0.01 of the section unit (or of a pixel before calibration). */
const PIN_DECIMALS = 2;

/** Returns the section x-extent of the scan (its four corners), or of the digitised horizons without a scan; null when neither. */
function sectionXExtent(doc: ProjectDoc): [number, number] | null {
  const frame = sectionFrame(doc);
  const corners: ImagePx[] = doc.scan
    ? [[0, 0], [doc.scan.widthPx, 0], [0, doc.scan.heightPx], [doc.scan.widthPx, doc.scan.heightPx]]
    : doc.horizons.flatMap((h) => h.pointsPx);
  if (corners.length === 0) return null;
  const xs = corners.map((p) => imageToSection(frame, p)[0]);
  return [minOf(xs), maxOf(xs)];
}

export function PinsPanel() {
  const pinsPx = useDocStore((s) => activeScenario(s.doc).pinsPx);
  const frame = useDocStore((s) => sectionFrame(s.doc));
  const calibrated = useDocStore((s) => s.doc.calibration !== null);
  const units = useDocStore((s) => s.doc.units);
  const scan = useDocStore((s) => s.doc.scan);
  const apply = useDocStore((s) => s.apply);
  const [pending, setPending] = useState<[number | null, number | null]>([null, null]);
  const xs = pinsPx ? pinsPx.map((p) => imageToSection(frame, p)) : null;
  const order = xs && xs[0][0] > xs[1][0] ? [1, 0] : [0, 1];
  const midZ = scan ? imageToSection(frame, [scan.widthPx / 2, scan.heightPx / 2])[1] : 0;
  const unit = calibrated ? units : 'px';
  // Full precision for the checks; the fields show rounded values.
  const current: [number | null, number | null] = xs ? [xs[order[0]][0], xs[order[1]][0]] : pending;

  const check = (side: 0 | 1) => (x: number) =>
    pinValueProblem(side === 0 ? 'left' : 'right', x, current[1 - side], sectionXExtent(useDocStore.getState().doc), unit);

  const commit = (side: 0 | 1, x: number) => {
    if (xs && pinsPx) {
      const i = order[side];
      if (x === xs[i][0]) return;
      const moved = sectionToImage(frame, [x, xs[i][1]]);
      const pair = pinsPx.slice() as [ImagePx, ImagePx];
      pair[i] = moved;
      apply((d) => setPins(d, pair));
      return;
    }
    const next: [number | null, number | null] = side === 0 ? [x, pending[1]] : [pending[0], x];
    setPending(next);
    if (next[0] !== null && next[1] !== null && next[0] < next[1]) {
      const pair: [ImagePx, ImagePx] = [sectionToImage(frame, [next[0], midZ]), sectionToImage(frame, [next[1], midZ])];
      apply((d) => setPins(d, pair));
      setPending([null, null]);
    }
  };

  const shown = (v: number | null) => (v === null ? null : roundForField(v, PIN_DECIMALS));
  return (
    <section className="panel-section" aria-label="Pins">
      <h2>Pins</h2>
      <div className="button-row">
        <label className="inline-field">left x
          <NumberField label="Left pin x" testId="pin-left-x" value={shown(current[0])} check={check(0)} onCommit={(v) => commit(0, v)} width={96} />
        </label>
        <label className="inline-field">right x
          <NumberField label="Right pin x" testId="pin-right-x" value={shown(current[1])} check={check(1)} onCommit={(v) => commit(1, v)} width={96} />
        </label>
        <span className="hint">{unit}</span>
      </div>
      {xs && <p className="hint" data-testid="pin-width">Pin width {formatNumber(roundForField(Math.abs(xs[1][0] - xs[0][0]), PIN_DECIMALS), 8)} {unit}</p>}
    </section>
  );
}
