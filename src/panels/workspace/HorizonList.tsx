// The horizons in stratigraphic order (youngest first): name, colour, order, show/hide, lock; the
// selected horizon's regional helpers; and typing or pasting a horizon as a table of x, z. The name takes
// the row's width (order, show and lock are compact icons); a name another horizon has is refused, since
// the analysis keys its results by name.
import { useState } from 'react';
import { sectionToImage } from '../../core/calibration/mapPoints';
import { addHorizon, nextHorizonId } from '../../core/model/commands/addHorizon';
import { deleteHorizon } from '../../core/model/commands/deleteHorizon';
import { horizonNameTaken } from '../../core/model/commands/horizonNameTaken';
import { parallelRegionals } from '../../core/model/commands/parallelRegionals';
import { proposeRegional } from '../../core/model/commands/proposeRegional';
import { renameHorizon } from '../../core/model/commands/renameHorizon';
import { nameLengthProblem } from '../../core/model/limits';
import { reorderHorizons } from '../../core/model/commands/reorderHorizons';
import { documentFit } from '../../core/model/commands/sectionFrame';
import { setHorizonPoints } from '../../core/model/commands/setHorizonPoints';
import { setHorizonStyle } from '../../core/model/commands/setHorizonStyle';
import { setRegional } from '../../core/model/commands/setRegional';
import { activeScenario } from '../../core/model/docToSection';
import type { DocHorizon } from '../../core/model/projectDoc';
import { useDocStore } from '../../state/docStore';
import { useSessionStore } from '../../state/sessionStore';
import { HORIZON_PALETTE, paletteColour } from '../../core/model/horizonPalette';
import { parseXZTable } from './parseXZTable';
import { RegionalFields } from './RegionalFields';

function NameField({ h }: { h: DocHorizon }) {
  const [text, setText] = useState(h.name);
  const [shown, setShown] = useState(h.name);
  if (shown !== h.name) {
    setShown(h.name);
    setText(h.name);
  }
  const commit = () => {
    const name = text.trim();
    setText(h.name);
    if (name === h.name) return;
    const show = useSessionStore.getState().showMessage;
    if (name === '') return show('error', `A horizon needs a name — kept “${h.name}”.`);
    const tooLong = nameLengthProblem(name, 'horizon name');
    if (tooLong) return show('error', `The name was not changed: ${tooLong} — kept “${h.name}”.`);
    if (horizonNameTaken(useDocStore.getState().doc, h.id, name)) {
      return show('error', `“${name}” is already the name of another horizon — kept “${h.name}”.`);
    }
    useDocStore.getState().apply((d) => renameHorizon(d, h.id, name));
  };
  return (
    <input className="name-field" aria-label="Horizon name" title={h.name} value={text} data-testid={`horizon-name-${h.id}`}
      onChange={(e) => setText(e.currentTarget.value)} onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') e.currentTarget.blur();
        if (e.key === 'Escape') {
          setText(h.name);
          e.currentTarget.blur();
        }
      }} />
  );
}

/** An eye, struck through when the horizon is hidden. */
export function EyeIcon({ on }: { on: boolean }) {
  return (
    <svg viewBox="0 0 16 16" width="14" height="14" aria-hidden focusable="false">
      <path d="M1.2 8S3.8 3.6 8 3.6 14.8 8 14.8 8 12.2 12.4 8 12.4 1.2 8 1.2 8Z" fill="none" stroke="currentColor" strokeWidth="1.3" />
      <circle cx="8" cy="8" r="2.1" fill="currentColor" />
      {!on && <path d="M2.5 13.5 13.5 2.5" stroke="currentColor" strokeWidth="1.5" />}
    </svg>
  );
}

/** A padlock, closed when the horizon is locked against editing. */
export function LockIcon({ on }: { on: boolean }) {
  return (
    <svg viewBox="0 0 16 16" width="14" height="14" aria-hidden focusable="false">
      <rect x="3.5" y="7.2" width="9" height="6.8" rx="1" fill={on ? 'currentColor' : 'none'} stroke="currentColor" strokeWidth="1.2" />
      <path d={on ? 'M5.4 7.2V5.3a2.6 2.6 0 0 1 5.2 0v1.9' : 'M5.4 7.2V5.3a2.6 2.6 0 0 1 5.2 0'} fill="none" stroke="currentColor" strokeWidth="1.4" />
    </svg>
  );
}

function HorizonRow({ h, index, count, selected }: { h: DocHorizon; index: number; count: number; selected: boolean }) {
  const apply = useDocStore((s) => s.apply);
  const select = useSessionStore((s) => s.selectHorizon);
  return (
    <li className={`horizon-row${selected ? ' selected' : ''}${h.visible ? '' : ' hidden-horizon'}`} data-testid={`horizon-row-${h.id}`} onClick={() => select(h.id)}>
      <span className="swatch" style={{ background: h.colour }} aria-hidden />
      <NameField h={h} />
      <span className="row-order">
        <button type="button" className="row-icon" aria-label={`Move ${h.name} up (younger)`} title="Move up (younger)" disabled={index === 0} onClick={() => apply((d) => reorderHorizons(d, index, index - 1))}>▲</button>
        <button type="button" className="row-icon" aria-label={`Move ${h.name} down (older)`} title="Move down (older)" disabled={index === count - 1} onClick={() => apply((d) => reorderHorizons(d, index, index + 1))}>▼</button>
      </span>
      <button type="button" className={`row-toggle${h.visible ? ' on' : ''}`} aria-pressed={h.visible} aria-label={`Show ${h.name}`} data-testid={`horizon-show-${h.id}`}
        title={h.visible ? 'Shown on the section: click to hide' : 'Hidden: click to show'} onClick={() => apply((d) => setHorizonStyle(d, h.id, { visible: !h.visible }))}>
        <EyeIcon on={h.visible} />
      </button>
      <button type="button" className={`row-toggle${h.locked ? ' on' : ''}`} aria-pressed={h.locked} aria-label={`Lock ${h.name}`} data-testid={`horizon-lock-${h.id}`}
        title={h.locked ? 'Locked against editing: click to unlock' : 'Editable: click to lock against editing'} onClick={() => apply((d) => setHorizonStyle(d, h.id, { locked: !h.locked }))}>
        <LockIcon on={h.locked} />
      </button>
    </li>
  );
}

function SelectedHorizon({ h }: { h: DocHorizon }) {
  const apply = useDocStore((s) => s.apply);
  const hasRegional = useDocStore((s) => Boolean(activeScenario(s.doc).regionals[h.id]));
  const hasPins = useDocStore((s) => Boolean(activeScenario(s.doc).pinsPx));
  const show = useSessionStore((s) => s.showMessage);
  return (
    <div className="selected-horizon" data-testid="selected-horizon">
      <div className="palette" role="radiogroup" aria-label={`Colour of ${h.name}`}>
        {HORIZON_PALETTE.map((c) => (
          <button key={c} type="button" role="radio" aria-checked={c === h.colour} aria-label={`Colour ${c}`} className={`swatch-button${c === h.colour ? ' on' : ''}`} style={{ background: c }}
            onClick={() => apply((d) => setHorizonStyle(d, h.id, { colour: c }))} />
        ))}
        <input type="color" aria-label="Other colour" value={h.colour} onChange={(e) => apply((d) => setHorizonStyle(d, h.id, { colour: e.currentTarget.value }))} />
      </div>
      <div className="button-row">
        <button type="button" data-testid="propose-regional" disabled={!hasPins}
          title="A straight regional through the horizon's level at each pin: a robust (Theil–Sen) line through its vertices within 15 % of the pin width of that pin; adjust it with the Regional tool"
          onClick={() => {
            const before = useDocStore.getState().doc;
            apply((d) => proposeRegional(d, h.id));
            if (useDocStore.getState().doc === before) show('info', 'No vertices of this horizon near both pins: draw its regional with the Regional tool.');
          }}>Propose regional</button>
        <button type="button" data-testid="parallel-set" disabled={!hasRegional || !hasPins}
          title="Every other horizon gets a copy of this regional, moved to that horizon's own level at the pins"
          onClick={() => apply((d) => parallelRegionals(d, h.id))}>Parallel set</button>
        <button type="button" disabled={!hasRegional} onClick={() => apply((d) => setRegional(d, h.id, null))}>Clear regional</button>
      </div>
      <RegionalFields key={h.id} horizonId={h.id} />
      <div className="button-row">
        <button type="button" className="danger" onClick={() => {
          apply((d) => deleteHorizon(d, h.id));
          useSessionStore.getState().selectHorizon(null);
        }}>Delete horizon</button>
      </div>
    </div>
  );
}

function TypedHorizon({ selected }: { selected: DocHorizon | undefined }) {
  const [text, setText] = useState('');
  const apply = useDocStore((s) => s.apply);
  const show = useSessionStore((s) => s.showMessage);
  const units = useDocStore((s) => s.doc.units);
  const run = (replace: boolean) => {
    const doc = useDocStore.getState().doc;
    const fit = documentFit(doc);
    if (!fit) return show('error', 'Calibrate the scan before typing a horizon in section units.');
    const parsed = parseXZTable(text);
    if (!parsed.ok) return show('error', parsed.message);
    const pointsPx = parsed.points.map((q) => sectionToImage(fit, q));
    if (replace && selected) apply((d) => setHorizonPoints(d, selected.id, pointsPx));
    else {
      const id = nextHorizonId(doc);
      // Refused (with its message) when the project already holds as many horizons as it may.
      if (!apply((d) => addHorizon(d, { id, colour: paletteColour(doc.horizons.length), pointsPx }))) return;
      useSessionStore.getState().selectHorizon(id);
    }
    show('info', `${parsed.points.length} points read${parsed.skipped ? `, ${parsed.skipped} lines skipped` : ''}.`);
    setText('');
  };
  return (
    <details className="typed-horizon">
      <summary>Type or paste x, z</summary>
      <textarea value={text} rows={5} aria-label={`Horizon as x, z in ${units}`} data-testid="xz-table" placeholder={`x, z (${units}), one point per line`} onChange={(e) => setText(e.currentTarget.value)} />
      <div className="button-row">
        <button type="button" onClick={() => run(false)} data-testid="xz-add">Add as new horizon</button>
        <button type="button" disabled={!selected} onClick={() => run(true)}>Replace selected</button>
      </div>
    </details>
  );
}

export function HorizonList() {
  const horizons = useDocStore((s) => s.doc.horizons);
  const selectedId = useSessionStore((s) => s.selectedHorizonId);
  const selected = horizons.find((h) => h.id === selectedId);
  return (
    <section className="panel-section" aria-label="Horizons">
      <h2>Horizons <span className="hint">youngest first</span></h2>
      {horizons.length === 0 && <p className="hint">None yet: choose Draw horizon and click along a bed.</p>}
      <ol className="horizon-list" data-testid="horizon-list">
        {horizons.map((h, i) => <HorizonRow key={h.id} h={h} index={i} count={horizons.length} selected={h.id === selectedId} />)}
      </ol>
      {selected && <SelectedHorizon h={selected} />}
      <TypedHorizon selected={selected} />
    </section>
  );
}
