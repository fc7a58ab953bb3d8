// The busy message of a long piece of work that reports many short steps: the first is shown at once, later ones
// at most once an interval (the newest when the interval ends). Each shown step renders the message bar and makes a
// frame of the whole page; an export's steps of a few milliseconds each were costing the page more than the steps.

/** What a busy message shows: its text, and the share done and a cancel (state/sessionStore setBusy). */
type BusyWork = { done?: number | null; cancel?: (() => void) | null };

/** Returns `say`, which shows a step through `show` at most once per `intervalMs`, and `stop`, which drops a step still held. */
export function busyProgress(show: (text: string, work: BusyWork) => void, intervalMs = 200): { say: (text: string, work: BusyWork) => void; stop: () => void } {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let held: [string, BusyWork] | null = null;
  const say = (text: string, work: BusyWork): void => {
    if (timer !== null) {
      held = [text, work];
      return;
    }
    show(text, work);
    timer = setTimeout(() => {
      timer = null;
      const next = held;
      held = null;
      if (next) say(next[0], next[1]);
    }, intervalMs);
  };
  const stop = (): void => {
    if (timer !== null) clearTimeout(timer);
    timer = null;
    held = null;
  };
  return { say, stop };
}
