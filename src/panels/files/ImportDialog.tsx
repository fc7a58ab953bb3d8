// The preview before horizons are imported: what will be added, every problem by row, the units,
// and for SVG the two reference points that place the drawing in the section.
import { docLimitProblem } from '../../core/model/docLimitProblem';
import { useMemo, useState } from 'react';
import { importHorizons, type ImportedHorizon } from '../../core/model/commands/importHorizons';
import { importedCoordinateProblem } from '../../core/model/importedCoordinateProblem';
import type { LengthUnit, XZ } from '../../core/model/section';
import { svgSectionMap, svgToSectionAxes, type SvgReference } from '../../io/svgHorizons';
import type { LineBox } from '../../io/importedForTransfer';
import { fitViewToDoc } from '../../state/projectActions';
import { formatNumber } from '../../format/formatQuantity';
import type { RowProblem } from '../../io/importTypes';
import { useDocStore } from '../../state/docStore';
import { useSessionStore } from '../../state/sessionStore';
import type { PendingImport } from './readImport';

type Ref = { sx: string; sy: string; x: string; z: string };

/** The union of the lines' extents (measured where the file was read), as [min x, min y, max x, max y]. */
function unionBox(boxes: readonly LineBox[]): [number, number, number, number] {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const b of boxes) {
    x0 = Math.min(x0, b[0]); x1 = Math.max(x1, b[1]);
    y0 = Math.min(y0, b[2]); y1 = Math.max(y1, b[3]);
  }
  return [x0, y0, x1, y1];
}

/** Returns a line's extent mapped to the section: each axis is scaled on its own, so the extremes map to extremes. */
function mappedBox(map: (p: [number, number]) => XZ, b: LineBox): LineBox {
  const [ax, az] = map([b[0], b[2]]);
  const [bx, bz] = map([b[1], b[3]]);
  return [Math.min(ax, bx), Math.max(ax, bx), Math.min(az, bz), Math.max(az, bz)];
}

/** What the preview shows of each line: its name, vertex count and extent in section units. */
interface PreviewRow { name: string; vertices: number; box: LineBox }
type Mapped = { ok: true; rows: PreviewRow[]; horizons: () => ImportedHorizon[] } | { ok: false; message: string };

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
  // The extents were measured where the file was read (a worker): nothing here walks every vertex until Import.
  const svgBox = pending.kind === 'svg' && pending.result.ok ? unionBox(pending.boxes) : null;
  const [ref1, setRef1] = useState<Ref>(() => (svgBox ? { sx: String(svgBox[0]), sy: String(svgBox[3]), x: '0', z: '0' } : { sx: '', sy: '', x: '', z: '' }));
  const [ref2, setRef2] = useState<Ref>(() => (svgBox ? { sx: String(svgBox[2]), sy: String(svgBox[1]), x: String(svgBox[2] - svgBox[0]), z: String(svgBox[3] - svgBox[1]) } : { sx: '', sy: '', x: '', z: '' }));
  const mapped = useMemo((): Mapped => {
    if (!pending.result.ok) return { ok: false, message: pending.result.message };
    // The same coordinate range as a section file (core/model/limits.ts), before anything reaches the document.
    const far = (problem: string) => ({ ok: false as const, message: `Nothing can be imported from ${pending.fileName}: ${problem}.` });
    if (pending.kind !== 'svg') {
      if (pending.rangeProblem) return far(pending.rangeProblem);
      const horizons = pending.result.horizons;
      return { ok: true, rows: horizons.map((h, i) => ({ name: h.name, vertices: h.line.length, box: pending.boxes[i] })), horizons: () => horizons };
    }
    const num = (r: Ref) => ({ svg: [Number(r.sx), Number(r.sy)] as [number, number], section: [Number(r.x), Number(r.z)] as [number, number] });
    const bad = [ref1, ref2].some((r) => Object.values(r).some((v) => v.trim() === ''));
    if (bad) return { ok: false, message: 'Enter all eight numbers of the two reference points.' };
    const refs: [SvgReference, SvgReference] = [num(ref1), num(ref2)];
    const axes = svgSectionMap(refs);
    if (!axes.ok) return axes;
    const lines = pending.result.lines;
    const boxes = pending.boxes.map((b) => mappedBox(axes.map, b));
    // A coordinate out of range lies at a corner of its line's extent (each axis is scaled on its own): the corners
    // are checked as the vertices are; only when one is out are the vertices mapped, to name the first such one.
    const corners = boxes.map((b, i) => ({ name: lines[i].name, line: [[b[0], b[2]], [b[1], b[3]]] as XZ[] }));
    if (importedCoordinateProblem(corners)) {
      const onAxes = svgToSectionAxes(lines, refs);
      const problem = onAxes.ok ? importedCoordinateProblem(onAxes.horizons) : onAxes.message;
      return far(problem ?? importedCoordinateProblem(corners)!);
    }
    return {
      ok: true,
      rows: lines.map((l, i) => ({ name: l.name, vertices: l.points.length, box: boxes[i] })),
      horizons: () => lines.map((l) => ({ name: l.name, line: l.points.map(axes.map) })),
    };
  }, [pending, ref1, ref2]);

  const confirm = () => {
    if (!mapped.ok) return;
    const before = useDocStore.getState().doc;
    const faultsIn = pending.kind !== 'svg' && pending.result.ok ? pending.result.faults ?? [] : [];
    // The horizons already drawn count too: the document after the import must stay within the limits.
    const horizons = mapped.horizons();
    const withImport = importHorizons(before, horizons, units, faultsIn);
    const over = docLimitProblem(withImport);
    if (over) {
      useSessionStore.getState().showMessage('error', `Nothing was imported from ${pending.fileName}: with the horizons already in the project there would be ${over}.`);
      onClose();
      return;
    }
    useDocStore.getState().apply((doc) => (doc === before ? withImport : importHorizons(doc, horizons, units, faultsIn)));
    const after = useDocStore.getState().doc;
    if (!before.scan && after !== before) fitViewToDoc(after);
    useSessionStore.getState().showMessage('info', `Imported ${horizons.length} horizon${horizons.length === 1 ? '' : 's'}${faultsIn.length ? ` and ${faultsIn.length} fault${faultsIn.length === 1 ? '' : 's'}` : ''} from ${pending.fileName}.`);
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
              {mapped.rows.slice(0, 100).map((h, i) => (
                <tr key={i}>
                  <td>{h.name}</td>
                  <td>{h.vertices}</td>
                  <td>{formatNumber(h.box[0])} – {formatNumber(h.box[1])}</td>
                  <td>{formatNumber(h.box[2])} – {formatNumber(h.box[3])}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <Problems problems={pending.result.problems} />
        <div className="button-row files-dialog-buttons">
          <button type="button" onClick={onClose} data-testid="import-cancel">Cancel</button>
          <button type="button" className="primary" disabled={!mapped.ok} onClick={confirm} data-testid="import-confirm">
            {mapped.ok ? `Import ${mapped.rows.length} horizon${mapped.rows.length === 1 ? '' : 's'}` : 'Import'}
          </button>
        </div>
      </div>
    </div>
  );
}
