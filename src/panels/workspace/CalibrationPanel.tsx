// Calibrate the scan: control points of known (x, z) fitted by least-squares affine, or separate
// horizontal and vertical scales from points of known x and of known z. Shows each point's misfit,
// warns above the tolerance, and shows the vertical exaggeration.
import { fitCalibration } from '../../core/calibration/fitCalibration';
import type { CalibrationPointRef } from '../../core/model/commands/calibrationPointRef';
import { deleteCalibrationPoint } from '../../core/model/commands/deleteCalibrationPoint';
import { setCalibration } from '../../core/model/commands/setCalibration';
import { setUnits } from '../../core/model/commands/setUnits';
import { updateCalibrationPoint } from '../../core/model/commands/updateCalibrationPoint';
import type { Calibration } from '../../core/model/projectDoc';
import { useToolSession } from '../../state/toolSessionStore';
import { useDocStore } from '../../state/docStore';
import { useSessionStore } from '../../state/sessionStore';
import { residualTooLarge, RESIDUAL_WARN_PX, RESIDUAL_WARN_SHARE } from './calibrationTolerance';
import { formatNumber } from '../../format/formatQuantity';
import { NumberField } from './NumberField';
import { minOf, maxOf } from '../../core/stats/minMax';

interface Row { ref: CalibrationPointRef; label: string; u: number; v: number; fields: { key: 'x' | 'z' | 'value'; label: string; value: number }[] }

function rowsOf(cal: Calibration | null): Row[] {
  if (!cal) return [];
  if (cal.kind === 'affine') {
    return cal.points.map((p, index) => ({ ref: { list: 'points', index }, label: `${index + 1}`, u: p.u, v: p.v, fields: [{ key: 'x', label: 'x', value: p.x }, { key: 'z', label: 'z', value: p.z }] }));
  }
  return [
    ...cal.xPoints.map((p, index): Row => ({ ref: { list: 'xPoints', index }, label: `x${index + 1}`, u: p.u, v: p.v, fields: [{ key: 'value', label: 'x', value: p.value }] })),
    ...cal.zPoints.map((p, index): Row => ({ ref: { list: 'zPoints', index }, label: `z${index + 1}`, u: p.u, v: p.v, fields: [{ key: 'value', label: 'z', value: p.value }] })),
  ];
}

function extentOf(cal: Calibration): number {
  const xs = cal.kind === 'affine' ? cal.points.map((p) => p.x) : cal.xPoints.map((p) => p.value);
  const zs = cal.kind === 'affine' ? cal.points.map((p) => p.z) : cal.zPoints.map((p) => p.value);
  const span = (a: number[]) => (a.length ? maxOf(a) - minOf(a) : 0);
  return Math.max(span(xs), span(zs));
}

export function CalibrationPanel() {
  const cal = useDocStore((s) => s.doc.calibration);
  const units = useDocStore((s) => s.doc.units);
  const apply = useDocStore((s) => s.apply);
  const pick = useToolSession((s) => s.calibrationPick);
  const focusRef = useToolSession((s) => s.focusRef);
  const setPick = useToolSession((s) => s.setCalibrationPick);
  const tool = useSessionStore((s) => s.activeTool);
  const mode = cal ? (cal.kind === 'affine' ? 'affine' : 'axes') : pick === 'points' ? 'affine' : 'axes';
  const fitted = cal ? fitCalibration(cal) : null;
  const rows = rowsOf(cal);
  const extent = cal ? extentOf(cal) : 0;

  const chooseMode = (m: 'affine' | 'axes') => {
    setPick(m === 'affine' ? 'points' : 'xPoints');
    useSessionStore.getState().setTool('calibrate');
    if (cal && (cal.kind === 'affine') !== (m === 'affine')) {
      apply((d) => setCalibration(d, m === 'affine' ? { kind: 'affine', points: [] } : { kind: 'axes', xPoints: [], zPoints: [] }));
    }
  };

  return (
    <section className="panel-section" aria-label="Calibrate" data-testid="calibration-panel">
      <h2>Calibrate</h2>
      <div className="segmented" role="radiogroup" aria-label="Calibration kind">
        <button type="button" role="radio" aria-checked={mode === 'affine'} className={mode === 'affine' ? 'on' : ''} onClick={() => chooseMode('affine')} data-testid="cal-mode-affine">Control points</button>
        <button type="button" role="radio" aria-checked={mode === 'axes'} className={mode === 'axes' ? 'on' : ''} onClick={() => chooseMode('axes')} data-testid="cal-mode-axes">Per axis</button>
      </div>
      {mode === 'axes' && (
        <div className="button-row" role="radiogroup" aria-label="Clicks add">
          <span className="hint">Clicks add</span>
          <button type="button" role="radio" aria-checked={pick === 'xPoints'} className={pick === 'xPoints' ? 'on' : ''} onClick={() => { setPick('xPoints'); useSessionStore.getState().setTool('calibrate'); }} data-testid="cal-pick-x">known x</button>
          <button type="button" role="radio" aria-checked={pick === 'zPoints'} className={pick === 'zPoints' ? 'on' : ''} onClick={() => { setPick('zPoints'); useSessionStore.getState().setTool('calibrate'); }} data-testid="cal-pick-z">known z</button>
        </div>
      )}
      <p className="hint">
        {tool === 'calibrate'
          ? mode === 'affine' ? 'Click three or more marks of known (x, z) on the scan, then type their values.' : 'Click two or more marks of known x and two or more of known z, then type their values.'
          : 'Choose the Calibrate tool to click points on the scan.'}
      </p>
      <div className="units-row">
        <label className="inline-field" htmlFor="section-units">Units</label>
        <select id="section-units" aria-label="Units" aria-describedby="section-units-note" value={units} onChange={(e) => apply((d) => setUnits(d, e.currentTarget.value === 'ft' ? 'ft' : 'm'))} data-testid="units">
          <option value="m">metres</option>
          <option value="ft">feet</option>
        </select>
        {/* setUnits only relabels: the typed control-point values stay the numbers they were. */}
        <span className="hint units-note" id="section-units-note" data-testid="units-note">labels only — coordinates are not converted; recalibrate to convert</span>
      </div>
      {rows.length > 0 && (
        <table className="cal-table" data-testid="cal-table">
          <thead><tr><th>#</th><th>known {mode === 'affine' ? 'x, z' : 'value'} ({units})</th><th title="misfit of the point to the fitted calibration">misfit</th><th /></tr></thead>
          <tbody>
            {rows.map((row, k) => {
              const r = fitted?.ok ? fitted.fit.residuals[k] : undefined;
              const warn = r ? residualTooLarge(r, extent) : false;
              const focused = focusRef && focusRef.ref.list === row.ref.list && focusRef.ref.index === row.ref.index ? focusRef.n : 0;
              return (
                <tr key={`${row.ref.list}-${row.ref.index}`} className={warn ? 'warn' : ''} data-testid={`cal-row-${k}`}>
                  <td title={`at pixel ${Math.round(row.u)}, ${Math.round(row.v)}`}>{row.label}</td>
                  <td className="known">
                    {row.fields.map((f, j) => (
                      <NumberField key={f.key} label={`${f.label} of point ${row.label}`} value={f.value} width={row.fields.length > 1 ? 72 : 110}
                        testId={`cal-${f.key}-${k}`} focusKey={j === 0 ? focused : undefined}
                        onCommit={(v) => apply((d) => updateCalibrationPoint(d, row.ref, { [f.key]: v }))} />
                    ))}
                  </td>
                  <td className="residual" data-testid={`cal-residual-${k}`}>{r ? (Math.abs(r.residualPx) < 0.01 ? '< 0.01 px' : `${formatNumber(Math.abs(r.residualPx), 2)} px`) : '—'}</td>
                  <td><button type="button" className="icon" aria-label={`Delete point ${row.label}`} onClick={() => apply((d) => deleteCalibrationPoint(d, row.ref))}>×</button></td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      {fitted && (fitted.ok ? (
        <div className="cal-fit" data-testid="cal-fit">
          <p>1 px ≈ {formatNumber(fitted.fit.unitsPerPxX, 3)} {units} across, {formatNumber(fitted.fit.unitsPerPxZ, 3)} {units} down</p>
          <p>Vertical exaggeration <strong data-testid="cal-ve">{formatNumber(fitted.fit.verticalExaggeration, 3)}×</strong></p>
          {fitted.fit.residuals.some((r) => residualTooLarge(r, extent)) && (
            <p className="warning" data-testid="cal-warning">A point misfits by more than {RESIDUAL_WARN_PX} px or {RESIDUAL_WARN_SHARE * 100}% of the extent: check its typed value and its position.</p>
          )}
          {cal?.kind === 'affine' && cal.points.length === 3 && <p className="hint">Three points fit exactly; add a fourth to check them.</p>}
        </div>
      ) : (
        <p className="hint" data-testid="cal-message">{fitted.message}</p>
      ))}
    </section>
  );
}
