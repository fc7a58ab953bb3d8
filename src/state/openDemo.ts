// Opens the demo section (public/demo/): an invented fold belt, its scan, calibration, horizons,
// regionals and pins, so a first-time user sees a complete interpretation at once.
import demoSection from '../../public/demo/section.json';
import demoCalibration from '../../public/demo/calibration.json';
import { fitCalibration } from '../core/calibration/fitCalibration';
import { sectionToImage } from '../core/calibration/mapPoints';
import { paletteColour } from '../core/model/horizonPalette';
import { freshHorizonIds } from '../core/model/commands/addHorizon';
import { emptyProjectDoc, type ControlPoint, type ProjectDoc } from '../core/model/projectDoc';
import type { Section, XZ } from '../core/model/section';
import { useDocStore } from './docStore';
import { putScan } from './scanCache';
import { useSessionStore } from './sessionStore';

/** Returns the demo as a project document, given the scan's id and size. */
export function demoDoc(scanId: string, widthPx: number, heightPx: number): ProjectDoc {
  const section = demoSection as Section;
  const points = demoCalibration.controlPoints as ControlPoint[];
  const cal = fitCalibration({ kind: 'affine', points });
  if (!cal.ok) throw new Error(`Demo calibration: ${cal.message}`);
  const toPx = (q: XZ) => sectionToImage(cal.fit, q);
  const base = emptyProjectDoc();
  const zMid = section.horizons.reduce((s, h) => s + h.regional[0][1], 0) / section.horizons.length;
  const ids = freshHorizonIds(base, section.horizons.length);
  const horizons = section.horizons.map((h, i) => ({
    id: ids[i],
    name: h.name,
    colour: paletteColour(i),
    visible: true,
    locked: false,
    pointsPx: (h.line ?? []).map(toPx),
    projected: h.projected ?? [],
    joins: [],
  }));
  const regionals: Record<string, [number, number][]> = {};
  section.horizons.forEach((h, i) => {
    regionals[ids[i]] = h.regional.map(toPx);
  });
  return {
    ...base,
    title: 'Corrowan Fold Belt, section F–F′ (invented demo)',
    author: 'Foldroot demo',
    units: section.units,
    scan: { id: scanId, name: 'demo/section.png', widthPx, heightPx, type: 'image/png' },
    calibration: { kind: 'affine', points },
    horizons,
    scenarios: [
      {
        id: 'scenario-1',
        name: 'Base case',
        pinsPx: [toPx([section.pins[0], zMid]), toPx([section.pins[1], zMid])],
        regionals,
        excluded: section.horizons.flatMap((h, i) => (h.include === false ? [ids[i]] : [])),
      },
    ],
    activeScenarioId: 'scenario-1',
  };
}

function loadImage(url: string): Promise<HTMLImageElement> {
  return new Promise((resolve, reject) => {
    const img = new Image();
    img.onload = () => resolve(img);
    img.onerror = () => reject(new Error(`Could not load ${url}`));
    img.src = url;
  });
}

/** Opens the demo section in a fresh project (its history cleared). */
export async function openDemo(): Promise<void> {
  const session = useSessionStore.getState();
  session.setBusy('Opening the demo section …');
  try {
    const url = new URL('demo/section.png', document.baseURI).href;
    const img = await loadImage(url);
    const bitmap = await createImageBitmap(img);
    const canvas = document.createElement('canvas');
    canvas.width = bitmap.width;
    canvas.height = bitmap.height;
    canvas.getContext('2d')?.drawImage(bitmap, 0, 0);
    const bytes = await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('PNG encoding failed'))), 'image/png'));
    const id = 'scan-demo';
    putScan(id, { bitmap, bytes });
    useDocStore.getState().replace(demoDoc(id, bitmap.width, bitmap.height));
    session.fitTo({ u0: 0, v0: 0, width: bitmap.width, height: bitmap.height, margin: 24 });
  } catch (e) {
    session.showMessage('error', `The demo section could not be opened: ${e instanceof Error ? e.message : String(e)}`);
  } finally {
    session.setBusy(null);
  }
}
