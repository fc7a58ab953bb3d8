// The session's messages: one shown at a time, and the last one kept after it is taken down (the message area
// carries it for checks that must not race the fade of an information message).
import { describe, expect, it } from 'vitest';
import { useSessionStore } from '../../src/state/sessionStore';

describe('sessionStore messages', () => {
  it('keeps the last message shown after it is cleared, and replaces it with the next one', () => {
    const s = useSessionStore.getState;
    s().showMessage('info', 'Opened a.json.');
    expect(s().message).toMatchObject({ kind: 'info', text: 'Opened a.json.' });
    s().clearMessage();
    expect(s().message).toBeNull();
    expect(s().lastMessage).toMatchObject({ kind: 'info', text: 'Opened a.json.' });
    s().showMessage('error', 'b.json is not valid JSON');
    expect(s().lastMessage).toMatchObject({ kind: 'error', text: 'b.json is not valid JSON' });
    expect(s().lastMessage).toBe(s().message);
  });
});
