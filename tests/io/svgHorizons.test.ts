import { describe, expect, it } from 'vitest';
import { pathDataToPolylines } from '../../src/io/svgPathData';
import { parseTransform } from '../../src/io/svgTransform';
import { readSvgLines, svgToSectionAxes } from '../../src/io/svgHorizons';

describe('pathDataToPolylines', () => {
  it('reads M L H V Z, absolute and relative, and starts a new line at each M', () => {
    expect(pathDataToPolylines('M10 20 L30 20 H40 V50 m5,5 l10-5 h-2 v3 z')).toEqual([
      [[10, 20], [30, 20], [40, 20], [40, 50]],
      [[45, 55], [55, 50], [53, 50], [53, 53], [45, 55]],
    ]);
  });

  it('flattens a cubic onto the curve: the midpoint is (P0 + 3P1 + 3P2 + P3)/8 (Bézier, t = 1/2)', () => {
    const [line] = pathDataToPolylines('M0 0 C 0 100 100 100 100 0')!;
    expect(line[line.length - 1]).toEqual([100, 0]);
    const mid = line[(line.length - 1) / 2];
    expect(mid[0]).toBeCloseTo(50, 9);
    expect(mid[1]).toBeCloseTo(75, 9);
  });

  it('flattens a relative quadratic: midpoint (P0 + 2P1 + P2)/4', () => {
    const [line] = pathDataToPolylines('M10 10 q 50 80 100 0')!;
    const mid = line[(line.length - 1) / 2];
    expect(mid[0]).toBeCloseTo(60, 9);
    expect(mid[1]).toBeCloseTo(50, 9);
    expect(line[line.length - 1]).toEqual([110, 10]);
  });

  it('returns null for malformed data', () => {
    expect(pathDataToPolylines('M 0 0 L 10')).toBeNull();
    expect(pathDataToPolylines('M 0 0 L 10 x')).toBeNull();
  });
});

describe('parseTransform', () => {
  it('composes a list left to right (SVG 1.1 §7.6)', () => {
    expect(parseTransform('translate(10 20) scale(2)')).toEqual([2, 0, 0, 2, 10, 20]);
    const r = parseTransform('rotate(90)')!;
    expect(r.map((v) => Math.round(v * 1e12) / 1e12)).toEqual([0, 1, -1, 0, 0, 0]);
    expect(parseTransform('translate(1,2) nonsense')).toBeNull();
  });
});

describe('readSvgLines and svgToSectionAxes', () => {
  const svg = `<?xml version="1.0"?><!-- drawn by hand -->
    <svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 200 100">
      <g transform="translate(10 0)"><g transform="scale(2 1)">
        <path id="Top &amp; upper" d="M0 50 L50 40 L90 50"/>
      </g></g>
      <polyline id="Base" points="0,90 100,80 190,90"/>
      <rect x="0" y="0" width="10" height="10"/>
      <path id="broken" d="M 0 0 L"/>
    </svg>`;

  it('applies nested group transforms and decodes names', () => {
    const r = readSvgLines(svg);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.lines.map((l) => l.name)).toEqual(['Top & upper', 'Base']);
    expect(r.lines[0].points).toEqual([[10, 50], [110, 40], [190, 50]]);
    expect(r.problems).toHaveLength(1);
  });

  it('maps the drawing to section units through two reference points (y down, z up)', () => {
    const r = readSvgLines(svg);
    if (!r.ok) throw new Error(r.message);
    const m = svgToSectionAxes(r.lines, [{ svg: [0, 100], section: [1000, -500] }, { svg: [200, 0], section: [3000, 500] }]);
    expect(m.ok).toBe(true);
    if (!m.ok) return;
    expect(m.horizons[0].line[0]).toEqual([1100, 0]);
    expect(m.horizons[1].line[1]).toEqual([2000, -300]);
    expect(svgToSectionAxes(r.lines, [{ svg: [0, 0], section: [0, 0] }, { svg: [0, 10], section: [1, 1] }]).ok).toBe(false);
  });

  it('refuses text that is not SVG', () => {
    expect(readSvgLines('<html><body>hi</body></html>').ok).toBe(false);
  });
});

describe('readSvgLines: nested <svg> viewports (SVG 1.1 §7.7 viewBox, §7.8 preserveAspectRatio, §7.9 new viewports)', () => {
  const inRoot = (inner: string) => `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 200 100">${inner}</svg>`;
  const points = (svg: string) => {
    const r = readSvgLines(svg);
    if (!r.ok) throw new Error(r.message);
    return r.lines.map((l) => l.points);
  };

  it('maps the viewBox onto the x, y, width, height rectangle: (0,0) → (x,y), (10,5) → (x + width, y + height)', () => {
    // §7.7: scale width/vbWidth and height/vbHeight (here both 10, so uniform scaling changes nothing), then translate to (x, y).
    expect(points(inRoot('<svg x="20" y="10" width="100" height="50" viewBox="0 0 10 5"><path d="M0 0 L10 5"/></svg>'))).toEqual([[[20, 10], [120, 60]]]);
    // §7.7: the viewBox's min-x, min-y go to the viewport's corner.
    expect(points(inRoot('<svg width="100" height="50" viewBox="5 5 10 5"><line x1="5" y1="5" x2="15" y2="10"/></svg>'))).toEqual([[[0, 0], [100, 50]]]);
  });

  it('keeps the aspect ratio as preserveAspectRatio says: xMidYMid meet by default, none, xMinYMax slice', () => {
    const nested = (par: string) => inRoot(`<svg x="20" y="10" width="100" height="100" viewBox="0 0 10 5"${par}><path d="M0 0 L10 5"/></svg>`);
    // §7.8, meet: scale min(100/10, 100/5) = 10; the 100 × 50 drawing is centred in y: ty = 10 + (100 − 50)/2 = 35.
    expect(points(nested(''))).toEqual([[[20, 35], [120, 85]]]);
    // §7.8, none: scale 10 across and 20 down, filling the viewport.
    expect(points(nested(' preserveAspectRatio="none"'))).toEqual([[[20, 10], [120, 110]]]);
    // §7.8, slice: scale max(10, 20) = 20; xMin keeps x at the left edge, YMax puts the bottom at y + height: ty = 10 + 100 − 100.
    expect(points(nested(' preserveAspectRatio="xMinYMax slice"'))).toEqual([[[20, 10], [220, 110]]]);
  });

  it('reads percentages of the parent viewport (§7.10) and composes with group transforms and deeper nesting', () => {
    // Root viewport 200 × 100 (its viewBox): x = 10% → 20, y = 50% → 50; without a viewBox only the translation applies.
    expect(points(inRoot('<svg x="10%" y="50%" width="50%" height="50%"><path d="M0 0 L1 1"/></svg>'))).toEqual([[[20, 50], [21, 51]]]);
    // Absolute units at 96 user units per inch (CSS Values and Units Level 3 §6.2: 1in = 2.54cm = 96px).
    expect(points(inRoot('<svg x="1in" y="2.54cm"><path d="M0 0 L1 1"/></svg>'))[0][0]).toEqual([96, 96]);
    // translate(5 5), then a viewport of scale 2 at (10,10), then one of scale 3 at (1,1) inside it:
    // (0,0) → (1,1) → (10 + 2·1, 10 + 2·1) = (12,12) → (17,17); (1,1) → (1 + 3, 1 + 3) = (4,4) → (18,18) → (23,23).
    const deep = inRoot('<g transform="translate(5 5)"><svg x="10" y="10" width="100" height="100" viewBox="0 0 50 50">'
      + '<svg x="1" y="1" width="30" height="30" viewBox="0 0 10 10"><path d="M0 0 L1 1"/></svg></svg></g>');
    expect(points(deep)).toEqual([[[17, 17], [23, 23]]]);
  });

  it('leaves the root viewBox alone (reference points are read in root user units) and skips an empty nested viewport', () => {
    const r = readSvgLines(inRoot('<path id="kept" d="M0 0 L200 100"/><svg width="0" height="50"><path id="hidden" d="M0 0 L1 1"/></svg><svg viewBox="0 0 1"><path d="M0 0 L1 1"/></svg>'));
    if (!r.ok) throw new Error(r.message);
    expect(r.lines.map((l) => [l.name, l.points])).toEqual([['kept', [[0, 0], [200, 100]]]]);
    // §7.9: a zero width disables rendering; a viewBox of three numbers cannot be read. Both are listed.
    expect(r.problems).toHaveLength(2);
  });
});

describe('readSvgLines: definitions are not drawn (SVG 1.1 §5.3 the \'defs\' element, §5.5 the \'symbol\' element)', () => {
  const inRoot = (inner: string) => `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 200 100">${inner}</svg>`;
  const read = (svg: string) => {
    const r = readSvgLines(svg);
    if (!r.ok) throw new Error(r.message);
    return r;
  };
  const named = (svg: string) => read(svg).lines.map((l) => [l.name, l.points]);

  it('leaves out shapes inside <defs>, however deep, and reads what follows with its own transform', () => {
    // §5.3: "elements that are descendants of a 'defs' are not rendered directly".
    const svg = inRoot('<g transform="translate(10 0)">'
      + '<defs><path id="in-defs" d="M0 0 L5 5"/><g transform="scale(3)"><polyline id="deeper" points="0,0 1,1"/><line id="deepest" x1="0" y1="0" x2="1" y2="1"/></g></defs>'
      + '<path id="drawn" d="M0 50 L100 50"/></g><line id="after" x1="0" y1="90" x2="200" y2="90"/>');
    // The group's translate(10 0) still applies after </defs> (SVG 1.1 §7.5 nested transformations, section number recalled from memory), and nothing else does.
    expect(named(svg)).toEqual([['drawn', [[10, 50], [110, 50]]], ['after', [[0, 90], [200, 90]]]]);
  });

  it('leaves out shapes in <symbol>, <clipPath>, <mask>, <marker> and <pattern>, inside or outside <defs>', () => {
    // §5.5: 'symbol' elements are never rendered directly; likewise clipPath (§14.3.5), mask (§14.4),
    // marker (§11.6.2) and pattern (§13.3) — these four section numbers recalled from memory.
    for (const el of ['symbol', 'clipPath', 'mask', 'marker', 'pattern']) {
      const outside = inRoot(`<${el} id="def"><path id="hidden" d="M0 0 L9 9"/></${el}><path id="drawn" d="M0 10 L20 10"/>`);
      expect(named(outside), el).toEqual([['drawn', [[0, 10], [20, 10]]]]);
      const inside = inRoot(`<defs><${el} id="def"><g><path id="hidden" d="M0 0 L9 9"/></g></${el}><path id="also-hidden" d="M1 1 L2 2"/></defs><path id="drawn" d="M0 10 L20 10"/>`);
      expect(named(inside), el).toEqual([['drawn', [[0, 10], [20, 10]]]]);
    }
  });

  it('reads tag names with a namespace prefix and leaves an empty <defs/> without effect', () => {
    // XML Namespaces: svg:defs is the same element as defs in the SVG namespace.
    const svg = '<svg xmlns="http://www.w3.org/2000/svg" xmlns:svg="http://www.w3.org/2000/svg"><svg:defs><svg:path id="def" d="M0 0 L1 1"/></svg:defs>'
      + '<svg:defs/><svg:path id="drawn" d="M0 0 L3 4"/></svg>';
    expect(named(svg)).toEqual([['drawn', [[0, 0], [3, 4]]]]);
  });

  it('says so when every shape is only a definition, and lists a <use> it does not follow', () => {
    const only = readSvgLines(inRoot('<defs><path id="a" d="M0 0 L1 1"/><path id="b" d="M0 0 L2 2"/></defs>'));
    expect(only.ok).toBe(false);
    if (!only.ok) expect(only.message).toMatch(/no drawn path.*2 shapes are only definitions/);
    // §5.6: a 'use' draws a copy of the element it references; the copy is not imported, and the list says so.
    const r = read(inRoot('<defs><path id="bed" d="M0 0 L1 1"/></defs><use id="copy" href="#bed" x="5"/><path id="drawn" d="M0 0 L1 0"/>'));
    expect(r.lines.map((l) => l.name)).toEqual(['drawn']);
    expect(r.problems).toEqual([{ where: '<use> "copy"', message: 'draws a copy of another element; copies are not imported' }]);
  });
});

describe('readSvgLines: hidden layers are not drawn (SVG 1.1 §11.5 the \'display\' property: "none" renders neither the element nor its children)', () => {
  const inRoot = (inner: string) => `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 200 100">${inner}</svg>`;
  const names = (svg: string) => {
    const r = readSvgLines(svg);
    if (!r.ok) throw new Error(r.message);
    return r.lines.map((l) => l.name);
  };

  it('leaves out a group hidden by its attribute or its style, with everything in it, and a hidden single shape', () => {
    const svg = inRoot('<g id="old" display="none"><path id="draft" d="M0 0 L9 9"/><g><line id="deep" x1="0" y1="0" x2="1" y2="1"/></g></g>'
      + '<g style="opacity:1; display : none"><path id="styled" d="M0 0 L5 5"/></g>'
      + '<path id="one" style="display:none" d="M0 0 L2 2"/><path id="drawn" d="M0 10 L20 10"/>');
    expect(names(svg)).toEqual(['drawn']);
  });

  it('reads a group whose style shows it although its attribute hides it (the style property wins over the presentation attribute, SVG 1.1 §6.4, section number recalled from memory)', () => {
    expect(names(inRoot('<g display="none" style="display:inline"><path id="shown" d="M0 0 L3 3"/></g>'))).toEqual(['shown']);
  });

  it('says so when every shape is hidden', () => {
    const r = readSvgLines(inRoot('<g display="none"><path d="M0 0 L1 1"/></g>'));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/no drawn path.*1 shape is only definitions \(in <defs> or the like\), hidden, or in an empty viewport/);
  });
});
