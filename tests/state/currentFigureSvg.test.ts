// The figure's markup of the open project is written once for what it is drawn from: asked again with nothing
// changed (the export menu writes it when it opens, the export reads it), it is the same; after an edit or another
// vertical exaggeration it is written again and shows the change. Through the real stores.
import { beforeEach, describe, expect, it } from 'vitest';
import { setProjectInfo } from '../../src/core/model/commands/setProjectInfo';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import { currentFigureParts, prepareCurrentFigure } from '../../src/state/currentFigureSvg';
import { useDocStore } from '../../src/state/docStore';
import { useSessionStore } from '../../src/state/sessionStore';

// A small invented section: one horizon folded over flat pins, a straight regional.
const SECTION = {
  units: 'm' as const,
  pins: [0, 1000] as [number, number],
  horizons: [{ name: 'Marker', line: [[0, 0], [500, 300], [1000, 0]] as [number, number][], regional: [[0, 0], [1000, 0]] as [number, number][] }],
};

const markup = (p: ReturnType<typeof currentFigureParts>['parts']) => p.head + p.under + p.panelOpen + p.over;

describe('currentFigureParts()', () => {
  beforeEach(() => {
    useDocStore.getState().replace(sectionToProjectDoc(SECTION, 'First title'));
    useSessionStore.getState().setFigureVerticalExaggeration(null);
  });

  it('gives the same markup while nothing it is drawn from changes, and new markup after an edit', () => {
    const first = currentFigureParts().parts;
    expect(currentFigureParts().parts).toBe(first);
    expect(markup(first)).toContain('First title');
    useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Second title' }));
    const second = currentFigureParts().parts;
    expect(second).not.toBe(first);
    expect(markup(second)).toContain('Second title');
    expect(markup(second)).not.toContain('First title');
  });

  it('writes it again for another vertical exaggeration', () => {
    const first = currentFigureParts().parts;
    useSessionStore.getState().setFigureVerticalExaggeration(2);
    const second = currentFigureParts().parts;
    expect(second).not.toBe(first);
    expect(markup(second)).not.toBe(markup(first));
  });

  it('prepared ahead (the menu opening), the export reads the markup already written', async () => {
    prepareCurrentFigure();
    await new Promise((r) => setTimeout(r, 0));
    const prepared = currentFigureParts().parts;
    expect(currentFigureParts().parts).toBe(prepared);
  });
});
