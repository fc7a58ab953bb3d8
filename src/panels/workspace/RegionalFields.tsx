// The selected horizon's regional as numbers: its elevation at the left and right pins, one elevation for a
// flat regional, or "through this point at this dip". The fields show the regional as it is, so a drag on the
// section and typed values stay in step; each value typed is one undo step.
import { useState } from 'react';
import { regionalLevels } from '../../core/model/commands/regionalLevels';
import { setRegionalLevels, setRegionalThrough } from '../../core/model/commands/setRegionalLevels';
import { useDocStore } from '../../state/docStore';
import { formatNumber } from '../../format/formatQuantity';
import { NumberField } from './NumberField';
import { roundForField } from './readNumberInput';

const DECIMALS = 2;
const shown = (v: number | null) => (v === null || !Number.isFinite(v) ? null : roundForField(v, DECIMALS));

export function RegionalFields({ horizonId }: { horizonId: string }) {
  const apply = useDocStore((s) => s.apply);
  const doc = useDocStore((s) => s.doc);
  const units = doc.calibration ? doc.units : 'px';
  const lv = regionalLevels(doc, horizonId);
  const hasPins = useDocStore((s) => Boolean(s.doc.scenarios.find((k) => k.id === s.doc.activeScenarioId)?.pinsPx));
  const [throughX, setThroughX] = useState<number | null>(null);
  if (!hasPins) return <p className="hint">Place the pins to type this horizon’s regional.</p>;
  const x = throughX ?? (lv ? (lv.pins[0] + lv.pins[1]) / 2 : null);
  const zAtX = lv && x !== null ? lv.zLeft + ((lv.zRight - lv.zLeft) * (x - lv.pins[0])) / (lv.pins[1] - lv.pins[0]) : null;
  const dipCheck = (v: number) => (Math.abs(v) < 90 ? null : 'a dip must lie between −90° and 90°');
  return (
    <div className="regional-fields" data-testid="regional-fields">
      <p className="hint" data-testid="regional-summary">
        {lv
          ? <>Regional: mean elevation <strong>{formatNumber(lv.mean)} {units}</strong>, dip <strong>{formatNumber(Math.abs(lv.dipDeg), 3)}°</strong>{Math.abs(lv.dipDeg) > 1e-9 ? (lv.dipDeg > 0 ? ' down to the right' : ' down to the left') : ''}{lv.straight ? '' : ' (bent: typing makes it straight)'}</>
          : 'No regional yet: type its elevation at the pins, or propose or draw one.'}
      </p>
      <div className="field-grid">
        <label>at left pin z<NumberField label="Regional elevation at the left pin" testId="regional-z-left" value={shown(lv?.zLeft ?? null)} width={80}
          onCommit={(v) => apply((d) => setRegionalLevels(d, horizonId, v, lv ? lv.zRight : v))} /></label>
        <label>at right pin z<NumberField label="Regional elevation at the right pin" testId="regional-z-right" value={shown(lv?.zRight ?? null)} width={80}
          onCommit={(v) => apply((d) => setRegionalLevels(d, horizonId, lv ? lv.zLeft : v, v))} /></label>
        <label>flat at z<NumberField label="Flat regional elevation" testId="regional-z-flat" value={lv && Math.abs(lv.zLeft - lv.zRight) < 1e-9 ? shown(lv.zLeft) : null} width={80}
          onCommit={(v) => apply((d) => setRegionalLevels(d, horizonId, v, v))} /></label>
      </div>
      <div className="field-grid" aria-label="Regional through a point at a dip">
        <label>through x<NumberField label="Regional through x" testId="regional-through-x" value={shown(x)} width={80} onCommit={(v) => setThroughX(v)} /></label>
        <label>z<NumberField label="Regional through z" testId="regional-through-z" value={shown(zAtX)} width={80}
          onCommit={(v) => x !== null && apply((d) => setRegionalThrough(d, horizonId, x, v, lv ? lv.dipDeg : 0))} /></label>
        <label>dip °<NumberField label="Regional dip in degrees, positive down to the right" testId="regional-dip" value={lv ? roundForField(lv.dipDeg, 3) : null} width={64} check={dipCheck}
          onCommit={(v) => x !== null && apply((d) => setRegionalThrough(d, horizonId, x, zAtX ?? 0, v))} /></label>
      </div>
      <p className="hint">{units}; dip positive down to the right. Through x is where the dip turns the regional.</p>
    </div>
  );
}
