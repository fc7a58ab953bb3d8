// The file menu's project actions: open (project or section file), save, new. A file that cannot
// be opened leaves the open project exactly as it was.
import { emptyProjectDoc, type ProjectDoc } from '../core/model/projectDoc';
import { decodeScan } from '../io/decodeScan';
import { downloadFile, safeFileName } from '../io/downloadFile';
import { MAX_PROJECT_FILE_BYTES, parseProjectText, SCAN_NOT_STORED_MARK, serializeProject, type ScanBytes } from '../io/projectFile';
import { useDocStore } from './docStore';
import { getScan, putScan, type CachedScan } from './scanCache';
import { requestScanChoice } from './scanChoiceStore';
import { useSessionStore } from './sessionStore';

/** Fits the view to the scan, or to the drawn lines when there is no scan. */
export function fitViewToDoc(doc: ProjectDoc): void {
  const { fitTo } = useSessionStore.getState();
  if (doc.scan) {
    fitTo({ u0: 0, v0: 0, width: doc.scan.widthPx, height: doc.scan.heightPx, margin: 24 });
    return;
  }
  const all = doc.horizons.flatMap((h) => h.pointsPx);
  if (all.length === 0) return;
  const us = all.map((p) => p[0]), vs = all.map((p) => p[1]);
  const [u0, v0] = [Math.min(...us), Math.min(...vs)];
  fitTo({ u0, v0, width: Math.max(...us) - u0 + 1, height: Math.max(...vs) - v0 + 1, margin: 48 });
}

/**
 * Returns the notes to show after opening: a file without its scan whose scan is still open in this
 * browser (same scan id in the cache) is shown with it, so say that instead of "open the image again".
 */
export function openNotes(notes: string[], doc: ProjectDoc, scanInFile: boolean): string[] {
  if (!doc.scan || scanInFile || !getScan(doc.scan.id)) return notes;
  const name = doc.scan.name;
  return notes.map((n) => (n.includes(SCAN_NOT_STORED_MARK) ? `The file has no scan; showing "${name}", still open in this browser (save again to store it in the file).` : n));
}

/** Returns true when there are no unsaved changes or the user agrees to discard them (asked with the question). */
export function unsavedChangesMayGo(question: string): boolean {
  const { revision, savedRevision } = useDocStore.getState();
  return revision === savedRevision || window.confirm(question);
}

/**
 * Reads, checks and opens a project or section file; returns false (with a message) and changes nothing when it cannot.
 * With unsaved changes it asks before anything is replaced: once the file is known to open (a bad file only gets its
 * message), and before the scan cache is touched, so "Cancel" leaves the project, history and scan as they were.
 */
export async function openProjectFile(file: File): Promise<boolean> {
  const session = useSessionStore.getState();
  if (file.size > MAX_PROJECT_FILE_BYTES) {
    session.showMessage('error', `${file.name} is ${(file.size / 1048576).toFixed(0)} MB; the largest project file opened is ${MAX_PROJECT_FILE_BYTES / 1048576} MB.`);
    return false;
  }
  session.setBusy(`Opening ${file.name} …`);
  try {
    let text: string;
    try {
      text = await file.text();
    } catch {
      session.showMessage('error', `${file.name} could not be read from the disk.`);
      return false;
    }
    const opened = parseProjectText(text, file.name);
    if (!opened.ok) {
      session.showMessage('error', opened.message);
      return false;
    }
    const { doc, scan } = opened;
    let decodedScan: CachedScan | null = null;
    if (scan && doc.scan) {
      const blob = new Blob([scan.bytes as Uint8Array<ArrayBuffer>], { type: scan.type });
      const decoded = await decodeScan(Object.assign(blob, { name: scan.name }), requestScanChoice);
      if (!decoded.ok) {
        session.showMessage('error', `${file.name}: the scan stored in it cannot be shown (${decoded.message}). Nothing was changed.`);
        return false;
      }
      decodedScan = { bitmap: decoded.bitmap, bytes: blob };
    }
    // Asked now, not before reading: the changes still stand at this moment (the read and decode take time).
    if (!unsavedChangesMayGo(`Discard the changes not saved to a file and open ${file.name}?`)) {
      decodedScan?.bitmap.close();
      return false;
    }
    if (decodedScan && doc.scan) putScan(doc.scan.id, decodedScan);
    useDocStore.getState().replace(doc);
    fitViewToDoc(doc);
    session.showMessage('info', [`Opened ${file.name}.`, ...openNotes(opened.notes, doc, Boolean(scan))].join(' '));
    return true;
  } finally {
    session.setBusy(null);
  }
}

/** Returns the scan's original bytes for the document, or null. */
export async function scanBytesOf(doc: ProjectDoc): Promise<ScanBytes | null> {
  const cached = getScan(doc.scan?.id);
  if (!doc.scan || !cached) return null;
  return { type: doc.scan.type, name: doc.scan.name, bytes: new Uint8Array(await cached.bytes.arrayBuffer()) };
}

/** Downloads the project file (document and scan) and marks the document saved. */
export async function saveProjectFile(): Promise<void> {
  const { doc, revision } = useDocStore.getState();
  const text = serializeProject(doc, await scanBytesOf(doc));
  downloadFile(new Blob([text], { type: 'application/json' }), safeFileName(doc.title, '.foldroot.json'));
  if (useDocStore.getState().revision === revision) useDocStore.getState().markSaved();
}

/** Opens an empty project, asking first when there are unsaved changes. */
export function newProject(): void {
  if (!unsavedChangesMayGo('Discard the changes not saved to a file and start a new project?')) return;
  useDocStore.getState().replace(emptyProjectDoc());
}
