import { describe, expect, it } from 'vitest';
import { mechanismSvg, mechanismView } from '../../shared/drawing/mechanism-svg';
import { templateSpecSchema } from '../../shared/spec/template-spec';
import { all, num, parseSvg, textOf, withAttr, type Node } from './svg-tree';
import { allSpecs, proppedBoom, solved, toggleSpec, wallJib } from './fixtures';

const MM_PER_IN = 25.4; // exact, 1959 international yard and pound agreement

function pinCentre(root: Node, attr: string, value: string) {
  const g = withAttr(root, attr, value);
  expect(g, `${attr}=${value}`).toHaveLength(1);
  const c = all(g[0]!, (n) => n.tag === 'circle')[0]!;
  return { x: num(c, 'cx'), y: num(c, 'cy') };
}

describe('mechanismSvg', () => {
  it.each(allSpecs.map((s) => [s.slug, s] as const))('%s: a standalone SVG with one shape per part, member, joint and load', (_slug, spec) => {
    const r = solved(spec);
    const root = parseSvg(mechanismSvg(spec, r, { unitSystem: 'SI' }));
    expect(root.tag).toBe('svg');
    expect(root.attrs.xmlns).toBe('http://www.w3.org/2000/svg');
    expect(root.attrs.viewBox).toBe('0 0 640 420');
    expect(root.attrs.role).toBe('img');
    expect(root.children[0]!.tag).toBe('title');
    expect(root.children[1]!.tag).toBe('desc');
    expect(root.attrs['aria-labelledby']).toBe(`${root.children[0]!.attrs.id} ${root.children[1]!.attrs.id}`);
    for (const p of spec.parts) expect(withAttr(root, 'data-part', p.id), p.id).toHaveLength(1);
    for (const m of spec.members ?? []) expect(withAttr(root, 'data-member', m.id), m.id).toHaveLength(1);
    for (const j of spec.joints ?? []) expect(withAttr(root, 'data-joint', j.id), j.id).toHaveLength(1);
    for (const l of spec.loads) expect(withAttr(root, 'data-load', l.id), l.id).toHaveLength(1);
    const groundJoints = (spec.joints ?? []).filter((j) => j.between.includes('ground')).length;
    expect(withAttr(root, 'data-support').length).toBeGreaterThanOrEqual(groundJoints);
  });

  it('draws the wall jib to the scale it reports, with y up', () => {
    const r = solved(wallJib);
    const markup = mechanismSvg(wallJib, r, { unitSystem: 'SI' });
    const root = parseSvg(markup);
    const scale = Number(root.attrs['data-scale']);
    expect(scale).toBe(mechanismView(r).scale);
    const a = pinCentre(root, 'data-joint', 'wall');
    const d = pinCentre(root, 'data-member-end', 'tie:D');
    const b = pinCentre(root, 'data-member-end', 'tie:B');
    // The wall jib's defaults: boom length 4000 mm, tie anchor 1500 mm above the wall pin, tie at the tip.
    expect(Math.hypot(d.x - a.x, d.y - a.y)).toBeCloseTo(1500 * scale, 1);
    expect(Math.hypot(b.x - a.x, b.y - a.y)).toBeCloseTo(4000 * scale, 1);
    expect(Math.hypot(b.x - d.x, b.y - d.y)).toBeCloseTo(Math.hypot(4000, 1500) * scale, 1);
    expect(d.y).toBeLessThan(a.y); // the anchor is above the pin, so higher on the sheet
    expect(d.x).toBeCloseTo(a.x, 2);
    expect(b.x).toBeGreaterThan(a.x);
  });

  it('draws the toggle to scale, the knee above the line of the pins', () => {
    const L = 120;
    const alpha = 25;
    const r = solved(toggleSpec, { L, alpha });
    const root = parseSvg(mechanismSvg(toggleSpec, r, { unitSystem: 'SI', width: 500, height: 500 }));
    const scale = Number(root.attrs['data-scale']);
    const A = pinCentre(root, 'data-joint', 'A');
    const B = pinCentre(root, 'data-joint', 'B');
    const C = pinCentre(root, 'data-joint', 'C');
    const rad = (alpha * Math.PI) / 180;
    expect(Math.hypot(B.x - A.x, B.y - A.y)).toBeCloseTo(L * scale, 1);
    expect(Math.hypot(C.x - B.x, C.y - B.y)).toBeCloseTo(L * scale, 1);
    expect(Math.hypot(C.x - A.x, C.y - A.y)).toBeCloseTo(2 * L * Math.cos(rad) * scale, 1);
    expect(A.y - B.y).toBeCloseTo(L * Math.sin(rad) * scale, 1);
    expect(withAttr(root, 'data-support', 'C')[0]!.attrs['data-support-kind']).toBe('roller');
    expect(withAttr(root, 'data-load', 'P')[0]!.attrs['data-solved']).toBe('true');
    expect(withAttr(root, 'data-load', 'Q')[0]!.attrs['data-solved']).toBeUndefined();
  });

  it('keeps the drawing inside its sheet', () => {
    for (const spec of allSpecs) {
      const r = solved(spec);
      const root = parseSvg(mechanismSvg(spec, r, { unitSystem: 'SI' }));
      // Pins are placed in sheet coordinates (support symbols are drawn in a local frame and turned).
      const pins = [...withAttr(root, 'data-joint'), ...withAttr(root, 'data-member-end')].map((g) => all(g, (n) => n.tag === 'circle')[0]!);
      expect(pins.length).toBeGreaterThan(0);
      for (const c of pins) {
        expect(num(c, 'cx'), spec.slug).toBeGreaterThanOrEqual(0);
        expect(num(c, 'cx'), spec.slug).toBeLessThanOrEqual(640);
        expect(num(c, 'cy'), spec.slug).toBeGreaterThanOrEqual(0);
        expect(num(c, 'cy'), spec.slug).toBeLessThanOrEqual(420);
      }
    }
  });

  it('marks tension and compression with a letter, not with colour alone', () => {
    const tie = withAttr(parseSvg(mechanismSvg(wallJib, solved(wallJib), { unitSystem: 'SI' })), 'data-member', 'tie')[0]!;
    expect(tie.attrs['data-state']).toBe('tension');
    expect(all(tie, (n) => n.tag === 'text').map(textOf)).toEqual(['T']);
    const strut = withAttr(parseSvg(mechanismSvg(proppedBoom, solved(proppedBoom), { unitSystem: 'SI' })), 'data-member', 'strut')[0]!;
    expect(strut.attrs['data-state']).toBe('compression');
    expect(all(strut, (n) => n.tag === 'text').map(textOf)).toEqual(['C']);
    expect(textOf(all(strut, (n) => n.tag === 'title')[0]!)).toMatch(/compression/);
  });

  it('dimensions the inputs with their values and units, and highlights the one being varied', () => {
    const r = solved(wallJib, { L: 3500, h: 2000 });
    const si = parseSvg(mechanismSvg(wallJib, r, { unitSystem: 'SI', highlightInput: 'h' }));
    const dims = withAttr(si, 'data-dimension');
    expect(dims.map((d) => d.attrs['data-dimension']).sort()).toEqual(['L', 'h']);
    const value = (root: Node, key: string) => textOf(all(withAttr(root, 'data-dimension', key)[0]!, (n) => n.tag === 'text')[0]!);
    expect(value(si, 'L')).toBe('3500 mm');
    expect(value(si, 'h')).toBe('2000 mm');
    expect(withAttr(si, 'data-highlighted', 'true').map((d) => d.attrs['data-dimension'])).toEqual(['h']);
    const hText = all(withAttr(si, 'data-dimension', 'h')[0]!, (n) => n.tag === 'text')[0]!;
    const lText = all(withAttr(si, 'data-dimension', 'L')[0]!, (n) => n.tag === 'text')[0]!;
    expect(Number(hText.attrs['font-weight'])).toBeGreaterThan(Number(lText.attrs['font-weight']));

    const us = parseSvg(mechanismSvg(wallJib, r, { unitSystem: 'US' }));
    expect(value(us, 'L')).toBe(`${Number((3500 / MM_PER_IN).toPrecision(4))} in`);
    expect(withAttr(us, 'data-highlighted')).toHaveLength(0);
  });

  it('labels loads with converted values in US customary units', () => {
    const r = solved(wallJib);
    const trolley = r.loads.find((l) => l.id === 'W')!;
    const lbf = trolley.magnitude / (0.45359237 * 9.80665); // 1 lbf = 0.45359237 kg × standard gravity, exact
    const root = parseSvg(mechanismSvg(wallJib, r, { unitSystem: 'US' }));
    const words = textOf(withAttr(root, 'data-load', 'W')[0]!);
    expect(lbf).toBeGreaterThan(1000);
    // Four significant figures; a thin space groups thousands only from five digits up.
    const whole = String(Math.round(Number(lbf.toPrecision(4))));
    const grouped = whole.length >= 5 ? whole.replace(/\B(?=(\d{3})+(?!\d))/g, '\u202f') : whole;
    expect(words).toContain(`${grouped} lbf`);
    expect(words).not.toMatch(/\bN\b/);
    expect(withAttr(root, 'data-scale-bar')[0]!.attrs['data-scale-bar']).toMatch(/^\d+ in$/);
  });

  it('escapes every word it writes', () => {
    const hostile = templateSpecSchema.parse({
      ...wallJib,
      title: 'Jib <&> "quoted" \'single\'',
      parts: [{ id: 'boom', label: 'Boom <b>&amp;</b>', outline: ['A', 'E'] }],
      loads: (wallJib.loads as { id: string }[]).map((l) => (l.id === 'W' ? { ...l, label: '<script>alert(1)</script> & load' } : l)),
    });
    const r = solved(hostile);
    const markup = mechanismSvg(hostile, r, { unitSystem: 'SI' });
    expect(markup).not.toContain('<script');
    expect(markup).not.toContain('<b>');
    const root = parseSvg(markup);
    expect(textOf(root.children[0]!)).toBe('Jib <&> "quoted" \'single\': mechanism drawn to scale');
    expect(textOf(all(withAttr(root, 'data-part', 'boom')[0]!, (n) => n.tag === 'title')[0]!)).toBe('Boom <b>&amp;</b>');
    expect(textOf(withAttr(root, 'data-load', 'W')[0]!)).toContain('<script>alert(1)</script> & load');
    expect(textOf(root.children[1]!)).toContain('<script>alert(1)</script> & load');
  });

  it('is a pure function: the same solve gives the same markup, another solve another drawing', () => {
    const a = mechanismSvg(wallJib, solved(wallJib), { unitSystem: 'SI' });
    expect(mechanismSvg(wallJib, solved(wallJib), { unitSystem: 'SI' })).toBe(a);
    expect(mechanismSvg(wallJib, solved(wallJib, { h: 2500 }), { unitSystem: 'SI' })).not.toBe(a);
  });
});
