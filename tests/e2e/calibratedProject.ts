// A project file of a section drawn on a synthetic scan: the scan calibrated at given section points, the lines,
// pins and regionals placed on it through the same section → pixel map, so the app shows the section's own numbers.
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import type { ImagePx, ProjectDoc } from '../../src/core/model/projectDoc';
import type { Section, XZ } from '../../src/core/model/section';
import { serializeProject } from '../../src/io/projectFile';

export interface CalibratedScan { id: string; name: string; widthPx: number; heightPx: number; bytes: Uint8Array }

/**
 * The project file text: `section` (horizons with lines) on `scan`, calibrated by `corners` (section points mapped
 * through `toPx`), pins at `pins` (section points), one scenario.
 */
export function calibratedProject(section: Section, title: string, scan: CalibratedScan, toPx: (p: XZ) => ImagePx, corners: XZ[], pins: [XZ, XZ]): string {
  const base = sectionToProjectDoc(section, title);
  const doc: ProjectDoc = {
    ...base,
    scan: { id: scan.id, name: scan.name, widthPx: scan.widthPx, heightPx: scan.heightPx, type: 'image/png' },
    calibration: { kind: 'affine', points: corners.map((q) => { const [u, v] = toPx(q); return { u, v, x: q[0], z: q[1] }; }) },
    horizons: base.horizons.map((h, i) => ({ ...h, pointsPx: section.horizons[i].line!.map(toPx) })),
    scenarios: [{ ...base.scenarios[0], pinsPx: [toPx(pins[0]), toPx(pins[1])], regionals: Object.fromEntries(base.horizons.map((h, i) => [h.id, section.horizons[i].regional.map(toPx)])) }],
  };
  return serializeProject(doc, { type: 'image/png', name: scan.name, bytes: scan.bytes });
}
