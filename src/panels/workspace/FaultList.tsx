// The faults, in drawing order: name, colour (the dark fault colours, or any other), show/hide, lock and
// delete, each one undo step through state/faultActions. A fault's swatch is drawn dashed, as on the
// section, so the list reads apart from the horizons. Horizons cut by a fault say so in its row.
import { useState } from 'react';
import type { DocFault } from '../../core/model/projectDoc';
import { useDocStore } from '../../state/docStore';
import { deleteFaultAction, renameFaultAction, setFaultStyleAction } from '../../state/faultActions';
import { FAULT_COLOURS } from '../../core/model/horizonPalette';
import { EyeIcon, LockIcon } from './HorizonList';

function FaultName({ f }: { f: DocFault }) {
  const [text, setText] = useState(f.name);
  const [shown, setShown] = useState(f.name);
  if (shown !== f.name) {
    setShown(f.name);
    setText(f.name);
  }
  const commit = () => {
    setText(f.name);
    if (text.trim() !== f.name) renameFaultAction(f.id, text);
  };
  return (
    <input className="name-field" aria-label="Fault name" title={f.name} value={text} data-testid={`fault-name-${f.id}`}
      onChange={(e) => setText(e.currentTarget.value)} onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') e.currentTarget.blur();
        if (e.key === 'Escape') {
          setText(f.name);
          e.currentTarget.blur();
        }
      }} />
  );
}

function FaultRow({ f, cuts }: { f: DocFault; cuts: number }) {
  const [open, setOpen] = useState(false);
  return (
    <li className="fault-item" data-testid={`fault-row-${f.id}`}>
      <div className="horizon-row fault-row">
        <button type="button" className="fault-swatch" style={{ borderColor: f.colour }} aria-label={`Colour of ${f.name}`} aria-expanded={open} title="Colour" onClick={() => setOpen(!open)} />
        <FaultName f={f} />
        {cuts > 0 && <span className="hint fault-cuts" data-testid={`fault-cuts-${f.id}`} title={`${cuts} horizon${cuts === 1 ? '' : 's'} drawn in pieces along this fault`}>cuts {cuts}</span>}
        <button type="button" className={`row-toggle${f.visible ? ' on' : ''}`} aria-pressed={f.visible} aria-label={`Show ${f.name}`} data-testid={`fault-show-${f.id}`}
          title={f.visible ? 'Shown: click to hide' : 'Hidden: click to show'} onClick={() => setFaultStyleAction(f.id, { visible: !f.visible })}><EyeIcon on={f.visible} /></button>
        <button type="button" className={`row-toggle${f.locked ? ' on' : ''}`} aria-pressed={f.locked} aria-label={`Lock ${f.name}`} data-testid={`fault-lock-${f.id}`}
          title={f.locked ? 'Locked against editing: click to unlock' : 'Editable: click to lock'} onClick={() => setFaultStyleAction(f.id, { locked: !f.locked })}><LockIcon on={f.locked} /></button>
        <button type="button" className="row-icon danger" aria-label={`Delete ${f.name}`} data-testid={`fault-delete-${f.id}`} title="Delete this fault (undo brings it back)" onClick={() => deleteFaultAction(f.id)}>×</button>
      </div>
      {open && (
        <div className="palette" role="radiogroup" aria-label={`Colour of ${f.name}`}>
          {FAULT_COLOURS.map((c) => (
            <button key={c} type="button" role="radio" aria-checked={c === f.colour} aria-label={`Colour ${c}`} className={`swatch-button${c === f.colour ? ' on' : ''}`} style={{ background: c }}
              onClick={() => setFaultStyleAction(f.id, { colour: c })} />
          ))}
          <input type="color" aria-label="Other colour" data-testid={`fault-colour-${f.id}`} value={f.colour} onChange={(e) => setFaultStyleAction(f.id, { colour: e.currentTarget.value })} />
        </div>
      )}
    </li>
  );
}

export function FaultList() {
  const faults = useDocStore((s) => s.doc.faults);
  const horizons = useDocStore((s) => s.doc.horizons);
  return (
    <section className="panel-section" aria-label="Faults">
      <h2>Faults</h2>
      {faults.length === 0 && <p className="hint">None: choose Fault (K) and click along a fault; then draw a cut horizon in pieces, clicking on the fault to end each piece.</p>}
      <ol className="horizon-list" data-testid="fault-list">
        {faults.map((f) => <FaultRow key={f.id} f={f} cuts={horizons.filter((h) => h.joins.some((j) => j.faultId === f.id)).length} />)}
      </ol>
    </section>
  );
}
