// Opening a scan and fitting the view: the first things a user does.
import { useRef, useSyncExternalStore } from 'react';
import { useDocStore } from '../state/docStore';
import { formatNumber, formatPercent } from '../format/formatQuantity';
import { getScan, scanCacheVersion, scanMemoryHeld, subscribeScans } from '../state/scanCache';
import { pyramidsVersion, subscribePyramids } from '../state/scanTilesPyramid';
import { useSessionStore } from '../state/sessionStore';
import { zoomAbout } from '../state/camera';
import { openScanFile } from '../state/openScanFile';
import { ScanPageDialog } from './ScanPageDialog';
import './scanControls.css';

const ACCEPT = 'image/png,image/jpeg,image/webp,image/tiff,application/pdf,.png,.jpg,.jpeg,.webp,.tif,.tiff,.pdf';

export function zoomToFit(): void {
  const scan = useDocStore.getState().doc.scan;
  if (scan) useSessionStore.getState().fitTo({ u0: 0, v0: 0, width: scan.widthPx, height: scan.heightPx, margin: 24 });
}

export function zoomByStep(factor: number): void {
  const { viewport, camera, setCamera } = useSessionStore.getState();
  setCamera(zoomAbout(camera, viewport.width / 2, viewport.height / 2, factor));
}

/** Shows the scan at one image pixel per screen pixel, keeping the view's centre where it is. */
export function zoomToActualSize(): void {
  const { camera } = useSessionStore.getState();
  zoomByStep(1 / camera.scale);
}

function setShowGrid(showGrid: boolean): void {
  useDocStore.getState().apply((doc) => (doc.settings.showGrid === showGrid ? doc : { ...doc, settings: { ...doc.settings, showGrid } }));
}

export function ScanControls() {
  const scan = useDocStore((s) => s.doc.scan);
  const showGrid = useDocStore((s) => s.doc.settings.showGrid);
  const calibrated = useDocStore((s) => s.doc.calibration !== null);
  const scale = useSessionStore((s) => s.camera.scale);
  useSyncExternalStore(subscribeScans, scanCacheVersion);
  useSyncExternalStore(subscribePyramids, pyramidsVersion);
  const notShown = getScan(scan?.id)?.notShown;
  const held = scanMemoryHeld();
  const mb = (bytes: number) => `${formatNumber(Math.round(bytes / 1048576))} MB`;
  const fileInput = useRef<HTMLInputElement>(null);
  return (
    <section className="panel-section" aria-label="Scan">
      <h2>Scan</h2>
      {/* A real button (reachable by Tab, Enter and Space) that opens the hidden file input's chooser. */}
      <button type="button" className="primary" data-testid="open-scan-button" onClick={() => fileInput.current?.click()}>Open scan…</button>
      <input
        ref={fileInput}
        type="file"
        data-testid="open-image"
        aria-label="Scan file"
        accept={ACCEPT}
        hidden
        tabIndex={-1}
        onChange={(e) => {
          const file = e.currentTarget.files?.[0];
          e.currentTarget.value = '';
          if (file) void openScanFile(file);
        }}
      />
      <p className="hint">PNG, JPEG, WebP, TIFF or a PDF page — or drop an image on the section view, or paste one (Ctrl+V)</p>
      {scan && (
        <p className="scan-name" data-testid="scan-name" title={scan.name}>
          {scan.name}{scan.page !== undefined ? ` (page ${scan.page + 1})` : ''} — {scan.widthPx} × {scan.heightPx} px
        </p>
      )}
      {scan && notShown && <p className="hint warn" data-testid="scan-not-shown">Not shown: {notShown}</p>}
      {scan && held.decoded > 0 && (
        <p className="hint" data-testid="scan-memory" data-decoded-scans={held.decoded} data-reduced-tiles={held.tiles} data-building={held.building ? 'yes' : 'no'} data-scratch-bytes={held.scratchBytes}>
          In this tab: {mb(held.fullBytes)} at full resolution, {mb(held.tileBytes)} of reduced views{held.building ? ' (making the reduced views for zooming out …)' : ''}
        </p>
      )}
      <div className="button-row">
        <button type="button" onClick={() => zoomByStep(1 / 1.25)} title="Zoom out (−)" aria-label="Zoom out">−</button>
        <span className="zoom-readout" data-testid="zoom-readout">{formatPercent(scale, 2)}</span>
        <button type="button" onClick={() => zoomByStep(1.25)} title="Zoom in (+)" aria-label="Zoom in">+</button>
        <button type="button" onClick={zoomToFit} title="Zoom to fit (F)" data-testid="zoom-fit">Fit</button>
        <button type="button" onClick={zoomToActualSize} title="Actual size: one scan pixel per screen pixel (1)" data-testid="zoom-actual">1:1</button>
      </div>
      <label className="scan-toggle" title={calibrated ? 'Grid lines in section units' : 'Calibrate the scan to see a grid in section units'}>
        <input type="checkbox" checked={showGrid} onChange={(e) => setShowGrid(e.currentTarget.checked)} data-testid="toggle-grid" />
        Grid{calibrated ? ' in section units' : ' (scan pixels until calibrated)'}
      </label>
      <ScanPageDialog />
    </section>
  );
}
