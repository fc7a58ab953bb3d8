// What the file menu shows about work kept in this browser: last autosave, a restored session, a quota problem.
import { create } from 'zustand';

export interface AutosaveStatus {
  /** ISO time of the last successful autosave, or null. */
  lastSavedAt: string | null;
  /** Document revision of the last successful autosave (the state on screen is kept when it equals the store's revision). */
  keptRevision: number | null;
  /** ISO time of the session restored at start-up, while its banner is shown. */
  restoredFrom: string | null;
  /** True after the browser refused to store more (quota): the banner offers a download. */
  quotaFull: boolean;
  /** Another write error (message), shown once. */
  failure: string | null;
  /** Why the kept work could not be restored at start-up and was set aside (the banner offers it as a download), or null. */
  keptAside: string | null;
}

export const useAutosaveStatus = create<AutosaveStatus>()(() => ({ lastSavedAt: null, keptRevision: null, restoredFrom: null, quotaFull: false, failure: null, keptAside: null }));
