// The preview before horizons are imported: what will be added, every problem by row, the units,
// and for SVG the two reference points that place the drawing in the section.
import { docLimitProblem } from '../../core/model/docLimitProblem';
import { useMemo, useState } from 'react';
import { importHorizons, type ImportedFault, type ImportedHorizon } from '../../core/model/commands/importHorizons';
import { importedCoordinateProblem } from '../../core/model/importedCoordinateProblem';
import type { LengthUnit } from '../../core/model/section';
import { svgToSectionAxes } from '../../io/svgHorizons';
import { fitViewToDoc } from '../../state/projectActions';
import { formatNumber } from '../../format/formatQuantity';
import type { RowProblem } from '../../io/importTypes';
import { useDocStore } from '../../state/docStore';
import { useSessionStore } from '../../state/sessionStore';
import type { PendingImport } from './readImport';
import { minOf, maxOf } from '../../core/stats/minMax';

type Ref = { sx: string; sy: string; x: string; z: string };

function bbox(lines: [number, number][][]): [number, number, number, number] {
  const all = lines.flat();
  const xs = all.map((p) => p[0]), ys = all.map((p) => p[1]);
  return [minOf(xs), minOf(ys), maxOf(xs), maxOf(ys)];
}

function RefInputs({ n, value, onChange }: { n: 1 | 2; value: Ref; onChange: (r: Ref) => void }) {
  const field = (key: keyof Ref, label: string) => (
    <label>
      {label}
      <input type="number" step="any" data-testid={`svg-ref${n}-${key}`} value={value[key]} onChange={(e) => onChange({ ...value, [key]: e.currentTarget.value })} />
    </label>
  );
  return (
    <fieldset className="ref-point">
      <legend>Reference point {n}</legend>
      {field('sx', 'drawing x')}
      {field('sy', 'drawing y')}
      {field('x', 'section x')}
      {field('z', 'section z')}
    </fieldset>
  );
}

function Problems({ problems }: { problems: RowProblem[] }) {
  if (problems.length === 0) return null;
  return (
    <div className="import-problems" data-testid="import-problems">
      <h3>Problems ({problems.length}{problems.length > 200 ? '+' : ''}) — these rows are left out</h3>
      <ul>
        {problems.map((p, i) => (
          <li key={i}><b>{p.where}</b>: {p.message}</li>
        ))}
      </ul>
    </div>
  );
}

export function ImportDialog({ pending, onClose }: { pending: PendingImport; onClose: () => void }) {
  const docUnits = useDocStore((s) => s.doc.units);
  const stated = pending.kind !== 'svg' && pending.result.ok ? pending.result.units : null;
  const [units, setUnits] = useState<LengthUnit>(stated ?? docUnits);
  const svgBox = pending.kind === 'svg' && pending.result.ok ? bbox(pending.result.lines.map((l) => l.points)) : null;
  const [ref1, setRef1] = useState<Ref>(() => (svgBox ? { sx: String(svgBox[0]), sy: String(svgBox[3]), x: '0', z: '0' } : { sx: '', sy: '', x: '', z: '' }));
  const [ref2, setRef2] = useState<Ref>(() => (svgBox ? { sx: String(svgBox[2]), sy: String(svgBox[1]), x: String(svgBox[2] - svgBox[0]), z: String(svgBox[3] - svgBox[1]) } : { sx: '', sy: '', x: '', z: '' }));
  const mapped = useMemo((): { ok: true; horizons: ImportedHorizon[] } | { ok: false; message: string } => {
    if (!pending.result.ok) return { ok: false, message: pending.result.message };
    // The same coordinate range as a section file (core/model/limits.ts), before anything reaches the document.
    const inRange = (r: { ok: true; horizons: ImportedHorizon[] }, faults: readonly ImportedFault[] = []) => {
      const far = importedCoordinateProblem(r.horizons) ?? importedCoordinateProblem(faults, 'Fault');
      return far ? { ok: false as const, message: `Nothing can be imported from ${pending.fileName}: ${far}.` } : r;
    };
    if (pending.kind !== 'svg') return inRange({ ok: true, horizons: pending.result.horizons }, pending.result.faults);
    const num = (r: Ref) => ({ svg: [Number(r.sx), Number(r.sy)] as [number, number], section: [Number(r.x), Number(r.z)] as [number, number] });
    const bad = [ref1, ref2].some((r) => Object.values(r).some((v) => v.trim() === ''));
    if (bad) return { ok: false, message: 'Enter all eight numbers of the two reference points.' };
    const onAxes = svgToSectionAxes(pending.result.lines, [num(ref1), num(ref2)]);
    return onAxes.ok ? inRange(onAxes) : onAxes;
  }, [pending, ref1, ref2]);

  const confirm = () => {
    if (!mapped.ok) return;
    const before = useDocStore.getState().doc;
    const faultsIn = pending.kind !== 'svg' && pending.result.ok ? pending.result.faults ?? [] : [];
    // The horizons already drawn count too: the document after the import must stay within the limits.
    const over = docLimitProblem(importHorizons(before, mapped.horizons, units, faultsIn));
    if (over) {
      useSessionStore.getState().showMessage('error', `Nothing was imported from ${pending.fileName}: with the horizons already in the project there would be ${over}.`);
      onClose();
      return;
    }
    useDocStore.getState().apply((doc) => importHorizons(doc, mapped.horizons, units, faultsIn));
    const after = useDocStore.getState().doc;
    if (!before.scan && after !== before) fitViewToDoc(after);
    useSessionStore.getState().showMessage('info', `Imported ${mapped.horizons.length} horizon${mapped.horizons.length === 1 ? '' : 's'}${faultsIn.length ? ` and ${faultsIn.length} fault${faultsIn.length === 1 ? '' : 's'}` : ''} from ${pending.fileName}.`);
    onClose();
  };

  return (
    <div className="files-dialog-backdrop" role="presentation" onKeyDown={(e) => e.key === 'Escape' && onClose()}>
      <div className="files-dialog" role="dialog" aria-modal="true" aria-label="Import horizons" data-testid="import-dialog">
        <h2>Import horizons from {pending.fileName}</h2>
        {!pending.result.ok && <p className="files-error" role="alert" data-testid="import-error">{pending.result.message}</p>}
        {pending.result.ok && 'warning' in pending.result && pending.result.warning && <p className="files-error" role="alert" data-testid="import-warning">{pending.result.warning}</p>}
        {pending.kind === 'svg' && pending.result.ok && svgBox && (
          <>
            <p className="hint">
              The drawing spans x {formatNumber(svgBox[0])} to {formatNumber(svgBox[2])} and y {formatNumber(svgBox[1])} to {formatNumber(svgBox[3])} (drawing units, y down).
              Give two points whose section position you know (for instance two grid crossings); they set the scale of each axis.
            </p>
            <div className="ref-points">
              <RefInputs n={1} value={ref1} onChange={setRef1} />
              <RefInputs n={2} value={ref2} onChange={setRef2} />
            </div>
          </>
        )}
        {pending.result.ok && (
          <label className="units-choice">
            Coordinates are in
            <select data-testid="import-units" value={units} onChange={(e) => setUnits(e.currentTarget.value as LengthUnit)}>
              <option value="m">metres</option>
              <option value="ft">feet</option>
            </select>
            {stated ? <span className="hint"> (stated in the file)</span> : <span className="hint"> (not stated in the file: choose)</span>}
          </label>
        )}
        {pending.result.ok && !mapped.ok && <p className="files-error" data-testid="import-error">{mapped.message}</p>}
        {mapped.ok && (
          <table className="files-table" data-testid="import-preview">
            <thead><tr><th>Horizon</th><th>Vertices</th><th>x from – to</th><th>z from – to</th></tr></thead>
            <tbody>
              {mapped.horizons.slice(0, 100).map((h, i) => {
                const xs = h.line.map((p) => p[0]), zs = h.line.map((p) => p[1]);
                return (
                  <tr key={i}>
                    <td>{h.name}</td>
                    <td>{h.line.length}</td>
                    <td>{formatNumber(minOf(xs))} – {formatNumber(maxOf(xs))}</td>
                    <td>{formatNumber(minOf(zs))} – {formatNumber(maxOf(zs))}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        )}
        <Problems problems={pending.result.problems} />
        <div className="button-row files-dialog-buttons">
          <button type="button" onClick={onClose} data-testid="import-cancel">Cancel</button>
          <button type="button" className="primary" disabled={!mapped.ok} onClick={confirm} data-testid="import-confirm">
            {mapped.ok ? `Import ${mapped.horizons.length} horizon${mapped.horizons.length === 1 ? '' : 's'}` : 'Import'}
          </button>
        </div>
      </div>
    </div>
  );
}
