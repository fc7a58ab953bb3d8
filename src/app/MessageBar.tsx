// One message at a time: errors stay until dismissed, information fades. The area carries the last message shown
// as data-last-message ("info: …" or "error: …"), still there after it fades, so a check need not race the fade.
import { useEffect } from 'react';
import { useSessionStore } from '../state/sessionStore';

export function MessageBar() {
  const message = useSessionStore((s) => s.message);
  const lastMessage = useSessionStore((s) => s.lastMessage);
  const busy = useSessionStore((s) => s.busy);
  const busyDone = useSessionStore((s) => s.busyDone);
  const busyCancel = useSessionStore((s) => s.busyCancel);
  useEffect(() => {
    if (!message || message.kind === 'error') return;
    const t = window.setTimeout(() => useSessionStore.getState().clearMessage(), 4000);
    return () => window.clearTimeout(t);
  }, [message]);
  return (
    <div className="message-area" aria-live="polite" data-testid="message-area" data-last-message={lastMessage ? `${lastMessage.kind}: ${lastMessage.text}` : undefined}>
      {busy && (
        <div className="message busy" data-testid="busy">
          <span data-testid="busy-text">{busy}</span>
          {busyDone !== null && <progress data-testid="busy-progress" max={1} value={busyDone} aria-label="Done so far" />}
          {busyCancel && <button type="button" className="busy-cancel" data-testid="busy-cancel" onClick={busyCancel}>Cancel</button>}
        </div>
      )}
      {message && (
        <div className={`message ${message.kind}`} role={message.kind === 'error' ? 'alert' : 'status'} data-testid={`message-${message.kind}`}>
          <span>{message.text}</span>
          <button type="button" aria-label="Dismiss" onClick={() => useSessionStore.getState().clearMessage()}>×</button>
        </div>
      )}
    </div>
  );
}
