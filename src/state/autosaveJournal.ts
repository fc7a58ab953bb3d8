// The write-ahead of the kept work: the latest document written synchronously to localStorage as each
// edit lands, before the edit counts as kept. IndexedDB (autosaveDb) is written right after, but its
// transaction commits asynchronously, and a reload or navigation does not wait for it; a synchronous
// localStorage write is complete when setItem returns. At start-up the newer of the two comes back.
// localStorage holds about 5 million characters per origin in the common browsers (common practice), so
// only documents well under that are journalled; a larger one clears the journal, so an older journal
// never wins over a newer IndexedDB copy.
import type { ProjectDoc } from '../core/model/projectDoc';

const KEY = 'foldroot-write-ahead';
/** Largest journal written, in characters (a document of about 60,000 vertices). */
export const JOURNAL_MAX_CHARS = 1_500_000;

let lastStamp = 0;

/** Returns a stamp later than every earlier one of this page (milliseconds since 1970): the order of kept copies. */
export function nextStamp(): number {
  lastStamp = Math.max(Date.now(), lastStamp + 1);
  return lastStamp;
}

function vertexCount(doc: ProjectDoc): number {
  let n = 0;
  for (const h of doc.horizons) n += h.pointsPx.length;
  for (const s of doc.scenarios) for (const r of Object.values(s.regionals)) n += r.length;
  return n;
}

/** One journal entry: the document as it was when `stamp` was taken. */
export interface JournalEntry { stamp: number; savedAt: string; dirty: boolean; doc: unknown }

/** Writes the document to the journal now; returns false (and clears the journal) when it is too large or storage refuses it. */
export function writeJournal(doc: ProjectDoc, dirty: boolean, stamp: number): boolean {
  try {
    // A cheap bound first (a vertex takes at least ~12 characters as JSON) so that large documents are not stringified.
    if (vertexCount(doc) * 12 > JOURNAL_MAX_CHARS) return clearJournal();
    const text = JSON.stringify({ stamp, savedAt: new Date(stamp).toISOString(), dirty, doc });
    if (text.length > JOURNAL_MAX_CHARS) return clearJournal();
    localStorage.setItem(KEY, text);
    return true;
  } catch {
    return clearJournal();
  }
}

/** Returns the journal entry, or null when there is none or it cannot be read. */
export function readJournal(): JournalEntry | null {
  try {
    const text = localStorage.getItem(KEY);
    if (text === null) return null;
    const e = JSON.parse(text) as Partial<JournalEntry>;
    if (typeof e.stamp !== 'number' || typeof e.savedAt !== 'string' || typeof e.doc !== 'object') return null;
    return { stamp: e.stamp, savedAt: e.savedAt, dirty: e.dirty === true, doc: e.doc };
  } catch {
    return null;
  }
}

/** Removes the journal; returns false (for writeJournal's callers). */
export function clearJournal(): false {
  try {
    localStorage.removeItem(KEY);
  } catch {
    // No storage: nothing to clear.
  }
  return false;
}
