// Calibration, horizons, pins and regionals (section workspace).
export function WorkspacePanel() {
  return null;
}
