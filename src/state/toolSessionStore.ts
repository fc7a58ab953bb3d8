// What the panes need to know about the active tool's session: which calibration pick is armed, which
// calibration value field to focus, the tool's state name (for hints and tests), whether the key help
// is open and whether the view is held or dragged to pan. The section view (canvas/toolDispatch) and the
// page's keys (app/useKeys) write it; the panes read and set it.
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
  /** Space is held with the section view's keys: a drag pans (app/useKeys sets it, the section view reads it). */
  spaceHeld: boolean;
  /** The section view is being panned by a drag (Space or the middle button). */
  panning: boolean;
  /** Whether drawing clicks follow the drawn line on the scan (Alt-click does the opposite for one click). */
  followLine: boolean;
  setFollowLine: (follow: boolean) => void;
  setCalibrationPick: (pick: CalibrationPick) => void;
  setHelpOpen: (open: boolean) => void;
  setSpaceHeld: (held: boolean) => void;
  setPanning: (panning: boolean) => void;
}

export const useToolSession = create<ToolSession>()((set) => ({
  calibrationPick: 'points',
  focusRef: null,
  stateName: 'idle',
  helpOpen: false,
  spaceHeld: false,
  panning: false,
  followLine: true,
  setFollowLine: (followLine) => set({ followLine }),
  setCalibrationPick: (calibrationPick) => set({ calibrationPick }),
  setHelpOpen: (helpOpen) => set({ helpOpen }),
  setSpaceHeld: (spaceHeld) => set({ spaceHeld }),
  setPanning: (panning) => set({ panning }),
}));
