// The demo: an invented fold belt (every name here is made up), built with the forward model.
import type { ForwardSpec } from '../../src/core/forward/forwardSpec';

/** Units from youngest to oldest; each horizon is the top of the unit with the same index + 1. */
export const demoUnits = [
  { name: 'Harrel Beds', colour: '#efe2a6' },
  { name: 'Vennick Sandstone', colour: '#e9c27d' },
  { name: 'Quennet Marl', colour: '#b9cf9a' },
  { name: 'Saltherne Limestone', colour: '#9fc3d6' },
  { name: 'Thrasden Dolomite', colour: '#c7aed3' },
  { name: 'Ambrith Shale', colour: '#a9b0a0' },
  { name: 'Kestrow Quartzite', colour: '#e0a98f' },
];

/** Surface features above the folds: name and x (m). */
export const demoPlaces = [
  { name: 'VESKAR RIDGE', x: 5900 },
  { name: 'ULMOTH VALLEY', x: 10300 },
  { name: 'EBRIN HEIGHTS', x: 17300 },
  { name: 'LISSEL KNOLL', x: 22600 },
];

export const demoTitle = 'CORROWAN FOLD BELT';
export const demoSectionName = 'SECTION F–F′';
export const demoEnds = { left: 'F', right: 'F′', leftCompass: 'WSW', rightCompass: 'ENE' };

/** D = 1250 m above a detachment at −2600 m (3700 m below the highest regional, 1100 m). */
export const demoSpec: ForwardSpec = {
  units: 'm',
  displacement: 1250,
  detachmentElevation: -2600,
  pins: [1500, 24500],
  extent: [0, 26000],
  samplesPerFold: 64,
  anchorElevation: -300,
  // A gently curved regional, a little higher in the west (an interpretation, as any regional is).
  regional: { kind: 'curved', points: [[0, 90], [7000, 60], [14000, 0], [20000, -60], [26000, -140]] },
  horizons: demoUnits.slice(1).map((u, i) => ({
    name: `Top ${u.name}`,
    regionalElevation: [1100, 520, -120, -760, -1380, -1920][i],
  })),
  folds: [
    { shape: 'box', from: 2800, to: 8600, limb: 0.24, weight: 0.75 },
    { shape: 'rounded', from: 8600, to: 11900, weight: -0.3 },
    { shape: 'overturned', from: 14200, to: 18200, crest: 0.7, weight: 2.4, overturn: 1.9 },
    { shape: 'rounded', from: 20800, to: 23600, weight: 0.35 },
  ],
};
