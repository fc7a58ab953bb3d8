// Calibration, horizons, pins and regionals (section workspace): the tool bar and the panels that go
// with it, and the keyboard-shortcut overlay.
import { useEffect } from 'react';
import { setSettings } from '../core/model/commands/setSettings';
import { useToolSession } from '../state/toolSessionStore';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { toolEntry, TOOLS } from '../tools/toolRegistry';
import { CalibrationPanel } from './workspace/CalibrationPanel';
import { FaultList } from './workspace/FaultList';
import { HelpOverlay } from './workspace/HelpOverlay';
import { HorizonList } from './workspace/HorizonList';
import { isDocReplaced } from './workspace/isDocReplaced';
import { PinsPanel } from './workspace/PinsPanel';
import './workspace/workspace.css';

function ToolBar() {
  const active = useSessionStore((s) => s.activeTool);
  const setTool = useSessionStore((s) => s.setTool);
  const stateName = useToolSession((s) => s.stateName);
  const showFills = useDocStore((s) => s.doc.settings.showFills);
  const followLine = useToolSession((s) => s.followLine);
  return (
    <section className="panel-section" aria-label="Tools">
      <h2 className="with-action">Tools
        <button type="button" className="icon" aria-label="Keyboard shortcuts" title="Keyboard shortcuts (?)" onClick={() => useToolSession.getState().setHelpOpen(true)} data-testid="help-button">? keys</button>
      </h2>
      <div className="tool-bar" role="toolbar" aria-label="Tools">
        {TOOLS.map((t) => (
          <button key={t.tool.id} type="button" aria-pressed={active === t.tool.id} className={active === t.tool.id ? 'on' : ''} data-testid={`tool-${t.tool.id}`}
            title={`${t.hint} (${t.key.toUpperCase()})`} onClick={() => setTool(t.tool.id)}>{t.label}</button>
        ))}
      </div>
      <p className="hint tool-hint" data-testid="tool-hint" data-state={stateName}>{toolEntry(active).hint}</p>
      {toolEntry(active).tracesLines && (
        <label className="check" title="On: each stretch between two clicks follows the drawn line and clicks snap to its centre. Alt-click does the other for one click.">
          <input type="checkbox" data-testid="follow-line" checked={followLine} onChange={(e) => useToolSession.getState().setFollowLine(e.currentTarget.checked)} />
          follow the drawn line <span className="hint">(Alt-click: {followLine ? 'straight' : 'follow'})</span>
        </label>
      )}
      <label className="check">
        <input type="checkbox" checked={showFills} onChange={(e) => useDocStore.getState().apply((d) => setSettings(d, { showFills: e.currentTarget.checked }))} />
        excess-area fills <span className="fill-key above" /> above <span className="fill-key below" /> below regional
      </label>
    </section>
  );
}

export function WorkspacePanel() {
  // A new or opened project starts with the Select tool: the previous tool's hint means nothing there.
  useEffect(() => useDocStore.subscribe((s, prev) => {
    if (isDocReplaced(s, prev)) useSessionStore.getState().setTool('select');
  }), []);
  return (
    <>
      <ToolBar />
      <CalibrationPanel />
      {/* The pins before the horizon list: two fields that stay in reach however many horizons there are. */}
      <PinsPanel />
      <HorizonList />
      <FaultList />
      <HelpOverlay />
    </>
  );
}
