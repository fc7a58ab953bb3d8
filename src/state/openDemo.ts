// Opens the demo section (public/demo/): an invented fold belt, its scan, calibration, horizons,
// regionals and pins, so a first-time user sees a complete interpretation at once. Two faulted
// examples open the same way from the Project menu: a thrust sheet over a ramp (public/demo/thrust/)
// and a normal fault (public/demo/normal/), their horizons in pieces joined along the fault.
import demoSection from '../../public/demo/section.json';
import demoCalibration from '../../public/demo/calibration.json';
import thrustSection from '../../public/demo/thrust/section.json';
import normalSection from '../../public/demo/normal/section.json';
import { faultColour } from '../core/model/horizonPalette';
import { horizonPieces } from '../core/model/section';
import { fitCalibration } from '../core/calibration/fitCalibration';
import { sectionToImage } from '../core/calibration/mapPoints';
import { paletteColour } from '../core/model/horizonPalette';
import { freshHorizonIds } from '../core/model/commands/addHorizon';
import { emptyProjectDoc, type ControlPoint, type ProjectDoc } from '../core/model/projectDoc';
import type { Section, XZ } from '../core/model/section';
import { useDocStore } from './docStore';
import { putScan } from './scanCache';
import { useSessionStore } from './sessionStore';

export type DemoId = 'fold' | 'thrust' | 'normal';

/** Each example: its folder under public/demo/, its section and its title (all share the first demo's calibration). */
export const DEMOS: Record<DemoId, { folder: string; section: Section; title: string; label: string }> = {
  fold: { folder: 'demo/', section: demoSection as Section, title: 'Corrowan Fold Belt, section F–F′ (invented demo)', label: 'Fold belt over a detachment' },
  thrust: { folder: 'demo/thrust/', section: thrustSection as Section, title: 'Brennock Thrust Sheet, section T–T′ (invented demo)', label: 'Thrust sheet over a ramp' },
  normal: { folder: 'demo/normal/', section: normalSection as Section, title: 'Orvane Basin Margin, section N–N′ (invented demo)', label: 'Normal fault (extension)' },
};

/** Returns the demo as a project document, given the scan's id and size. */
export function demoDoc(scanId: string, widthPx: number, heightPx: number, which: DemoId = 'fold'): ProjectDoc {
  const { section, title, folder } = DEMOS[which];
  const points = demoCalibration.controlPoints as ControlPoint[];
  const cal = fitCalibration({ kind: 'affine', points });
  if (!cal.ok) throw new Error(`Demo calibration: ${cal.message}`);
  const toPx = (q: XZ) => sectionToImage(cal.fit, q);
  const base = emptyProjectDoc();
  const zMid = section.horizons.reduce((s, h) => s + h.regional[0][1], 0) / section.horizons.length;
  const ids = freshHorizonIds(base, section.horizons.length);
  const faults = (section.faults ?? []).map((f, i) => ({
    id: `fault-${i + 1}`, name: f.name, colour: faultColour(i), visible: true, locked: false, pointsPx: f.line.map(toPx),
  }));
  const horizons = section.horizons.map((h, i) => {
    const pieces = horizonPieces(h);
    // Each piece after the first starts at a join on the fault the section names (the examples have one fault).
    const joins = pieces.slice(1).map((_, k) => ({
      at: pieces.slice(0, k + 1).reduce((n, p) => n + p.length, 0),
      faultId: faults[Math.max(0, (section.faults ?? []).findIndex((f) => f.name === h.joinFaults?.[k]))].id,
    }));
    return {
      id: ids[i],
      name: h.name,
      colour: paletteColour(i),
      visible: true,
      locked: false,
      pointsPx: pieces.flat().map(toPx),
      projected: h.projected ?? [],
      joins,
    };
  });
  const regionals: Record<string, [number, number][]> = {};
  section.horizons.forEach((h, i) => {
    regionals[ids[i]] = h.regional.map(toPx);
  });
  return {
    ...base,
    title,
    author: 'Foldroot demo',
    units: section.units,
    scan: { id: scanId, name: `${folder}section.png`, widthPx, heightPx, type: 'image/png' },
    calibration: { kind: 'affine', points },
    horizons,
    faults,
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

/** Opens a demo section (the fold belt unless told) in a fresh project (its history cleared). */
export async function openDemo(which: DemoId = 'fold'): Promise<void> {
  const session = useSessionStore.getState();
  session.setBusy('Opening the demo section …');
  try {
    const url = new URL(`${DEMOS[which].folder}section.png`, document.baseURI).href;
    const img = await loadImage(url);
    const bitmap = await createImageBitmap(img);
    const canvas = document.createElement('canvas');
    canvas.width = bitmap.width;
    canvas.height = bitmap.height;
    canvas.getContext('2d')?.drawImage(bitmap, 0, 0);
    const bytes = await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('PNG encoding failed'))), 'image/png'));
    // One scan id per example: the canvas keeps tiles by scan id.
    const id = which === 'fold' ? 'scan-demo' : `scan-demo-${which}`;
    putScan(id, { bitmap, bytes });
    useDocStore.getState().replace(demoDoc(id, bitmap.width, bitmap.height, which));
    session.fitTo({ u0: 0, v0: 0, width: bitmap.width, height: bitmap.height, margin: 24 });
  } catch (e) {
    session.showMessage('error', `The demo section could not be opened: ${e instanceof Error ? e.message : String(e)}`);
  } finally {
    session.setBusy(null);
  }
}
