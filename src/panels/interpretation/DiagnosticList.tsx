// Plain-word diagnostics and the horizons flagged as far off the line.
import type { Diagnostic } from './diagnostics';
import { outlierFlagDistance, type OutlierFlag } from './outlierFlags';
import type { AreaUnit } from '../../format/formatQuantity';

export function DiagnosticList({ items, flags, unit }: { items: Diagnostic[]; flags: OutlierFlag[]; unit: AreaUnit | null }) {
  if (items.length === 0 && flags.length === 0) return null;
  return (
    <div className="diagnostics" data-testid="diagnostics">
      {items.map((d, i) => (
        <p key={i} className={`diagnostic ${d.level}`}>{d.text}</p>
      ))}
      {flags.map((f) => (
        <div key={f.id} className="diagnostic warning" data-testid="outlier-flag">
          <b>{f.name}</b> lies far off the line ({outlierFlagDistance(f, unit)}). Likely reasons:
          <ul>{f.reasons.map((r) => <li key={r}>{r}</li>)}</ul>
        </div>
      ))}
    </div>
  );
}
