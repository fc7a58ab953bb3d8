// The selected horizon's regional as numbers: its elevation at the left and right pins, one elevation for a
// flat regional, or "through this point at this dip". The fields show the regional as it is, so a drag on the
// section and typed values stay in step; each value typed is one undo step. The fields render the shown document
// (state/shownDoc.ts) and follow a drag by writing their values and the summary's numbers in place
// (panels/liveText.tsx), so a move renders none of them.
import { useState } from 'react';
import { regionalLevels, type RegionalLevels } from '../../core/model/commands/regionalLevels';
import { setRegionalLevels, setRegionalThrough } from '../../core/model/commands/setRegionalLevels';
import { activeScenario } from '../../core/model/docToSection';
import type { ProjectDoc } from '../../core/model/projectDoc';
import { useDocStore } from '../../state/docStore';
import { useShownDoc } from '../../state/shownDoc';
import { formatNumber } from '../../format/formatQuantity';
import { LiveText, useLiveShape, type LiveRead } from '../liveText';
import { NumberField, numberFieldText } from './NumberField';
import { roundForField } from './readNumberInput';

const DECIMALS = 2;
const shown = (v: number | null) => (v === null || !Number.isFinite(v) ? null : roundForField(v, DECIMALS));

// Each field and number reads the levels of the same document: worked out once a document and horizon.
const levelsMade = new WeakMap<ProjectDoc, Map<string, RegionalLevels | null>>();
function levelsOf(doc: ProjectDoc, horizonId: string): RegionalLevels | null {
  let byHorizon = levelsMade.get(doc);
  if (!byHorizon) levelsMade.set(doc, (byHorizon = new Map()));
  if (!byHorizon.has(horizonId)) byHorizon.set(horizonId, regionalLevels(doc, horizonId));
  return byHorizon.get(horizonId) ?? null;
}

/** The values the fields show for a document, with "through x" as typed (null: midway between the pins). */
function fieldValues(lv: RegionalLevels | null, throughX: number | null) {
  const x = throughX ?? (lv ? (lv.pins[0] + lv.pins[1]) / 2 : null);
  const zAtX = lv && x !== null ? lv.zLeft + ((lv.zRight - lv.zLeft) * (x - lv.pins[0])) / (lv.pins[1] - lv.pins[0]) : null;
  return {
    x, zAtX,
    zLeft: shown(lv?.zLeft ?? null),
    zRight: shown(lv?.zRight ?? null),
    flat: lv && Math.abs(lv.zLeft - lv.zRight) < 1e-9 ? shown(lv.zLeft) : null,
    throughX: shown(x),
    throughZ: shown(zAtX),
    dip: lv ? roundForField(lv.dipDeg, 3) : null,
  };
}

type FieldName = 'zLeft' | 'zRight' | 'flat' | 'throughX' | 'throughZ' | 'dip';

const unitsOf = (doc: ProjectDoc) => (doc.calibration ? doc.units : 'px');
const dipWay = (lv: RegionalLevels) => (Math.abs(lv.dipDeg) > 1e-9 ? (lv.dipDeg > 0 ? ' down to the right' : ' down to the left') : '');

export function RegionalFields({ horizonId }: { horizonId: string }) {
  const apply = useDocStore((s) => s.apply);
  const { doc } = useShownDoc();
  const units = unitsOf(doc);
  const lv = levelsOf(doc, horizonId);
  const hasPins = Boolean(activeScenario(doc).pinsPx);
  const [throughX, setThroughX] = useState<number | null>(null);
  // What a move cannot change by writing numbers: whether there are pins and a regional, its units and bend.
  useLiveShape((d) => {
    const l = levelsOf(d, horizonId);
    return `${Boolean(activeScenario(d).pinsPx)} ${unitsOf(d)} ${l ? l.straight : 'none'}`;
  });
  if (!hasPins) return <p className="hint">Place the pins to type this horizon’s regional.</p>;
  const v = fieldValues(lv, throughX);
  const live = (name: FieldName): LiveRead => (d) => numberFieldText(fieldValues(levelsOf(d, horizonId), throughX)[name]);
  const liveLevel = (read: (l: RegionalLevels, d: ProjectDoc) => string): LiveRead => (d) => {
    const l = levelsOf(d, horizonId);
    return l && read(l, d);
  };
  const { x, zAtX } = v;
  const dipCheck = (value: number) => (Math.abs(value) < 90 ? null : 'a dip must lie between −90° and 90°');
  return (
    <div className="regional-fields" data-testid="regional-fields">
      <p className="hint" data-testid="regional-summary">
        {lv
          ? <>Regional: mean elevation <LiveText as="strong" read={liveLevel((l, d) => `${formatNumber(l.mean)} ${unitsOf(d)}`)} />,
            dip <LiveText as="strong" read={liveLevel((l) => `${formatNumber(Math.abs(l.dipDeg), 3)}°`)} /><LiveText read={liveLevel(dipWay)} />{lv.straight ? '' : ' (bent: typing makes it straight)'}</>
          : 'No regional yet: type its elevation at the pins, or propose or draw one.'}
      </p>
      <div className="field-grid">
        <label>at left pin z<NumberField label="Regional elevation at the left pin" testId="regional-z-left" value={v.zLeft} live={live('zLeft')} width={80}
          onCommit={(z) => apply((d) => setRegionalLevels(d, horizonId, z, lv ? lv.zRight : z))} /></label>
        <label>at right pin z<NumberField label="Regional elevation at the right pin" testId="regional-z-right" value={v.zRight} live={live('zRight')} width={80}
          onCommit={(z) => apply((d) => setRegionalLevels(d, horizonId, lv ? lv.zLeft : z, z))} /></label>
        <label>flat at z<NumberField label="Flat regional elevation" testId="regional-z-flat" value={v.flat} live={live('flat')} width={80}
          onCommit={(z) => apply((d) => setRegionalLevels(d, horizonId, z, z))} /></label>
      </div>
      <div className="field-grid" aria-label="Regional through a point at a dip">
        <label>through x<NumberField label="Regional through x" testId="regional-through-x" value={v.throughX} live={live('throughX')} width={80} onCommit={(z) => setThroughX(z)} /></label>
        <label>z<NumberField label="Regional through z" testId="regional-through-z" value={v.throughZ} live={live('throughZ')} width={80}
          onCommit={(z) => x !== null && apply((d) => setRegionalThrough(d, horizonId, x, z, lv ? lv.dipDeg : 0))} /></label>
        <label>dip °<NumberField label="Regional dip in degrees, positive down to the right" testId="regional-dip" value={v.dip} live={live('dip')} width={64} check={dipCheck}
          onCommit={(dip) => x !== null && apply((d) => setRegionalThrough(d, horizonId, x, zAtX ?? 0, dip))} /></label>
      </div>
      <p className="hint">{units}; dip positive down to the right. Through x is where the dip turns the regional.</p>
    </div>
  );
}
