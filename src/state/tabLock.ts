// One tab edits the work kept in this browser at a time. The editing tab holds a Web Lock for as long as it
// is open; a tab that opens while another holds it shows the kept work read-only and says so, offering to
// take over. Taking over asks the editing tab (BroadcastChannel) to write what it has and let go; only then
// does the new tab read the kept work and start editing. So neither tab writes over the other's newer work
// without the user having chosen it. A read-only tab also waits in the lock's queue: when the editing tab closes
// (the browser lets its lock go with the page), the first tab in the queue reads the work that tab kept last and
// edits from then on, and says so. The lock is held by one tab at a time, so two tabs never edit at once.
// Browsers without Web Locks edit as before (there is no way to know).
import { create } from 'zustand';
import { useDocStore } from './docStore';

const LOCK = 'foldroot-editing';
const CHANNEL = 'foldroot-tabs';

export type TabRole = 'starting' | 'editing' | 'read-only';

export interface TabState {
  role: TabRole;
  /** Why this tab is read-only: another tab had the work open at start-up, or took it over later. */
  why: 'other-tab' | 'taken-over' | null;
  /** In a read-only tab: when the work now shown was kept by the editing tab (ISO time), or null before the first. */
  shownKeptAt: string | null;
  /** Said once this tab took over editing on its own, because the editing tab closed (until dismissed). */
  notice: string | null;
}

export const useTabStore = create<TabState>()(() => ({ role: 'starting', why: null, shownKeptAt: null, notice: null }));

/** What a tab says when it took over editing because the editing tab closed. */
export const OTHER_TAB_CLOSED = 'The other tab closed; this tab edits now. It has loaded the work that tab kept last.';

function setRole(role: TabRole, why: TabState['why']): void {
  useTabStore.setState({ role, why, shownKeptAt: null });
  useDocStore.setState({ readOnly: role === 'read-only' });
}

let release: (() => void) | null = null;
let channel: BroadcastChannel | null = null;
/** What the editing tab does before letting go (write its pending changes). */
let beforeRelease: () => Promise<void> = async () => undefined;
/** What a read-only tab does when the editing tab says it kept a change (read the kept work and show it). */
let onOtherTabKept: () => Promise<void> = async () => undefined;
/** What a tab does when it gets the lock after being read-only (read the work the editing tab kept last). */
let reloadKept: () => Promise<void> = async () => undefined;
/** Resolves once this read-only tab has the lock, has reloaded the kept work and edits (null: not waiting). */
let handover: Promise<void> | null = null;
/** This tab asked for the lock ("Edit here instead"), rather than getting it because the editing tab closed. */
let asked = false;

function locks(): LockManager | null {
  return typeof navigator !== 'undefined' && navigator.locks ? navigator.locks : null;
}

function hold(): Promise<void> {
  return new Promise<void>((resolve) => {
    release = resolve;
  });
}

function listen(): void {
  if (channel || typeof BroadcastChannel === 'undefined') return;
  channel = new BroadcastChannel(CHANNEL);
  channel.onmessage = (e: MessageEvent<{ type?: string }>) => {
    // The editing tab kept a change: a read-only tab shows it (never the other way round).
    if (e.data?.type === 'kept' && useTabStore.getState().role === 'read-only') {
      void onOtherTabKept();
      return;
    }
    if (e.data?.type !== 'take-over' || useTabStore.getState().role !== 'editing') return;
    void (async () => {
      // Its last changes are written first, so that the tab taking over reads them.
      await beforeRelease();
      setRole('read-only', 'taken-over');
      release?.();
      release = null;
      void waitToEdit();
    })();
  };
}

/**
 * Queues this read-only tab for the lock (once): when it comes (the editing tab closed, or let go when asked),
 * the kept work is read first, then this tab edits. Resolves then.
 */
function waitToEdit(): Promise<void> {
  const lm = locks();
  if (!lm) return Promise.resolve();
  handover ??= new Promise<void>((resolve) => {
    void lm.request(LOCK, () => {
      void (async () => {
        const closed = !asked;
        asked = false;
        try {
          await reloadKept();
        } finally {
          setRole('editing', null);
          if (closed) useTabStore.setState({ notice: OTHER_TAB_CLOSED });
          handover = null;
          resolve();
        }
      })();
      return hold();
    });
  });
  return handover;
}

/** Tells the other tabs that this (editing) tab has just kept a change in the browser, so a read-only tab can show it. */
export function announceKept(): void {
  if (useTabStore.getState().role === 'editing') channel?.postMessage({ type: 'kept' });
}

/**
 * Tries to become the editing tab without waiting; returns the role this tab has. `flush` writes pending changes
 * before another tab takes over; `follow` shows the work kept by the editing tab while this one is read-only;
 * `reload` reads the kept work when this tab takes over (when asked, or on its own once the editing tab closes).
 */
export async function claimEditing(flush: () => Promise<void>, follow: () => Promise<void> = async () => undefined, reload: () => Promise<void> = async () => undefined): Promise<TabRole> {
  beforeRelease = flush;
  onOtherTabKept = follow;
  reloadKept = reload;
  listen();
  const lm = locks();
  if (!lm) {
    setRole('editing', null);
    return 'editing';
  }
  const got = await new Promise<boolean>((resolve) => {
    void lm.request(LOCK, { ifAvailable: true }, (lock) => {
      resolve(lock !== null);
      return lock ? hold() : undefined;
    });
  });
  if (got) setRole('editing', null);
  else {
    setRole('read-only', 'other-tab');
    void waitToEdit();
  }
  return got ? 'editing' : 'read-only';
}

/** Asks the editing tab to write its work and let go, and resolves once this tab has the lock, has read the kept work and edits. */
export async function takeOverEditing(): Promise<void> {
  if (!locks() || useTabStore.getState().role !== 'read-only') return;
  listen();
  asked = true;
  const done = waitToEdit();
  channel?.postMessage({ type: 'take-over' });
  await done;
}
