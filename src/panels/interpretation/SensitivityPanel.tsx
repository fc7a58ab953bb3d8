// Detachment elevation against a common regional offset and tilt (exact fast path of the engine), with
// the amplification 1 + W0/D (docs/method.md §Sensitivity to the regional) written on the plot. Elevation, not depth: a depth needs a
// reference, and the highest regional moves with the offset, so a depth curve would disagree with the
// main pane's depth for the same shift; the elevation has no such ambiguity.
import { useEffect, useState } from 'react';
import type { AnySection } from '../../core/model/section';
import { prepareSection, type PreparedSection } from '../../core/analysis/prepareSection';
import { regionalSensitivity } from '../../core/analysis/sensitivity';
import { linspace } from './meanBand';
import { SweepPlot } from './SweepPlot';
import { formatLength, formatNumber } from '../../format/formatQuantity';
import { useDocStore } from '../../state/docStore';
import { sectionKey } from '../../core/model/sectionKey';
import { useUncertaintyStore } from '../../state/uncertaintyStore';
import { useCrossingChecks } from '../../state/crossingChecks';

/**
 * The sweeps of `section`; `prepared`, when given, is the analysis's own preparation of that section (the sweeps
 * start from it instead of preparing the section again).
 */
export function SensitivityPanel({ scenarioId, section: current, prepared: currentPrepared }: { scenarioId: string; section: AnySection; prepared?: PreparedSection }) {
  // The sweeps re-evaluate the whole section: while a regional or pin is dragged they keep the section
  // of the gesture's start, and follow once it ends.
  const gesture = useDocStore((s) => s.gestureStart !== null);
  // While a long line is being checked for crossing itself the section may yet lose it: no sweep on it until then.
  const checking = useCrossingChecks((s) => s.pending > 0);
  const [held, setHeld] = useState({ section: current, prepared: currentPrepared });
  if (!gesture && (held.section !== current || held.prepared !== currentPrepared)) setHeld({ section: current, prepared: currentPrepared });
  const section = gesture ? held.section : current;
  const prepared = gesture ? held.prepared : currentPrepared;
  const [offsetRange, setOffsetRange] = useState(100);
  const [tiltRange, setTiltRange] = useState(5);
  const [pivot, setPivot] = useState<'left' | 'right'>('left');
  const u = section.units;
  // The sweeps re-prepare the whole section (a big document's lines take a few hundred milliseconds): they are
  // made after the document is first drawn, in a task of their own, and the panel says so meanwhile.
  const [made, setMade] = useState<{ section: AnySection; offsetRange: number; tiltRange: number; pivot: 'left' | 'right'; sweep: Sweep | null } | null>(null);
  useEffect(() => {
    if (checking) return;
    // A frame, then a task: after the browser has drawn. A page not drawing (a hidden tab) gets no frames, so a
    // fallback timer starts the task too.
    let timer: ReturnType<typeof setTimeout> | undefined;
    const make = () => {
      if (timer !== undefined) return;
      timer = setTimeout(() => setMade({ section, offsetRange, tiltRange, pivot, sweep: sweepOf(section, prepared, offsetRange, tiltRange, pivot) }), 0);
    };
    const frame = requestAnimationFrame(make);
    const fallback = setTimeout(make, 250);
    return () => {
      cancelAnimationFrame(frame);
      clearTimeout(fallback);
      clearTimeout(timer);
    };
  }, [section, prepared, offsetRange, tiltRange, pivot, checking]);
  const ready = made !== null && made.section === section && made.offsetRange === offsetRange && made.tiltRange === tiltRange && made.pivot === pivot;
  const sweep = ready ? made.sweep : null;
  const setAmplification = useUncertaintyStore((st) => st.setAmplification);
  // Kept for the report with the key of the section it belongs to (not while a gesture holds the section).
  useEffect(() => {
    if (!sweep || gesture) return;
    const base = sweep.result.base;
    setAmplification(scenarioId, { sectionKey: sectionKey(section), amplification: sweep.result.amplification, pinWidth: sweep.width, displacement: base && !base.noDetachment ? base.displacement : null });
  }, [sweep, gesture, scenarioId, section, setAmplification]);
  if (checking) return <p className="hint" data-testid="sensitivity-checking">Checking lines… the sweeps wait until the long lines are known not to cross themselves.</p>;
  if (!ready) return <p className="hint" data-testid="sensitivity-computing">Computing the sweeps…</p>;
  if (!sweep) return <p className="hint">Sensitivity needs a section the engine can analyse.</p>;
  const amp = sweep.result.amplification;
  const ampText = amp === null
    ? 'No detachment at the base case: no amplification factor.'
    // zd' = zd − δ(1 + W/D) for either sign of D (docs/method.md §Sensitivity to the regional): with extension (D < 0) the factor is
    // negative and a raised regional moves the detachment down.
    : `Amplification 1 + W/D = ${formatNumber(amp, 3)}: raising every regional by 10 ${u} moves the detachment ${formatNumber(10 * Math.abs(amp))} ${u} ${amp >= 0 ? 'up' : 'down'}.`;
  return (
    <div className="sensitivity">
      <p className="amplification" data-testid="sensitivity-amplification">{ampText}</p>
      <p className="hint">Curves in detachment elevation, which needs no reference: a depth below the highest regional would move with that regional as it is shifted.{sweep.result.base && !sweep.result.base.noDetachment && sweep.result.base.detachmentElevation !== null ? ` Unshifted: ${formatLength(sweep.result.base.detachmentElevation, u)}.` : ''}</p>
      <div className="field-row">
        <label>Offset range ± <input type="number" min={1} value={offsetRange} onChange={(e) => setOffsetRange(Number(e.target.value) || 1)} /> {u}</label>
      </div>
      <SweepPlot
        xs={sweep.offsets}
        values={sweep.result.offsets.map((p) => p.elevation)}
        up
        xLabel={`Common regional offset (${u}, up positive)`}
        yLabel={`Detachment elevation (${u})`}
        note={amp === null ? 'no detachment at 0' : `amplification 1 + W/D = ${formatNumber(amp, 3)}`}
        testId="sensitivity-offset-plot"
      />
      <div className="field-row">
        <label>Tilt range ± <input type="number" min={0.1} step={0.5} value={tiltRange} onChange={(e) => setTiltRange(Number(e.target.value) || 0.1)} /> {u} per 1000 {u}</label>
        <label>about the <select value={pivot} onChange={(e) => setPivot(e.target.value as 'left' | 'right')}><option value="left">left pin</option><option value="right">right pin</option></select></label>
      </div>
      <SweepPlot
        xs={sweep.tilts}
        values={sweep.result.tilts.map((p) => p.elevation)}
        up
        xLabel={`Common regional tilt (${u} per 1000 ${u}, rising to the right positive)`}
        yLabel={`Detachment elevation (${u})`}
        note={`tilt about the ${pivot} pin (x = ${formatNumber(sweep.result.tiltPivotX)} ${u})`}
        testId="sensitivity-tilt-plot"
      />
    </div>
  );
}

interface Sweep { offsets: number[]; tilts: number[]; result: ReturnType<typeof regionalSensitivity>; width: number }

/** The offset and tilt sweeps of the section, from its preparation when given (null when the engine cannot prepare it). */
function sweepOf(section: AnySection, prepared: PreparedSection | undefined, offsetRange: number, tiltRange: number, pivot: 'left' | 'right'): Sweep | null {
  const prep = prepared ? { ok: true as const, prepared } : prepareSection(section);
  if (!prep.ok) return null;
  const offsets = linspace(-Math.abs(offsetRange), Math.abs(offsetRange), 41);
  // Tilt entered in units per 1000 units (m per km), swept as dz/dx.
  const tilts = linspace(-Math.abs(tiltRange), Math.abs(tiltRange), 41);
  return { offsets, tilts, result: regionalSensitivity(prep.prepared, { offsets, tilts: tilts.map((t) => t / 1000), tiltPivot: pivot }), width: prep.prepared.pinWidth };
}
