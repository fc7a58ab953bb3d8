// Banners about work kept in this browser: a restored session (keep it or start fresh) and a full storage quota.
import { saveProjectFile } from '../../state/projectActions';
import { discardKeptAside, downloadKeptAside, startFresh } from '../../state/autosave';
import { useAutosaveStatus } from '../../state/autosaveStatus';
import { takeOverEditing, useTabStore } from '../../state/tabLock';

export function StorageBanner() {
  const { restoredFrom, quotaFull, failure, keptAside } = useAutosaveStatus();
  const { role, why, notice } = useTabStore();
  const readOnly = role === 'read-only';
  if (!restoredFrom && !quotaFull && !failure && !keptAside && !readOnly && !notice) return null;
  return (
    <div className="storage-banners">
      {notice && !readOnly && (
        <div className="storage-banner" role="status" data-testid="took-over-banner">
          <span>{notice}</span>
          <button type="button" onClick={() => useTabStore.setState({ notice: null })} data-testid="took-over-dismiss">Dismiss</button>
        </div>
      )}
      {readOnly && (
        <div className="storage-banner error" role="alert" data-testid="read-only-banner">
          <span>{why === 'taken-over'
            ? 'Another tab took over editing this project. This tab only shows it, following that tab\'s changes as they are kept; it saves nothing, and edits here are not possible, so neither tab overwrites the other.'
            : 'This project is open for editing in another tab of this browser. This tab only shows it, following that tab\'s changes as they are kept; it saves nothing, and edits here are not possible, so neither tab overwrites the other\'s work.'}</span>
          <button type="button" className="primary" data-testid="take-over" onClick={() => void takeOverEditing()}>Edit here instead</button>
          <button type="button" data-testid="read-only-download" onClick={() => void saveProjectFile()}>Download this copy</button>
        </div>
      )}
      {/* Not in a read-only tab: what it shows is the other tab's work, and "Start fresh" there would clear it. */}
      {restoredFrom && !readOnly && (
        <div className="storage-banner" role="status" data-testid="restore-banner">
          <span>Your last session was brought back (kept in this browser {new Date(restoredFrom).toLocaleString()}).</span>
          <button type="button" onClick={() => useAutosaveStatus.setState({ restoredFrom: null })} data-testid="restore-keep">Keep working</button>
          <button type="button" onClick={() => void startFresh()} data-testid="start-fresh">Start fresh</button>
        </div>
      )}
      {quotaFull && (
        <div className="storage-banner error" role="alert" data-testid="quota-banner">
          <span>This browser has no room left to keep the project (storage quota full). Download the project file to keep your work safe.</span>
          <button type="button" className="primary" onClick={() => void saveProjectFile()}>Download project</button>
          <button type="button" onClick={() => useAutosaveStatus.setState({ quotaFull: false })}>Dismiss</button>
        </div>
      )}
      {keptAside && (
        <div className="storage-banner error" role="alert" data-testid="kept-aside-banner">
          <span>{keptAside} Download it to keep it as a file.</span>
          <button type="button" className="primary" data-testid="download-kept-aside" onClick={() => void downloadKeptAside()}>Download the kept copy</button>
          <button type="button" onClick={() => useAutosaveStatus.setState({ keptAside: null })} title="Hide this until the next start-up">Dismiss</button>
          {!readOnly && (
            <button type="button" data-testid="discard-kept-aside" onClick={() => {
              if (window.confirm('Delete the copy set aside in this browser? Download it first if you may need it.')) void discardKeptAside();
            }}>Delete it</button>
          )}
        </div>
      )}
      {failure && (
        <div className="storage-banner error" role="alert">
          <span>{failure} Download the project file to keep your work safe.</span>
          <button type="button" className="primary" onClick={() => void saveProjectFile()}>Download project</button>
          <button type="button" onClick={() => useAutosaveStatus.setState({ failure: null })}>Dismiss</button>
        </div>
      )}
    </div>
  );
}
