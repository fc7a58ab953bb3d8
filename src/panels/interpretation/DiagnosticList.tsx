// Plain-word diagnostics and the horizons flagged as far off the line. Their texts are live (panels/liveText.tsx):
// a drag changes an r² or a distance off the line without the pane rendering. Which items and flags are shown is
// judged again when the gesture ends; each diagnostic's text follows the one with its key.
import type { Diagnostic } from './diagnostics';
import { outlierFlagDistance, type OutlierFlag } from './outlierFlags';
import type { AreaUnit } from '../../format/formatQuantity';
import type { ProjectDoc } from '../../core/model/projectDoc';
import { LiveText } from '../liveText';

interface Reading { diag: Diagnostic[]; flags: OutlierFlag[]; unit: AreaUnit | null }

interface Props { items: Diagnostic[]; flags: OutlierFlag[]; unit: AreaUnit | null; read: (doc: ProjectDoc, gestureStart: ProjectDoc | null) => Reading }

export function DiagnosticList({ items, flags, unit, read }: Props) {
  if (items.length === 0 && flags.length === 0) return null;
  return (
    <div className="diagnostics" data-testid="diagnostics">
      {items.map((d) => (
        // Matched by key, not by place: a diagnostic that appears above it mid-drag does not hand it another's text.
        <LiveText as="p" key={d.key} className={`diagnostic ${d.level}`} read={(doc, gs) => {
          const now = read(doc, gs).diag.find((x) => x.key === d.key);
          return now && now.level === d.level ? now.text : d.text;
        }} />
      ))}
      {flags.map((f, i) => (
        <div key={f.id} className="diagnostic warning" data-testid="outlier-flag">
          <b>{f.name}</b> lies far off the line (<LiveText read={(doc, gs) => {
            const r = read(doc, gs);
            const g = r.flags[i];
            return g && g.id === f.id ? outlierFlagDistance(g, r.unit) : outlierFlagDistance(f, unit);
          }} />). Likely reasons:
          <ul>{f.reasons.map((r) => <li key={r}>{r}</li>)}</ul>
        </div>
      ))}
    </div>
  );
}
