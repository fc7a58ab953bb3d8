// The small dialog that asks which page of a multi-page TIFF, or which page of a PDF and at what
// resolution, to open as the scan. Esc cancels it (the key table's `pageDialog` row, state/keyTable.ts).
import { useEffect, useState } from 'react';
import type { ScanChoiceRequest } from '../io/decodeScanChoice';
import { useScanChoiceStore } from '../state/scanChoiceStore';
import { PDF_DEFAULT_DPI, PDF_DPI_CHOICES, PDF_MAX_SIDE_PX, pdfPagePixels } from '../io/decodePdf';
import { MAX_SCAN_MEGAPIXELS } from '../io/decodeScan';
import { defaultTiffPage } from '../io/decodeTiff';
import { formatMegapixels } from '../format/formatQuantity';
import './scanControls.css';

function megapixels(w: number, h: number): string {
  return `${formatMegapixels(w * h)} MP`;
}

function TiffChoice({ request, onChoose }: { request: Extract<ScanChoiceRequest, { kind: 'tiff' }>; onChoose: (page: number) => void }) {
  const [page, setPage] = useState(() => defaultTiffPage(request.pages).index);
  return (
    <form onSubmit={(e) => { e.preventDefault(); onChoose(page); }}>
      <p>{request.fileName} has {request.pages.length} pages. Choose the one to open:</p>
      <div className="scan-page-list" role="radiogroup">
        {request.pages.map((p, i) => {
          const big = p.widthPx * p.heightPx > MAX_SCAN_MEGAPIXELS * 1e6;
          return (
            <label key={p.index} className={big ? 'disabled' : ''}>
              <input type="radio" name="scan-page" value={p.index} checked={page === p.index} disabled={big} onChange={() => setPage(p.index)} data-testid={`scan-page-${i + 1}`} />
              Page {i + 1}: {p.widthPx} × {p.heightPx} px, {p.bitsPerSample}-bit {p.colour}
              {p.reduced ? ' (preview)' : ''}{p.geo ? ' (GeoTIFF)' : ''}{big ? ' — too large' : ''}
            </label>
          );
        })}
      </div>
      <DialogButtons />
    </form>
  );
}

function PdfChoice({ request, onChoose }: { request: Extract<ScanChoiceRequest, { kind: 'pdf' }>; onChoose: (page: number, dpi: number) => void }) {
  const [page, setPage] = useState(1);
  const [dpi, setDpi] = useState(PDF_DEFAULT_DPI);
  const [size, setSize] = useState<{ page: number; widthPt: number; heightPt: number } | null>(null);
  const { pageSize, pageCount } = request;
  useEffect(() => {
    let live = true;
    pageSize(page).then((s) => live && setSize({ page, ...s }), () => live && setSize(null));
    return () => {
      live = false;
    };
  }, [page, pageSize]);
  const px = size && size.page === page ? pdfPagePixels(size.widthPt, size.heightPt, dpi) : null;
  const fits = (d: number) => {
    if (!size) return true;
    const p = pdfPagePixels(size.widthPt, size.heightPt, d);
    return p.widthPx * p.heightPx <= MAX_SCAN_MEGAPIXELS * 1e6 && Math.max(p.widthPx, p.heightPx) <= PDF_MAX_SIDE_PX;
  };
  return (
    <form onSubmit={(e) => { e.preventDefault(); if (fits(dpi)) onChoose(page - 1, dpi); }}>
      <p>{request.fileName}: choose the page holding the section and the resolution to render it at.</p>
      <div className="scan-page-fields">
        <label>
          Page
          <input type="number" min={1} max={pageCount} value={page} data-testid="pdf-page"
            onChange={(e) => setPage(Math.min(pageCount, Math.max(1, Math.round(Number(e.currentTarget.value) || 1))))} />
          of {pageCount}
        </label>
        <label>
          Resolution
          <select value={dpi} onChange={(e) => setDpi(Number(e.currentTarget.value))} data-testid="pdf-dpi">
            {PDF_DPI_CHOICES.map((d) => (
              <option key={d} value={d} disabled={!fits(d)}>{d} dpi</option>
            ))}
          </select>
        </label>
      </div>
      <p className="hint" data-testid="pdf-size">
        {px ? `${px.widthPx} × ${px.heightPx} px (${megapixels(px.widthPx, px.heightPx)})${fits(dpi) ? '' : ' — too large, choose a lower resolution'}` : 'Reading the page size…'}
      </p>
      <DialogButtons disabled={!fits(dpi)} />
    </form>
  );
}

function DialogButtons({ disabled = false }: { disabled?: boolean }) {
  return (
    <div className="button-row dialog-buttons">
      <button type="button" onClick={() => useScanChoiceStore.getState().answer(null)}>Cancel</button>
      <button type="submit" className="primary" disabled={disabled} data-testid="scan-page-open">Open</button>
    </div>
  );
}

export function ScanPageDialog() {
  const request = useScanChoiceStore((s) => s.request);
  if (!request) return null;
  const answer = useScanChoiceStore.getState().answer;
  return (
    <div className="scan-dialog-backdrop">
      <div className="scan-dialog" role="dialog" aria-modal="true" aria-label="Choose a page" data-testid="scan-page-dialog">
        <h2>{request.kind === 'pdf' ? 'Open a PDF page' : 'Open a TIFF page'}</h2>
        {request.kind === 'tiff' ? (
          <TiffChoice request={request} onChoose={(page) => answer({ page })} />
        ) : (
          <PdfChoice request={request} onChoose={(page, dpi) => answer({ page, dpi })} />
        )}
      </div>
    </div>
  );
}
