// The keyboard shortcuts, shown on "?" (and from the tool bar's "?" button).
import { useToolSession } from '../../state/toolSessionStore';
import { TOOLS } from '../../tools/toolRegistry';

const GENERAL: [string, string][] = [
  ['Ctrl/Cmd + Z', 'Undo (a drawn line steps back one stretch at a time, while drawing and after)'],
  ['Shift + Ctrl/Cmd + Z, Ctrl/Cmd + Y', 'Redo (while drawing a line: put back the stretch undo took)'],
  ['Wheel', 'Zoom about the cursor'],
  ['+ / −', 'Zoom in / out'],
  ['F', 'Zoom to fit'],
  ['1', 'Actual size: one scan pixel per screen pixel'],
  ['Space + drag, middle drag', 'Pan (Space on a focused button presses the button)'],
  ['Arrow keys', 'Pan'],
  ['Enter / double-click', 'Finish the line being drawn (Enter on a focused button presses the button)'],
  ['Backspace', 'Remove the last point drawn (and the stretch traced to it); in Edit, delete the chosen vertex'],
  ['Esc', 'Cancel what the tool is doing'],
  ['Shift + drag', 'Edit: move a whole line · Regional: move every regional'],
  ['Alt + click', 'Draw horizon, Fault: a straight stretch (or a followed one, with following off) · Calibrate: no snapping · Edit: delete a vertex'],
  ['?', 'Show or hide this list'],
];

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
              {GENERAL.map(([k, what]) => (
                <tr key={k}><td><kbd>{k}</kbd></td><td>{what}</td></tr>
              ))}
            </tbody>
          </table>
        </div>
      </div>
    </div>
  );
}
