import { describe, expect, it } from 'vitest';
import { commonForceScale, LONGEST_ARROW } from '../../shared/drawing/force-scale';
import { freeBodySvg } from '../../shared/drawing/free-body-svg';
import { all, num, parseSvg, textOf, withAttr, type Node } from './svg-tree';
import { allSpecs, fivePartFrame, proppedBoom, solved, wallJib } from './fixtures';

/** Tail (shaft start) and tip (head's first point) of the arrow inside a force group. */
function arrowOf(g: Node) {
  const line = all(g, (n) => n.tag === 'line')[0];
  const head = all(g, (n) => n.tag === 'polygon')[0];
  if (!line || !head) return null;
  const [tx, ty] = head.attrs.points!.split(' ')[0]!.split(',').map(Number) as [number, number];
  return { tail: { x: num(line, 'x1'), y: num(line, 'y1') }, tip: { x: tx, y: ty } };
}

describe('freeBodySvg', () => {
  it.each(allSpecs.map((s) => [s.slug, s] as const))('%s: every force on every part, to one scale, along its direction', (_slug, spec) => {
    const r = solved(spec);
    const scale = commonForceScale(r);
    const largest = Math.max(...r.freeBodies.flatMap((b) => b.forces.map((f) => f.magnitude)));
    expect(scale * largest).toBeCloseTo(LONGEST_ARROW, 9);
    for (const body of r.freeBodies) {
      const root = parseSvg(freeBodySvg(spec, r, body.part, { unitSystem: 'SI' }));
      expect(root.attrs.role).toBe('img');
      expect(Number(root.attrs['data-force-scale'])).toBe(scale);
      const groups = withAttr(root, 'data-force');
      expect(groups).toHaveLength(body.forces.length);
      body.forces.forEach((f, i) => {
        const g = groups.find((x) => x.attrs['data-force'] === `${f.source}:${f.id}:${i}`);
        expect(g, `${body.part} ${f.id}`).toBeDefined();
        const a = arrowOf(g!);
        // Rounding to 0.01 of a unit at both ends, and a head shorter than 0.6 of a very short arrow.
        if (f.magnitude * scale < 0.05) return;
        expect(a, `${body.part} ${f.id}`).not.toBeNull();
        const dx = a!.tip.x - a!.tail.x;
        const dy = a!.tip.y - a!.tail.y;
        const len = Math.hypot(dx, dy);
        expect(Math.abs(len - f.magnitude * scale), `${body.part} ${f.id}`).toBeLessThan(0.03);
        // On the sheet y points down: a force with fy > 0 points up the page.
        expect(dx / len).toBeCloseTo(f.fx / f.magnitude, 2);
        expect(dy / len).toBeCloseTo(-f.fy / f.magnitude, 2);
      });
    }
  });

  it('uses the same force scale for every part of a mechanism, so arrows compare across views', () => {
    const r = solved(fivePartFrame);
    const scales = new Set(r.freeBodies.map((b) => parseSvg(freeBodySvg(fivePartFrame, r, b.part, { unitSystem: 'SI' })).attrs['data-force-scale']));
    expect(scales.size).toBe(1);
    const lengths = r.freeBodies.flatMap((b) =>
      withAttr(parseSvg(freeBodySvg(fivePartFrame, r, b.part, { unitSystem: 'SI' })), 'data-force').map((g) => {
        const a = arrowOf(g);
        return { magnitude: Number(g.attrs['data-magnitude']), length: a ? Math.hypot(a.tip.x - a.tail.x, a.tip.y - a.tail.y) : 0 };
      }),
    );
    const big = lengths.reduce((m, x) => (x.magnitude > m.magnitude ? x : m));
    for (const x of lengths.filter((l) => l.magnitude * Number([...scales][0]) > 1)) {
      expect(x.length / big.length).toBeCloseTo(x.magnitude / big.magnitude, 3);
    }
  });

  it('labels a member force tension or compression and draws it as a pull or a push', () => {
    const jib = solved(wallJib);
    const tie = withAttr(parseSvg(freeBodySvg(wallJib, jib, 'boom', { unitSystem: 'SI' })), 'data-force').find((g) => g.attrs['data-force']!.startsWith('member:tie'))!;
    expect(textOf(tie)).toMatch(/tension/);
    const B = jib.points.B!;
    const root = parseSvg(freeBodySvg(wallJib, jib, 'boom', { unitSystem: 'SI' }));
    const sheetScale = Number(root.attrs['data-scale']);
    const a = arrowOf(tie)!;
    const cutAtB = withAttr(root, 'data-cut', 'B')[0]!;
    const pin = all(cutAtB, (n) => n.tag === 'circle')[0]!;
    // A pull: the arrow starts at the pin and points away from the part.
    expect(a.tail.x).toBeCloseTo(num(pin, 'cx'), 1);
    expect(a.tail.y).toBeCloseTo(num(pin, 'cy'), 1);
    expect(sheetScale).toBeGreaterThan(0);
    expect(B.x).toBe(4000);

    const prop = solved(proppedBoom);
    const strutRoot = parseSvg(freeBodySvg(proppedBoom, prop, 'boom', { unitSystem: 'SI' }));
    const strut = withAttr(strutRoot, 'data-force').find((g) => g.attrs['data-force']!.startsWith('member:strut'))!;
    expect(textOf(strut)).toMatch(/compression/);
    const push = arrowOf(strut)!;
    const pinE = all(withAttr(strutRoot, 'data-cut', 'E')[0]!, (n) => n.tag === 'circle')[0]!;
    // A push: the arrow ends at the pin.
    expect(push.tip.x).toBeCloseTo(num(pinE, 'cx'), 1);
    expect(push.tip.y).toBeCloseTo(num(pinE, 'cy'), 1);
  });

  it('labels magnitudes in the chosen unit system', () => {
    const r = solved(wallJib);
    const body = r.freeBodies[0]!;
    const root = parseSvg(freeBodySvg(wallJib, r, body.part, { unitSystem: 'US' }));
    const N_PER_LBF = 0.45359237 * 9.80665;
    for (const f of body.forces) {
      const g = withAttr(root, 'data-force').find((x) => x.attrs['data-force']!.startsWith(`${f.source}:${f.id}:`))!;
      const words = textOf(g).replace(/\u202f/g, '');
      const shown = Number(/([\d.]+) lbf/.exec(words)![1]);
      expect(Math.abs(shown - f.magnitude / N_PER_LBF) / (f.magnitude / N_PER_LBF)).toBeLessThan(5e-4);
    }
  });

  it('draws couples as curved arrows with their moment and sense', () => {
    const r = solved(fivePartFrame);
    const root = parseSvg(freeBodySvg(fivePartFrame, r, 'base', { unitSystem: 'SI' }));
    const couples = withAttr(root, 'data-couple');
    expect(couples).toHaveLength(1);
    expect(all(couples[0]!, (n) => n.tag === 'path')[0]!.attrs.d).toMatch(/ A /);
    expect(textOf(couples[0]!).replace(/\u202f/g, '')).toContain('50000 N·mm anticlockwise');
  });

  it('refuses a part the result does not hold', () => {
    expect(() => freeBodySvg(wallJib, solved(wallJib), 'nope', { unitSystem: 'SI' })).toThrow(/nope/);
  });
});
