// The section figure of the open project: the document, its analysis and its scan, drawn by io/renderSectionSvg
// (whole, as SVG; or in parts, for a PNG that draws the decoded scan itself).
import type { ProjectDoc } from '../core/model/projectDoc';
import { scanDataUrl, type FigureScanSource } from '../io/exportFigure';
import { renderSectionSvg, renderSectionSvgParts, type SectionSvgParts } from '../io/renderSectionSvg';
import { useDocStore } from './docStore';
import { useSessionStore } from './sessionStore';
import { getScan } from './scanCache';
import { getTilePyramid, pyramidRegion } from './scanTilesPyramid';
import { selectAnalysis } from './selectors';

/** Returns the document's scan as a data: URL for the figure, or null when there is no scan or it is not shown in this browser. */
export async function docScanDataUrl(doc: ProjectDoc): Promise<string | null> {
  const cached = getScan(doc.scan?.id);
  if (!doc.scan || !cached?.bitmap) return null;
  return scanDataUrl(doc.scan.type, { bitmap: cached.bitmap, bytes: cached.bytes });
}

/** Returns the figure of the open project as an SVG string (today's date in the title block), at the vertical exaggeration chosen for figures. */
export async function currentFigureSvg(): Promise<string> {
  const doc = useDocStore.getState().doc;
  const verticalExaggeration = useSessionStore.getState().figureVerticalExaggeration;
  return renderSectionSvg({ doc, analysis: selectAnalysis(doc), scanDataUrl: await docScanDataUrl(doc), date: new Date().toISOString().slice(0, 10), verticalExaggeration });
}

/** Returns the figure of the open project in its parts below and above the scan, with the decoded scan (and its tile pyramid when cut) to draw between them (null when none is shown). */
export function currentFigureParts(): { parts: SectionSvgParts; scan: FigureScanSource | null } {
  const doc = useDocStore.getState().doc;
  const verticalExaggeration = useSessionStore.getState().figureVerticalExaggeration;
  const parts = renderSectionSvgParts({ doc, analysis: selectAnalysis(doc), date: new Date().toISOString().slice(0, 10), verticalExaggeration });
  const bitmap = (doc.scan && getScan(doc.scan.id)?.bitmap) || null;
  if (!doc.scan || !bitmap) return { parts, scan: null };
  const pyramid = getTilePyramid(doc.scan.id);
  if (!pyramid) return { parts, scan: { bitmap, pyramid: null } };
  const region = (level: number, x0: number, y0: number, x1: number, y1: number) => pyramidRegion(pyramid, level, x0, y0, x1, y1);
  return { parts, scan: { bitmap, pyramid: { levels: pyramid.levels, region } } };
}
