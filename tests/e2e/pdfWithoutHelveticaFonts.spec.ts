// A computer without Helvetica or a font drawn like it: Chromium runs with a fontconfig that leaves them out
// (tests/fixtures/scans/no-helvetica-fonts.conf), so a PDF's Helvetica text that is not embedded comes out
// right only when it is drawn from the standard font data the app serves.
import { join } from 'node:path';
import config from '../../playwright.config';
import { test } from './guard';
import { checkStandardFontText } from './standardFontText';

const fontconfig = join(import.meta.dirname, '../fixtures/scans/no-helvetica-fonts.conf');
test.use({ launchOptions: { ...config.use?.launchOptions, env: { ...process.env, FONTCONFIG_FILE: fontconfig } } });

test('Helvetica text of a PDF is drawn from the app\'s font data where the computer has no Helvetica-like font', async ({ page }) => {
  await checkStandardFontText(page, 'pdf-standard-font-no-helvetica.png');
});
