// The section figure of the open project: the document, its analysis and its scan, drawn by io/renderSectionSvg
// (in parts: written out as the SVG file with the scan embedded once, or handed to the PNG worker with the scan region).
import { prepareFigurePng, scanDataUrlParts, sectionSvgBlob, type FigureScanSource } from '../io/exportFigure';
import { renderSectionSvgParts, type SectionSvgParts } from '../io/renderSectionSvg';
import { useDocStore } from './docStore';
import { useSessionStore } from './sessionStore';
import { getScan } from './scanCache';
import { TILE_PX } from './scanTiles';
import { getTilePyramid, pyramidRegion } from './scanTilesPyramid';
import { selectAnalysis } from './selectors';

/** Returns the figure of the open project as an SVG file, the scan embedded once piece by piece (a scan file of any size). */
export async function currentFigureSvgBlob(): Promise<Blob> {
  const doc = useDocStore.getState().doc;
  const { parts } = currentFigureParts();
  const cached = getScan(doc.scan?.id);
  const urlParts = doc.scan && cached?.bitmap ? await scanDataUrlParts(doc.scan.type, { bitmap: cached.bitmap, bytes: cached.bytes }) : null;
  return sectionSvgBlob(parts, urlParts);
}

/** The figure's markup last written, and what it was written from (the same document, analysis, exaggeration and date give the same markup). */
let lastParts: { doc: object; analysis: object; verticalExaggeration: number | null; date: string; parts: SectionSvgParts } | null = null;

/** Returns the figure's markup for the open project now: the one written last when nothing it is drawn from has changed. */
function figureMarkup(): SectionSvgParts {
  const doc = useDocStore.getState().doc;
  const analysis = selectAnalysis(doc);
  const verticalExaggeration = useSessionStore.getState().figureVerticalExaggeration;
  const date = new Date().toISOString().slice(0, 10);
  const last = lastParts;
  if (last && last.doc === doc && last.analysis === analysis && last.verticalExaggeration === verticalExaggeration && last.date === date) return last.parts;
  const parts = renderSectionSvgParts({ doc, analysis, date, verticalExaggeration });
  lastParts = { doc, analysis, verticalExaggeration, date, parts };
  return parts;
}

/**
 * Writes the figure's markup of the open project a task from now (when the export menu opens) and hands it to the PNG
 * worker to parse, so that an export chosen from it starts drawing at once; an edit meanwhile has it written again at
 * the export (and parsed there).
 */
export function prepareCurrentFigure(): void {
  // The PNG worker parses the same markup meanwhile (io/exportFigure prepareFigurePng).
  setTimeout(() => prepareFigurePng(figureMarkup()), 0);
}

/** Returns the figure of the open project in its parts below and above the scan, with the decoded scan (and its tile pyramid when cut) to draw between them (null when none is shown). */
export function currentFigureParts(): { parts: SectionSvgParts; scan: FigureScanSource | null } {
  const doc = useDocStore.getState().doc;
  const parts = figureMarkup();
  const bitmap = (doc.scan && getScan(doc.scan.id)?.bitmap) || null;
  if (!doc.scan || !bitmap) return { parts, scan: null };
  const pyramid = getTilePyramid(doc.scan.id);
  if (!pyramid) return { parts, scan: { bitmap, pyramid: null } };
  const region = (level: number, x0: number, y0: number, x1: number, y1: number) => pyramidRegion(pyramid, level, x0, y0, x1, y1);
  const heldTiles = (level: number) => {
    const tiles = pyramid.tiles[level];
    return tiles ? { tiles, cols: pyramid.levels[level].cols, tilePx: TILE_PX } : null;
  };
  return { parts, scan: { bitmap, pyramid: { levels: pyramid.levels, region, heldTiles } } };
}
