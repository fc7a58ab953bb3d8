// Reopens the scan of a saved project (a project file, or the work kept in this browser). Its lines were
// digitised in the scan's pixels, so it must come back at the same page and pixel size: the saved page and
// size go to the decoder and nothing is asked. A scan that still decodes to another size is not paired with
// the lines: the caller gets a message saying what differs.
import type { ScanRef } from '../core/model/projectDoc';
import { decodeScan } from './decodeScan';
import type { AskScanChoice } from './decodeScanChoice';

export type ReopenedScan =
  | { ok: true; bitmap: ImageBitmap }
  /** `decodedPx`: it decoded, but to this size rather than the saved one; null: it did not decode. */
  | { ok: false; message: string; decodedPx: { widthPx: number; heightPx: number } | null };

/** Reopening knows the page and size, so the decoders are not to ask; one that did would get "cancelled". */
const askNothing: AskScanChoice = async () => null;

/** Returns the saved scan decoded from its bytes at the saved page and size, or a message when it cannot be shown under the lines. */
export async function reopenScan(bytes: Blob, scan: ScanRef): Promise<ReopenedScan> {
  const file = Object.assign(new Blob([bytes], { type: bytes.type || scan.type }), { name: scan.name });
  const decoded = await decodeScan(file, askNothing, { page: scan.page, widthPx: scan.widthPx, heightPx: scan.heightPx });
  if (!decoded.ok) return { ok: false, message: decoded.message, decodedPx: null };
  if (decoded.widthPx === scan.widthPx && decoded.heightPx === scan.heightPx) return { ok: true, bitmap: decoded.bitmap };
  decoded.bitmap.close();
  const page = scan.page !== undefined ? ` (page ${scan.page + 1})` : '';
  return {
    ok: false,
    decodedPx: { widthPx: decoded.widthPx, heightPx: decoded.heightPx },
    message: `The scan "${scan.name}"${page} now opens at ${decoded.widthPx} × ${decoded.heightPx} px, but the lines were digitised on it at ${scan.widthPx} × ${scan.heightPx} px, so they would not line up with it.`,
  };
}
