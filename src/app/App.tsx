// The page: a top bar, a side panel and the section view filling the rest.
import { useCallback, useEffect, useState } from 'react';
import { SectionView } from '../canvas/SectionView';
import { ScanControls } from '../panels/ScanControls';
import { WorkspacePanel } from '../panels/WorkspacePanel';
import { ResultsStrip } from '../panels/ResultsStrip';
import { InterpretationPane } from '../panels/InterpretationPane';
import { FileMenu } from '../panels/FileMenu';
import { openScanFile, scanFileFromClipboard } from '../state/openScanFile';
import { MessageBar } from './MessageBar';
import { useKeys } from './useKeys';
import { isTyping } from '../canvas/keyForTools';
import { startApp } from './startApp';
import { KeepWorkBoundary } from './KeepWorkBoundary';
import { useSessionStore } from '../state/sessionStore';

export function App() {
  const [dropping, setDropping] = useState(false);
  const started = useSessionStore((s) => s.started);
  useKeys();
  useEffect(() => startApp(), []);
  useEffect(() => {
    // Ctrl/Cmd+V of an image (a screenshot, a figure copied from a report) opens it as the scan.
    const onPaste = (e: ClipboardEvent) => {
      if (isTyping(e.target)) return;
      const file = scanFileFromClipboard(e.clipboardData);
      if (!file) return;
      e.preventDefault();
      void openScanFile(file);
    };
    window.addEventListener('paste', onPaste);
    return () => window.removeEventListener('paste', onPaste);
  }, []);
  const onDrop = useCallback((e: React.DragEvent) => {
    e.preventDefault();
    setDropping(false);
    const file = e.dataTransfer.files?.[0];
    if (file) void openScanFile(file);
  }, []);
  return (
    <div className="app" data-startup={started ? 'done' : 'running'}>
      <header className="top-bar">
        <span className="app-name">Foldroot</span>
        <span className="app-tagline">depth to detachment by area balance</span>
        <KeepWorkBoundary part="The file menu" compact><FileMenu /></KeepWorkBoundary>
        <MessageBar />
      </header>
      <div className="workspace">
        <aside className="side-panel" aria-label="Controls">
          <KeepWorkBoundary part="The side panel">
            <ScanControls />
            <WorkspacePanel />
          </KeepWorkBoundary>
        </aside>
        <main
          className={`view-box${dropping ? ' dropping' : ''}`}
          onDragOver={(e) => {
            e.preventDefault();
            setDropping(true);
          }}
          onDragLeave={() => setDropping(false)}
          onDrop={onDrop}
        >
          <KeepWorkBoundary part="The section view"><SectionView /></KeepWorkBoundary>
          <KeepWorkBoundary part="The results strip"><ResultsStrip /></KeepWorkBoundary>
        </main>
        <KeepWorkBoundary part="The interpretation pane"><InterpretationPane /></KeepWorkBoundary>
      </div>
    </div>
  );
}
