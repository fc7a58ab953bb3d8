// Opens a scan file chosen, dropped or pasted by the user. A bad file leaves the project unchanged.
import { setScan } from '../core/model/commands/setScan';
import { decodeScan } from '../io/decodeScan';
import { useDocStore } from './docStore';
import { putScan } from './scanCache';
import { requestScanChoice } from './scanChoiceStore';
import { useSessionStore } from './sessionStore';

let scanCounter = 0;
let opening = false;

/** Decodes the file and, if it is a usable scan, puts it in the open project and fits the view to it. */
export async function openScanFile(file: File): Promise<boolean> {
  const session = useSessionStore.getState();
  if (opening) {
    session.showMessage('info', `Still opening the previous file; try ${file.name} again in a moment.`);
    return false;
  }
  opening = true;
  session.setBusy(`Opening ${file.name} …`);
  try {
    const result = await decodeScan(file, requestScanChoice);
    if (!result.ok) {
      session.showMessage(result.cancelled ? 'info' : 'error', result.message);
      return false;
    }
    const id = `scan-${Date.now().toString(36)}-${++scanCounter}`;
    // Shown at once from its bitmap; its reduced views for zooming out are made afterwards (scanTilesPyramid).
    putScan(id, { bitmap: result.bitmap, bytes: file });
    useDocStore.getState().apply((doc) =>
      setScan(doc, {
        id,
        name: file.name,
        widthPx: result.widthPx,
        heightPx: result.heightPx,
        type: result.mime,
        ...(result.page !== undefined && (result.pageCount ?? 1) > 1 ? { page: result.page } : {}),
        ...(result.kind === 'pdf' ? { page: result.page ?? 0 } : {}),
      }),
    );
    session.fitTo({ u0: 0, v0: 0, width: result.widthPx, height: result.heightPx, margin: 24 });
    const where = result.pageCount && result.pageCount > 1 ? `, page ${(result.page ?? 0) + 1} of ${result.pageCount}` : '';
    const dpi = result.dpi ? ` at ${result.dpi} dpi` : '';
    session.showMessage('info', `Opened ${file.name}${where}${dpi} (${result.widthPx} × ${result.heightPx} px).`);
    return true;
  } finally {
    opening = false;
    session.setBusy(null);
  }
}

/** Returns the image file on the clipboard of a paste event (named for the user), or null. */
export function scanFileFromClipboard(data: DataTransfer | null): File | null {
  if (!data) return null;
  const fromFiles = Array.from(data.files ?? []).find((f) => f.type.startsWith('image/') || f.type === 'application/pdf');
  const fromItems = Array.from(data.items ?? []).find((i) => i.kind === 'file' && (i.type.startsWith('image/') || i.type === 'application/pdf'))?.getAsFile();
  const file = fromFiles ?? fromItems ?? null;
  if (!file) return null;
  const ext = file.type.split('/')[1]?.replace('jpeg', 'jpg') ?? 'png';
  const generic = !file.name || /^image\.\w+$/i.test(file.name);
  return generic ? new File([file], `pasted image.${ext}`, { type: file.type }) : file;
}
