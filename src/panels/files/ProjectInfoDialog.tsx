// The project's title and author, as the exported figure's title block and the report show them.
// One undo entry per save of the dialog; Cancel or Esc changes nothing.
import { useState } from 'react';
import { createPortal } from 'react-dom';
import { projectInfoProblem, setProjectInfo } from '../../core/model/commands/setProjectInfo';
import { useDocStore } from '../../state/docStore';

export function ProjectInfoDialog({ onClose }: { onClose: () => void }) {
  const doc = useDocStore.getState().doc;
  const [title, setTitle] = useState(doc.title);
  const [author, setAuthor] = useState(doc.author);
  // Over the one name-length limit (limits.ts) the fields are refused with the reason, never cut short silently.
  const problem = projectInfoProblem({ title, author });
  const [tried, setTried] = useState(false);
  const save = (e: React.FormEvent) => {
    e.preventDefault();
    if (problem) {
      setTried(true);
      return;
    }
    useDocStore.getState().apply((d) => setProjectInfo(d, { title, author }));
    onClose();
  };
  // A portal above the report page, so the dialog can be opened from there too.
  return createPortal(
    <div className="files-dialog-backdrop project-info-backdrop" role="presentation" onKeyDown={(e) => e.key === 'Escape' && onClose()}>
      <form className="files-dialog project-info-dialog" role="dialog" aria-modal="true" aria-label="Title and author" data-testid="project-info-dialog" onSubmit={save}>
        <h2>Title and author</h2>
        <p className="hint">Shown in the title block of the exported figure, at the top of the report and in the file names of exports.</p>
        <label className="project-info-field">
          Title
          <input type="text" autoFocus value={title} data-testid="project-title" onChange={(e) => setTitle(e.currentTarget.value)} />
        </label>
        <label className="project-info-field">
          Author
          <input type="text" value={author} placeholder="Name of the interpreter" data-testid="project-author" onChange={(e) => setAuthor(e.currentTarget.value)} />
        </label>
        {problem && (
          <p className={tried ? 'files-dialog-error' : 'hint'} role={tried ? 'alert' : undefined} data-testid="project-info-problem">
            Not saved yet: {problem}. Shorten it to save.
          </p>
        )}
        <div className="button-row files-dialog-buttons">
          <button type="button" onClick={onClose} data-testid="project-info-cancel">Cancel</button>
          <button type="submit" className="primary" data-testid="project-info-save">Save</button>
        </div>
      </form>
    </div>,
    document.body,
  );
}
