import { describe, expect, it } from 'vitest';
import { drawHorizonTool } from '../../src/tools/drawHorizon/drawHorizonTool';
import { FakeTracer, onLine } from './fakeTracer';
import { ToolHarness } from './toolHarness';
import { toolDoc } from './toolFixture';

// The tool's traced drawing, on synthetic events with a stand-in tracer whose drawn line is v = 100 + u/10.
function harness() {
  const t = new ToolHarness(drawHorizonTool, toolDoc());
  const tracer = new FakeTracer();
  t.tracer = tracer;
  return { t, tracer };
}

const onTheLine = (pts: readonly (readonly number[])[]) => pts.every((p) => Math.abs(p[1] - onLine(p[0])) < 1e-9);

describe('drawHorizonTool with a line tracer', () => {
  it('snaps anchors to the line and fills each stretch with the traced path; the preview follows the pointer', () => {
    const { t, tracer } = harness();
    t.click([0, 103]);
    expect(t.state).toMatchObject({ name: 'placing' });
    if (t.state.name !== 'placing') return;
    expect(onTheLine(t.state.points)).toBe(true);
    t.move([200, 118]);
    // Not ready yet: a straight rubber band from the anchor to the snapped pointer, which the preview says is a stand-in.
    expect(t.preview?.line).toHaveLength(2);
    expect(t.preview?.tracing).toBe(true);
    tracer.finishAll();
    t.send({ type: 'traced' });
    expect(t.preview?.line?.length).toBeGreaterThan(10);
    expect(t.preview?.tracing).toBe(false);
    expect(onTheLine(t.preview?.line ?? [])).toBe(true);
    t.click([200, 118]);
    t.click([400, 141]);
    tracer.finishAll();
    t.key('Enter');
    const h = t.doc.horizons[1];
    expect(h.pointsPx.length).toBeGreaterThan(30);
    expect(onTheLine(h.pointsPx)).toBe(true);
    // One undo entry per stretch: the entry after the first holds the line up to the second anchor.
    expect(t.history).toHaveLength(2);
    const firstStretch = t.history[1].horizons[1].pointsPx;
    expect(firstStretch.at(-1)).toEqual(h.pointsPx[firstStretch.length - 1]);
    expect(firstStretch.length).toBeLessThan(h.pointsPx.length);
  });

  it('waits for a stretch still computing when asked to finish, then adds the whole line', () => {
    const { t, tracer } = harness();
    t.click([0, 100]).click([300, 130]).key('Enter');
    expect(t.doc.horizons).toHaveLength(1);
    expect(t.messages.at(-1)).toMatch(/Tracing/);
    tracer.finishAll();
    t.send({ type: 'traced' });
    expect(t.doc.horizons).toHaveLength(2);
    expect(t.doc.horizons[1].pointsPx.length).toBe(31);
    expect(t.state.name).toBe('idle');
    // The waiting note is taken down (the harness records a cleared message as '').
    expect(t.messages.at(-1)).toBe('');
  });

  it('keeps the line when the tool is switched while finishing waits: untraced stretches go straight', () => {
    const { t } = harness();
    t.click([0, 100]).click([300, 130]).click([600, 160]).key('Enter');
    expect(t.doc.horizons).toHaveLength(1);
    // A tool switch (or lost focus) arrives as cancel before the tracer has answered.
    t.cancel();
    expect(t.state.name).toBe('idle');
    expect(t.doc.horizons).toHaveLength(2);
    // Straight between the three snapped anchors, which lie on the drawn line.
    expect(t.doc.horizons[1].pointsPx).toHaveLength(3);
    expect(onTheLine(t.doc.horizons[1].pointsPx)).toBe(true);
    expect(t.messages.at(-1)).toMatch(/straight/);
    expect(t.history).toHaveLength(2);
  });

  it('a click for the next line while finishing waits keeps this line and starts the next at the click', () => {
    const { t } = harness();
    t.click([0, 100]).click([300, 130]).key('Enter');
    expect(t.doc.horizons).toHaveLength(1);
    t.click([500, 150]);
    expect(t.doc.horizons).toHaveLength(2);
    expect(t.doc.horizons[1].pointsPx).toHaveLength(2);
    expect(t.state).toMatchObject({ name: 'placing', finishing: false });
    if (t.state.name !== 'placing') return;
    expect(t.state.points).toHaveLength(1);
    expect(onTheLine(t.state.points)).toBe(true);
    t.click([800, 180]).key('Enter').cancel();
    expect(t.doc.horizons).toHaveLength(3);
  });

  it('cancel before finishing was asked still drops the line', () => {
    const { t } = harness();
    t.click([0, 100]).click([300, 130]).cancel();
    expect(t.doc.horizons).toHaveLength(1);
    expect(t.state.name).toBe('idle');
  });

  it('places a straight stretch on Alt-click; Backspace and undo each remove the last stretch, traced or straight', () => {
    const { t, tracer } = harness();
    t.click([0, 100]).click([200, 120]);
    tracer.finishAll();
    // Alt-click: off the line and not snapped, joined by a straight segment.
    t.click([250, 160], { alt: true });
    t.move([300, 160]);
    if (t.state.name !== 'placing') throw new Error('not placing');
    expect(t.state.points.at(-1)).toEqual([250, 160]);
    expect(t.state.stretches.map((s) => s.straight)).toEqual([false, true]);
    t.key('Backspace');
    if (t.state.name !== 'placing') throw new Error('not placing');
    expect(t.state.points).toHaveLength(2);
    t.key('Undo');
    if (t.state.name !== 'placing') throw new Error('not placing');
    expect(t.state.points).toHaveLength(1);
    expect(t.state.stretches).toHaveLength(0);
  });

  it('with following turned off clicks are placed as they are, and Alt then traces', () => {
    const { t, tracer } = harness();
    t.followLine = false;
    t.click([0, 103]).click([100, 99]);
    if (t.state.name !== 'placing') throw new Error('not placing');
    expect(t.state.points).toEqual([[0, 103], [100, 99]]);
    t.click([200, 121], { alt: true });
    tracer.finishAll();
    t.key('Enter');
    const pts = t.doc.horizons[1].pointsPx;
    expect(pts.slice(0, 2)).toEqual([[0, 103], [100, 99]]);
    expect(pts.length).toBeGreaterThan(3);
    expect(onTheLine(pts.slice(2))).toBe(true);
  });
});
