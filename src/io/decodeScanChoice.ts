// A question to the user while opening a file: which page of a multi-page TIFF, or which page of a PDF
// and at what resolution. The decoder asks and awaits; the page dialog (panels/ScanPageDialog) answers.
import { create } from 'zustand';
import type { TiffPageInfo } from './decodeTiffPixels';

export type ScanChoiceRequest =
  | { kind: 'tiff'; fileName: string; pages: TiffPageInfo[] }
  | {
      kind: 'pdf';
      fileName: string;
      pageCount: number;
      /** Page size in PDF points (1/72 inch), page numbers from 1. */
      pageSize: (page: number) => Promise<{ widthPt: number; heightPt: number }>;
    };

/** The answer: a 0-based page (TIFF: the directory index) and, for a PDF, dots per inch; null = cancelled. */
export type ScanChoice = { page: number; dpi?: number } | null;

interface ScanChoiceState {
  request: ScanChoiceRequest | null;
  answer: (choice: ScanChoice) => void;
}

export const useScanChoiceStore = create<ScanChoiceState>()(() => ({ request: null, answer: () => {} }));

/** Shows the page dialog and resolves with the user's choice (null if they cancel). */
export function requestScanChoice(request: ScanChoiceRequest): Promise<ScanChoice> {
  useScanChoiceStore.getState().answer(null);
  return new Promise((resolve) => {
    useScanChoiceStore.setState({
      request,
      answer: (choice) => {
        useScanChoiceStore.setState({ request: null, answer: () => {} });
        resolve(choice);
      },
    });
  });
}
