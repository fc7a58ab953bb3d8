// The keyboard shortcuts, shown on "?" (and from the tool bar's "?" button): the key table, as it is.
import { useToolSession } from '../../state/toolSessionStore';
import { KEY_TABLE, type KeyRow } from '../../state/keyTable';

function Row({ row }: { row: KeyRow }) {
  return <tr><td><kbd>{row.label}</kbd></td><td>{row.toolLabel ? <><strong>{row.toolLabel}</strong> — </> : null}{row.what}</td></tr>;
}

/** The two tables of keys: each tool's key, then the rest, in the key table's order. */
export function HelpKeyTables() {
  return (
    <div className="help-columns">
      <table>
        <tbody>
          {KEY_TABLE.filter((r) => r.toolId).map((r) => <Row key={r.toolId} row={r} />)}
        </tbody>
      </table>
      <table>
        <tbody>
          {KEY_TABLE.filter((r) => !r.toolId).map((r) => <Row key={`${r.label} ${r.when}`} row={r} />)}
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
