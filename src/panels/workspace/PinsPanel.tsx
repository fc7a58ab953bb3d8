// The two pins, typed as section x (or placed and dragged with the Pins tool).
import { useState } from 'react';
import { imageToSection, sectionToImage } from '../../core/calibration/mapPoints';
import { sectionFrame } from '../../core/model/commands/sectionFrame';
import { setPins } from '../../core/model/commands/setPins';
import { activeScenario } from '../../core/model/docToSection';
import type { ImagePx } from '../../core/model/projectDoc';
import { useDocStore } from '../../state/docStore';
import { formatNumber } from './formatQuantity';
import { NumberField } from './NumberField';

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

  const commit = (side: 0 | 1, x: number) => {
    if (xs && pinsPx) {
      const i = order[side];
      const moved = sectionToImage(frame, [x, xs[i][1]]);
      const pair = pinsPx.slice() as [ImagePx, ImagePx];
      pair[i] = moved;
      apply((d) => setPins(d, pair));
      return;
    }
    const next: [number | null, number | null] = side === 0 ? [x, pending[1]] : [pending[0], x];
    setPending(next);
    if (next[0] !== null && next[1] !== null && next[0] !== next[1]) {
      const pair: [ImagePx, ImagePx] = [sectionToImage(frame, [next[0], midZ]), sectionToImage(frame, [next[1], midZ])];
      apply((d) => setPins(d, pair));
      setPending([null, null]);
    }
  };

  return (
    <section className="panel-section" aria-label="Pins">
      <h2>Pins</h2>
      <div className="button-row">
        <label className="inline-field">left x
          <NumberField label="Left pin x" testId="pin-left-x" value={xs ? Number(Math.min(xs[0][0], xs[1][0]).toPrecision(6)) : pending[0]} onCommit={(v) => commit(0, v)} />
        </label>
        <label className="inline-field">right x
          <NumberField label="Right pin x" testId="pin-right-x" value={xs ? Number(Math.max(xs[0][0], xs[1][0]).toPrecision(6)) : pending[1]} onCommit={(v) => commit(1, v)} />
        </label>
        <span className="hint">{calibrated ? units : 'px'}</span>
      </div>
      {xs && <p className="hint" data-testid="pin-width">Pin width {formatNumber(Math.abs(xs[1][0] - xs[0][0]))} {calibrated ? units : 'px'}</p>}
    </section>
  );
}
