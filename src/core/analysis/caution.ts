// The caution of docs/method.md §Cautions, shown in the app and in every export (DEVELOPERS.md §Project rules).

/** The caution text to print beside every depth-to-detachment result. */
export const SECTION_CAUTION =
  'Depth-to-detachment estimates are interpretations. They depend on the regional, the pins, plane strain and ' +
  'area conservation; they are non-unique and must be checked against wells, seismic and balanced restorations. ' +
  'Where they inform drilling, tunnelling, foundations, storage or hazard work, the decision belongs to a ' +
  'licensed professional under local codes.';
