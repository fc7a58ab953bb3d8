// Opening a scan and fitting the view: the first things a user does.
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { fitCamera, zoomAbout } from '../state/camera';
import { openScanFile } from '../io/openScanFile';

export function zoomToFit(): void {
  const scan = useDocStore.getState().doc.scan;
  const { viewport, setCamera } = useSessionStore.getState();
  if (scan) setCamera(fitCamera(scan.widthPx, scan.heightPx, viewport.width, viewport.height));
}

export function zoomByStep(factor: number): void {
  const { viewport, camera, setCamera } = useSessionStore.getState();
  setCamera(zoomAbout(camera, viewport.width / 2, viewport.height / 2, factor));
}

export function ScanControls() {
  const scan = useDocStore((s) => s.doc.scan);
  const scale = useSessionStore((s) => s.camera.scale);
  return (
    <section className="panel-section" aria-label="Scan">
      <h2>Scan</h2>
      <label className="button primary">
        Open scan…
        <input
          type="file"
          data-testid="open-image"
          accept="image/png,image/jpeg,image/webp,.png,.jpg,.jpeg,.webp"
          hidden
          onChange={(e) => {
            const file = e.currentTarget.files?.[0];
            e.currentTarget.value = '';
            if (file) void openScanFile(file);
          }}
        />
      </label>
      <p className="hint">or drop an image on the section view</p>
      {scan && (
        <p className="scan-name" data-testid="scan-name" title={scan.name}>
          {scan.name} — {scan.widthPx} × {scan.heightPx} px
        </p>
      )}
      <div className="button-row">
        <button type="button" onClick={() => zoomByStep(1 / 1.25)} title="Zoom out (−)">−</button>
        <span className="zoom-readout" data-testid="zoom-readout">{(scale * 100).toFixed(scale < 0.1 ? 1 : 0)}%</span>
        <button type="button" onClick={() => zoomByStep(1.25)} title="Zoom in (+)">+</button>
        <button type="button" onClick={zoomToFit} title="Zoom to fit (F)" data-testid="zoom-fit">Fit</button>
      </div>
    </section>
  );
}
