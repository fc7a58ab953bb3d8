// The open question of a scan decoder (io/decodeScanChoice) while a file opens: the page dialog
// (panels/ScanPageDialog) shows the request and answers it.
import { create } from 'zustand';
import type { ScanChoice, ScanChoiceRequest } from '../io/decodeScanChoice';

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
