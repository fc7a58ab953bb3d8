// A question to the user while opening a file: which page of a multi-page TIFF, or which page of a PDF
// and at what resolution. The decoders ask through the function they are given (the app passes
// state/scanChoiceStore's requestScanChoice, which the page dialog answers); io holds no store itself.
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

/** Asks the user the question and resolves with the answer (null if they cancel). */
export type AskScanChoice = (request: ScanChoiceRequest) => Promise<ScanChoice>;
