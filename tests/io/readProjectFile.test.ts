// Opening a file through the opening worker's path (read, parse, pack, unpack in steps) gives the document
// that parseProjectText gives from the same text, through the real store; a big document is unpacked in
// several steps, each reported. Under Node there is no Worker, so the same steps run in this thread.
import { describe, expect, it, vi } from 'vitest';
import { forwardSection } from '../../src/core/forward/forwardSection';
import { parseProjectText, serializeProject } from '../../src/io/projectFile';
import { readProjectFile, type OpenProgress } from '../../src/io/readProjectFile';
import { packPoints } from '../../src/io/packedDoc';
import { useDocStore } from '../../src/state/docStore';
import { sampleDoc } from './sampleDoc';

const { openProjectFile } = await import('../../src/state/projectActions');

// Three horizons of 60,003 vertices each from the forward model (an invented fold, straight regionals).
const big = forwardSection({
  units: 'm', displacement: 800, detachmentElevation: -2000, pins: [500, 9500], extent: [0, 10000], samplesPerFold: 60_000,
  horizons: [0, 1, 2].map((i) => ({ name: `Layer ${i + 1}`, regionalElevation: 600 - 200 * i })),
  folds: [{ shape: 'rounded', from: 2000, to: 8000, weight: 1 }],
}).section;

describe('readProjectFile', () => {
  it('opens a section file as parseProjectText does, unpacking its lines in steps', async () => {
    const text = JSON.stringify(big);
    const heard: OpenProgress[] = [];
    const opened = await readProjectFile(new File([text], 'big.json'), 'big.json', (p) => heard.push(p));
    const direct = parseProjectText(text, 'big.json');
    expect(opened).toEqual(direct);
    expect(heard.slice(0, 2)).toEqual([{ stage: 'reading' }, { stage: 'checking' }]);
    const fractions = heard.flatMap((p) => (p.stage === 'lines' ? [p.fraction] : []));
    // 180,000 horizon vertices at 150,000 a step: at least one step before the end, fractions rising.
    expect(fractions.length).toBeGreaterThanOrEqual(1);
    expect(fractions).toEqual([...fractions].sort((a, b) => a - b));
    expect(fractions.every((f) => f > 0 && f <= 1)).toBe(true);
  });

  it('opens a project file with its scan bytes and notes as parseProjectText does', async () => {
    const bytes = new Uint8Array([137, 80, 78, 71, 1, 2, 3]);
    const doc = sampleDoc();
    const text = serializeProject(doc, { type: 'image/png', name: 'scan.png', bytes });
    const opened = await readProjectFile(new File([text], 'p.foldroot.json'), 'p.foldroot.json');
    expect(opened).toEqual(parseProjectText(text, 'p.foldroot.json'));
  });

  it('gives the message parseProjectText gives for a damaged file, and says when the disk refuses it', async () => {
    const opened = await readProjectFile(new File(['{"horizons": ['], 'bad.json'), 'bad.json');
    expect(opened).toEqual(parseProjectText('{"horizons": [', 'bad.json'));
    const refusing = { text: () => Promise.reject(new Error('gone')) } as unknown as File;
    expect(await readProjectFile(refusing, 'gone.json')).toBe('unreadable');
  });

  it('puts the same document in the store as the text gives, its lines already packed for the autosave', async () => {
    vi.stubGlobal('window', { confirm: () => true });
    try {
      const text = JSON.stringify(big);
      expect(await openProjectFile(new File([text], 'big.json'))).toBe(true);
      const direct = parseProjectText(text, 'big.json');
      if (!direct.ok) throw new Error(direct.message);
      const { doc } = useDocStore.getState();
      expect(doc).toEqual(direct.doc);
      // The packed line the document arrived in is the one the autosave stores (not packed again).
      const line = doc.horizons[0].pointsPx;
      const flat = packPoints(line);
      expect(flat.length).toBe(2 * line.length);
      expect(flat[2 * 1234 + 1]).toBe(line[1234][1]);
    } finally {
      vi.unstubAllGlobals();
    }
  });
});
