// The keyboard shortcuts, shown on "?" (and from the tool bar's "?" button).
import { useToolSession } from '../../state/toolSessionStore';
import { TOOLS } from '../../tools/toolRegistry';
import { GENERAL_KEYS } from './generalKeys';

/** The two tables of keys: each tool's key (from the tool registry), then the general keys. */
export function HelpKeyTables() {
  return (
    <div className="help-columns">
      <table>
        <tbody>
          {TOOLS.map((t) => (
            <tr key={t.tool.id}><td><kbd>{t.key.toUpperCase()}</kbd></td><td><strong>{t.label}</strong> — {t.hint}</td></tr>
          ))}
        </tbody>
      </table>
      <table>
        <tbody>
          {GENERAL_KEYS.map(([k, what]) => (
            <tr key={k}><td><kbd>{k}</kbd></td><td>{what}</td></tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function HelpOverlay() {
  const open = useToolSession((s) => s.helpOpen);
  const setOpen = useToolSession((s) => s.setHelpOpen);
  if (!open) return null;
  return (
    <div className="help-backdrop" onClick={() => setOpen(false)}>
      <div className="help-overlay" role="dialog" aria-label="Keyboard shortcuts" data-testid="help-overlay" onClick={(e) => e.stopPropagation()}>
        <div className="help-head">
          <h2>Keyboard shortcuts</h2>
          <button type="button" aria-label="Close" onClick={() => setOpen(false)}>×</button>
        </div>
        <HelpKeyTables />
      </div>
    </div>
  );
}
