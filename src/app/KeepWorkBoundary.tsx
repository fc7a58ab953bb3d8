// When a part of the page throws while drawing, React would unmount the whole page and the user would
// be left with a blank window. This boundary keeps the rest of the page, and the work: the document
// lives in the store (untouched by a failed drawing) and is written to the browser's kept copy at once.
// The user reads what went wrong and can carry on (draw the part again), save the project, or reload.
import { Component, type ErrorInfo, type ReactNode } from 'react';
import { autosaveNow } from '../state/autosave';
import { saveProjectFile } from '../state/projectActions';

/** `compact`: the notice sits in the top bar, whose height is fixed, so its buttons come first, beside the title. */
interface Props { part: string; compact?: boolean; children: ReactNode }
interface State { error: string | null }

export class KeepWorkBoundary extends Component<Props, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(e: unknown): State {
    return { error: e instanceof Error ? `${e.name}: ${e.message}` : String(e) };
  }

  override componentDidCatch(_e: unknown, _info: ErrorInfo): void {
    // The document itself is fine (a drawing failed, not an edit): keep it now rather than after the delay.
    void autosaveNow();
  }

  override render(): ReactNode {
    if (this.state.error === null) return this.props.children;
    const buttons = (
      <span className="keep-work-actions">
        <button type="button" data-testid="part-failed-retry" onClick={() => this.setState({ error: null })}>Try again</button>{' '}
        <button type="button" onClick={() => void saveProjectFile()}>Save project…</button>{' '}
        <button type="button" onClick={() => window.location.reload()}>Reload the page</button>
      </span>
    );
    const title = <strong>{this.props.part} could not be drawn</strong>;
    const why = <>({this.state.error}). Your project is unchanged and kept in this browser; the rest of the page still works.</>;
    return (
      <div className="keep-work-boundary" role="alert" data-testid="part-failed">
        {this.props.compact
          ? <><p>{title} {buttons}</p><p>{why}</p></>
          : <><p>{title} {why}</p><p>{buttons}</p></>}
      </div>
    );
  }
}
