// The file menu's project actions: open (project or section file), save, new. A file that cannot
// be opened leaves the open project exactly as it was.
import { emptyProjectDoc, type ProjectDoc, type ScanRef } from '../core/model/projectDoc';
import { downloadFile, safeFileName } from '../io/downloadFile';
import { fileTooLargeMessage } from '../core/model/limits';
import { MAX_PROJECT_FILE_BYTES, SCAN_NOT_STORED_MARK, serializeProject, type ScanBytes } from '../io/projectFile';
import { readProjectFile, type OpenProgress } from '../io/readProjectFile';
import { yieldToPage } from '../io/fileWorker';
import { reopenScan } from '../io/reopenScan';
import { fitCalibration } from '../core/calibration/fitCalibration';
import { lineToSection } from '../core/calibration/lineToSection';
import { pointsBox } from '../core/geometry/pointsBox';
import { useDocStore } from './docStore';
import { selectAnalysis } from './selectors';
import { getScan, putScan, type CachedScan } from './scanCache';
import { useSessionStore } from './sessionStore';

/** Vertices converted and measured in one task while a file opens: a few milliseconds of work. */
const MEASURED_PER_TASK = 150_000;

/** Said after the reason a saved scan is not shown (reopenSavedScan). */
export const SCAN_NOT_SHOWN_WORDS = 'The scan is not shown; the horizons, calibration, pins and regionals are unchanged (they are kept in scan pixels) and the scan stays in the project. To see it behind the lines, open the image they were digitised on again (Open scan…) at the same page and resolution.';

/** Fits the view to the scan, or to the drawn lines when there is no scan. */
export function fitViewToDoc(doc: ProjectDoc): void {
  const { fitTo } = useSessionStore.getState();
  if (doc.scan) {
    fitTo({ u0: 0, v0: 0, width: doc.scan.widthPx, height: doc.scan.heightPx, margin: 24 });
    return;
  }
  // The box of every vertex (each line's box remembered: opening a file measures them a line a task beforehand).
  let [u0, v0, u1, v1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const h of doc.horizons) {
    const [a, b, c, d] = pointsBox(h.pointsPx);
    u0 = Math.min(u0, a);
    v0 = Math.min(v0, b);
    u1 = Math.max(u1, c);
    v1 = Math.max(v1, d);
  }
  // Nothing to frame: the view is no longer fitted to what was open before (a resize must not frame it again).
  if (u0 > u1) {
    useSessionStore.setState({ fitted: null });
    return;
  }
  fitTo({ u0, v0, width: u1 - u0 + 1, height: v1 - v0 + 1, margin: 48 });
}

/**
 * Returns the notes to show after opening: a file without its scan whose scan is still open in this
 * browser (same scan id in the cache) is shown with it, so say that instead of "open the image again".
 */
export function openNotes(notes: string[], doc: ProjectDoc, scanInFile: boolean): string[] {
  if (!doc.scan || scanInFile || !getScan(doc.scan.id)?.bitmap) return notes;
  const name = doc.scan.name;
  return notes.map((n) => (n.includes(SCAN_NOT_STORED_MARK) ? `The file has no scan; showing "${name}", still open in this browser (save again to store it in the file).` : n));
}

/**
 * Returns the saved scan of a document ready for the scan cache, decoded at the page and size its lines were
 * digitised at without asking anything (io/reopenScan); or, when it decodes to another size, its bytes kept but
 * not shown, with the message to give (`notShown`); or why it cannot be decoded at all.
 *
 * Kept but not shown, rather than refused or shown: the horizons, calibration, pins and regionals are in scan
 * pixels and the results stand without the image, so a geologist keeps the work (refusing would lock it away,
 * and at start-up the demo would take its place); drawn over a scan of another size, every line would sit on the
 * wrong rock. The bytes stay, so saving the project again loses nothing.
 */
export async function reopenSavedScan(bytes: Blob, scan: ScanRef): Promise<{ ok: true; cached: CachedScan; notShown: string | null } | { ok: false; message: string }> {
  const reopened = await reopenScan(bytes, scan);
  if (reopened.ok) return { ok: true, cached: { bitmap: reopened.bitmap, bytes }, notShown: null };
  if (!reopened.decodedPx) return { ok: false, message: reopened.message };
  return { ok: true, cached: { bitmap: null, bytes, notShown: reopened.message }, notShown: `${reopened.message} ${SCAN_NOT_SHOWN_WORDS}` };
}

/** Returns true when there are no unsaved changes or the user agrees to discard them (asked with the question). */
export function unsavedChangesMayGo(question: string): boolean {
  const { revision, savedRevision } = useDocStore.getState();
  return revision === savedRevision || window.confirm(question);
}

/** Returns the words for how far opening a file has got. */
function openingStage(p: OpenProgress): string {
  if (p.stage === 'reading') return 'reading';
  if (p.stage === 'checking') return 'checking';
  return `lines ${Math.round(100 * p.fraction)} %`;
}

/**
 * Reads, checks and opens a project or section file; returns false (with a message) and changes nothing when it cannot.
 * With unsaved changes it asks before anything is replaced: once the file is known to open (a bad file only gets its
 * message), and before the scan cache is touched, so "Cancel" leaves the project, history and scan as they were.
 */
export async function openProjectFile(file: File): Promise<boolean> {
  const session = useSessionStore.getState();
  if (file.size > MAX_PROJECT_FILE_BYTES) {
    // Refused before a byte is read, in the words the command line uses.
    session.showMessage('error', `${file.name} cannot be opened: ${fileTooLargeMessage(file.size, MAX_PROJECT_FILE_BYTES)}. Nothing was changed.`);
    return false;
  }
  session.setBusy(`Opening ${file.name} …`);
  try {
    // Read, checked and converted off the main thread, the lines unpacked a few a task (io/readProjectFile).
    const opened = await readProjectFile(file, file.name, (p) => session.setBusy(`Opening ${file.name} … ${openingStage(p)}`));
    if (opened === 'unreadable') {
      session.showMessage('error', `${file.name} could not be read from the disk.`);
      return false;
    }
    if (!opened.ok) {
      session.showMessage('error', opened.message);
      return false;
    }
    const { doc, scan } = opened;
    let decodedScan: CachedScan | null = null;
    let notShown: string | null = null;
    if (scan && doc.scan) {
      const blob = new Blob([scan.bytes as Uint8Array<ArrayBuffer>], { type: scan.type });
      const reopened = await reopenSavedScan(blob, doc.scan);
      if (!reopened.ok) {
        session.showMessage('error', `${file.name}: the scan stored in it cannot be shown (${reopened.message}). Nothing was changed.`);
        return false;
      }
      decodedScan = reopened.cached;
      notShown = reopened.notShown;
    }
    // Asked now, not before reading: the changes still stand at this moment (the read and decode take time).
    if (!unsavedChangesMayGo(`Discard the changes not saved to a file and open ${file.name}?`)) {
      decodedScan?.bitmap?.close();
      return false;
    }
    if (decodedScan && doc.scan) putScan(doc.scan.id, decodedScan);
    // The first analysis of a big document takes a few hundred milliseconds: it runs in a task of its own before
    // the document is drawn (the views then read the remembered result), not inside the drawing's task.
    session.setBusy(`Opening ${file.name} … measuring`);
    // Each line is first converted to section units and measured for the framing, about MEASURED_PER_TASK vertices
    // a task (both remembered per line: lineToSection, pointsBox), so neither the analysis nor the drawing's task
    // reads a million vertices again; small lines share a task (a task each waited longer than its work).
    const cal = doc.calibration ? fitCalibration(doc.calibration) : null;
    let measured = 0;
    const lines = [...doc.faults.map((f) => ({ pointsPx: f.pointsPx, framed: false })), ...doc.horizons.map((h) => ({ pointsPx: h.pointsPx, framed: true }))];
    await yieldToPage();
    for (const { pointsPx, framed } of lines) {
      if (measured > 0 && measured + pointsPx.length > MEASURED_PER_TASK) {
        await yieldToPage();
        measured = 0;
      }
      measured += pointsPx.length;
      if (cal?.ok) lineToSection(cal.fit, pointsPx);
      // Without a scan the view is framed on the horizons (fitViewToDoc).
      if (framed && !doc.scan) pointsBox(pointsPx);
    }
    await yieldToPage();
    selectAnalysis(doc);
    await yieldToPage();
    useDocStore.getState().replace(doc);
    fitViewToDoc(doc);
    const said = [`Opened ${file.name}.`, ...openNotes(opened.notes, doc, Boolean(scan))];
    // A scan not shown is an error to read, not a note that fades: it stays until dismissed.
    if (notShown) session.showMessage('error', [...said, notShown].join(' '));
    else session.showMessage('info', said.join(' '));
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
  const doc = emptyProjectDoc();
  useDocStore.getState().replace(doc);
  fitViewToDoc(doc);
}

