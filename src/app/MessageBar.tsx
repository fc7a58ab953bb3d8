// One message at a time: errors stay until dismissed, information fades.
import { useEffect } from 'react';
import { useSessionStore } from '../state/sessionStore';

export function MessageBar() {
  const message = useSessionStore((s) => s.message);
  const busy = useSessionStore((s) => s.busy);
  useEffect(() => {
    if (!message || message.kind === 'error') return;
    const t = window.setTimeout(() => useSessionStore.getState().clearMessage(), 4000);
    return () => window.clearTimeout(t);
  }, [message]);
  return (
    <div className="message-area" aria-live="polite">
      {busy && <div className="message busy" data-testid="busy">{busy}</div>}
      {message && (
        <div className={`message ${message.kind}`} role={message.kind === 'error' ? 'alert' : 'status'} data-testid={`message-${message.kind}`}>
          <span>{message.text}</span>
          <button type="button" aria-label="Dismiss" onClick={() => useSessionStore.getState().clearMessage()}>×</button>
        </div>
      )}
    </div>
  );
}
