// What the panes need to know about the active tool's session: which calibration pick is armed, which
// calibration value field to focus, the tool's state name (for hints and tests) and whether the key help
// is open. The section view (canvas/toolDispatch) writes it; the panes read and set it.
import { create } from 'zustand';
import type { CalibrationPointRef } from '../core/model/commands/calibrationPointRef';
import type { CalibrationPick } from '../tools/toolTypes';

export interface ToolSession {
  calibrationPick: CalibrationPick;
  /** The calibration point whose value field the panel should focus, with a counter to refocus. */
  focusRef: { ref: CalibrationPointRef; n: number } | null;
  /** Name of the active tool's state (idle, placing, dragging …), for hints and tests. */
  stateName: string;
  helpOpen: boolean;
  /** Whether drawing clicks follow the drawn line on the scan (Alt-click does the opposite for one click). */
  followLine: boolean;
  setFollowLine: (follow: boolean) => void;
  setCalibrationPick: (pick: CalibrationPick) => void;
  setHelpOpen: (open: boolean) => void;
}

export const useToolSession = create<ToolSession>()((set) => ({
  calibrationPick: 'points',
  focusRef: null,
  stateName: 'idle',
  helpOpen: false,
  followLine: true,
  setFollowLine: (followLine) => set({ followLine }),
  setCalibrationPick: (calibrationPick) => set({ calibrationPick }),
  setHelpOpen: (helpOpen) => set({ helpOpen }),
}));
