// The busy message of an export follows its steps at most once an interval: the first step at once, the newest
// held step when the interval ends, nothing after stop. Timers are Vitest's fake ones: no real time passes.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { busyProgress } from '../../src/state/busyProgress';

describe('busyProgress', () => {
  beforeEach(() => { vi.useFakeTimers(); });
  afterEach(() => { vi.useRealTimers(); });

  it('shows the first step at once and the newest held step when the interval ends', () => {
    const shown: string[] = [];
    const { say } = busyProgress((text) => shown.push(text), 200);
    say('figure', { done: 0 });
    say('scan', { done: 0.4 });
    say('labels', { done: 0.6 });
    expect(shown).toEqual(['figure']);
    vi.advanceTimersByTime(199);
    expect(shown).toEqual(['figure']);
    vi.advanceTimersByTime(1);
    expect(shown).toEqual(['figure', 'labels']);
    // Nothing held: the interval ends quietly, and the next step is shown at once.
    vi.advanceTimersByTime(200);
    say('encoding', { done: 0.8 });
    expect(shown).toEqual(['figure', 'labels', 'encoding']);
  });

  it('passes each shown step its share done and its cancel', () => {
    const cancel = () => undefined;
    const shown: [string, unknown][] = [];
    const { say } = busyProgress((text, work) => shown.push([text, work]), 200);
    say('figure', { done: 0, cancel });
    say('scan', { done: 0.4, cancel });
    vi.advanceTimersByTime(200);
    expect(shown).toEqual([['figure', { done: 0, cancel }], ['scan', { done: 0.4, cancel }]]);
  });

  it('shows nothing more after stop, even a step it held', () => {
    const shown: string[] = [];
    const { say, stop } = busyProgress((text) => shown.push(text), 200);
    say('figure', {});
    say('encoding', {});
    stop();
    vi.advanceTimersByTime(1000);
    expect(shown).toEqual(['figure']);
    expect(vi.getTimerCount()).toBe(0);
  });
});
