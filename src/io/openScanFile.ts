// Opens a scan file chosen, dropped or pasted by the user. A bad file leaves the project unchanged.
import { setScan } from '../core/model/commands/setScan';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { putScan } from '../state/scanCache';
import { fitCamera } from '../state/camera';
import { decodeScan } from './decodeScan';

let scanCounter = 0;

/** Decodes the file and, if it is a usable scan, puts it in the open project and fits the view to it. */
export async function openScanFile(file: File): Promise<boolean> {
  const session = useSessionStore.getState();
  session.setBusy(`Opening ${file.name} …`);
  try {
    const result = await decodeScan(file);
    if (!result.ok) {
      session.showMessage('error', result.message);
      return false;
    }
    const id = `scan-${Date.now().toString(36)}-${++scanCounter}`;
    putScan(id, { bitmap: result.bitmap, bytes: file });
    useDocStore.getState().apply((doc) =>
      setScan(doc, { id, name: file.name, widthPx: result.widthPx, heightPx: result.heightPx, type: result.mime }),
    );
    const { viewport } = useSessionStore.getState();
    session.setCamera(fitCamera(result.widthPx, result.heightPx, viewport.width, viewport.height));
    session.showMessage('info', `Opened ${file.name} (${result.widthPx} × ${result.heightPx} px).`);
    return true;
  } finally {
    session.setBusy(null);
  }
}
