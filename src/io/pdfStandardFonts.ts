// Where the built app serves pdf.js's standard font data (the 14 standard PDF fonts and their stand-ins),
// relative to the page. vite.config.ts copies node_modules/pdfjs-dist/standard_fonts/ there on build and
// serves it there in development, so a PDF whose text uses a standard font without embedding it renders
// with these fonts, from the app's own origin.

/** Folder of the standard font files, relative to the page, with the trailing slash pdf.js expects. */
export const PDF_STANDARD_FONTS_PATH = 'pdfjs/standard_fonts/';
