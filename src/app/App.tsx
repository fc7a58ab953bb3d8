// The page: a top bar, a side panel and the section view filling the rest.
import { useCallback, useState } from 'react';
import { SectionView } from '../canvas/SectionView';
import { ScanControls } from '../panels/ScanControls';
import { WorkspacePanel } from '../panels/WorkspacePanel';
import { ResultsStrip } from '../panels/ResultsStrip';
import { InterpretationPane } from '../panels/InterpretationPane';
import { FileMenu } from '../panels/FileMenu';
import { openScanFile } from '../io/openScanFile';
import { MessageBar } from './MessageBar';
import { useKeyboardShortcuts } from './useKeyboardShortcuts';

export function App() {
  const [dropping, setDropping] = useState(false);
  useKeyboardShortcuts();
  const onDrop = useCallback((e: React.DragEvent) => {
    e.preventDefault();
    setDropping(false);
    const file = e.dataTransfer.files?.[0];
    if (file) void openScanFile(file);
  }, []);
  return (
    <div className="app">
      <header className="top-bar">
        <span className="app-name">Foldroot</span>
        <span className="app-tagline">depth to detachment by area balance</span>
        <FileMenu />
        <MessageBar />
      </header>
      <div className="workspace">
        <aside className="side-panel" aria-label="Controls">
          <ScanControls />
          <WorkspacePanel />
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
          <SectionView />
          <ResultsStrip />
        </main>
        <InterpretationPane />
      </div>
    </div>
  );
}
