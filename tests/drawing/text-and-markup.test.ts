import { describe, expect, it } from 'vitest';
import { forcesTextAlternative } from '../../shared/drawing/forces-text';
import { freeBodySvg } from '../../shared/drawing/free-body-svg';
import { mechanismSvg } from '../../shared/drawing/mechanism-svg';
import { el, escapeXml } from '../../shared/drawing/svg-markup';
import { thumbnailSvg } from '../../shared/drawing/thumbnail';
import { all, parseSvg, textOf, withAttr } from './svg-tree';
import { allSpecs, proppedBoom, solved, toggleSpec, wallJib } from './fixtures';

describe('forcesTextAlternative', () => {
  it.each(allSpecs.map((s) => [s.slug, s] as const))('%s: names every joint, member and load with its force', (_slug, spec) => {
    const r = solved(spec);
    const t = forcesTextAlternative(spec, r, 'SI');
    expect(t.lines[0]).toBe(t.summary);
    const section = (h: RegExp) => t.sections.find((s) => h.test(s.heading))?.items ?? [];
    const loads = section(/^Loads/);
    const joints = section(/^Joints/);
    const members = section(/^Two-force members/);
    expect(loads).toHaveLength(r.loads.length);
    expect(joints).toHaveLength(r.joints.length);
    expect(members).toHaveLength(r.members.length);
    r.loads.forEach((l, i) => expect(loads[i]).toContain(l.label));
    r.joints.forEach((j, i) => {
      expect(joints[i]).toContain(j.label);
      expect(joints[i]).toContain(` at point ${j.at} `);
    });
    r.members.forEach((m, i) => {
      expect(members[i]).toContain(m.label);
      expect(members[i]).toContain(m.state);
    });
    for (const b of r.freeBodies) expect(t.sections.some((s) => s.heading === `Free body of ${b.label}`)).toBe(true);
    for (const s of t.sections) for (const item of s.items) expect(t.lines).toContain(`– ${item}`);
  });

  it('says tension and compression in words, and converts to US units', () => {
    const jib = forcesTextAlternative(wallJib, solved(wallJib), 'US');
    expect(jib.lines.join('\n')).toMatch(/Tie rod: between points B and D, [\d\u202f.]+ lbf tension\./);
    expect(jib.lines.join('\n')).not.toMatch(/\d N\b/);
    const strut = forcesTextAlternative(proppedBoom, solved(proppedBoom), 'SI');
    // Moments about the wall pin: strut E–D at 1000 × 600 mm; its vertical part carries the 1000 N tip load,
    // so the axial force is 1000 / sin(atan(600/1000)) = 1000 × √(1000² + 600²) / 600 = 1944 N.
    const expected = (1000 * Math.hypot(1000, 600)) / 600;
    expect(strut.lines.join('\n')).toContain(`Strut: between points E and D, ${Math.round(expected)} N compression.`);
  });

  it('marks solved loads and states the direction in words', () => {
    const t = forcesTextAlternative(toggleSpec, solved(toggleSpec), 'SI');
    const loads = t.sections.find((s) => s.heading === 'Loads')!.items;
    expect(loads.find((l) => l.startsWith('Clamping force'))).toMatch(/pointing left .*\(solved\)/);
    expect(loads.find((l) => l.startsWith('Knee force'))).toMatch(/150 N pointing down .*\(given\)/);
  });
});

describe('thumbnailSvg', () => {
  it.each(allSpecs.map((s) => [s.slug, s] as const))('%s: a small card sketch with shapes and no words', (_slug, spec) => {
    const root = parseSvg(thumbnailSvg(spec, solved(spec)));
    expect(root.attrs.viewBox).toBe('0 0 240 160');
    expect(root.attrs.role).toBe('img');
    expect(all(root, (n) => n.tag === 'text')).toHaveLength(0);
    expect(textOf(root.children[0]!)).toContain(spec.title);
    for (const p of spec.parts) expect(withAttr(root, 'data-part', p.id)).toHaveLength(1);
    for (const m of spec.members ?? []) expect(withAttr(root, 'data-member', m.id)).toHaveLength(1);
  });
});

describe('markup rules', () => {
  const drawings = allSpecs.flatMap((spec) => {
    const r = solved(spec);
    return (['SI', 'US'] as const).flatMap((unitSystem) => [
      [`${spec.slug} mechanism ${unitSystem}`, mechanismSvg(spec, r, { unitSystem, highlightInput: spec.inputs[0]!.key })],
      [`${spec.slug} thumbnail`, thumbnailSvg(spec, r)],
      ...r.freeBodies.map((b) => [`${spec.slug} free body ${b.part} ${unitSystem}`, freeBodySvg(spec, r, b.part, { unitSystem })]),
    ]);
  });

  it.each(drawings)('%s: no styles, scripts or outside references', (_name, svg) => {
    expect(svg).not.toMatch(/\sstyle\s*=/i);
    expect(svg).not.toMatch(/<style/i);
    expect(svg).not.toMatch(/<script/i);
    expect(svg).not.toMatch(/href|url\(|<image|<foreignObject/i);
    expect(svg).not.toMatch(/\son[a-z]+\s*=/i);
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    const root = parseSvg(svg);
    for (const t of all(root, (n) => n.tag === 'text')) expect(t.attrs['font-family']).toBe('Manrope, sans-serif');
  });

  it('refuses to write a style or an event attribute at all', () => {
    expect(() => el('rect', { style: 'fill:red' })).toThrow(/style/);
    expect(() => el('rect', { onclick: 'x()' })).toThrow(/onclick/);
    expect(escapeXml(`a<b>&"c"'d'\u0001`)).toBe('a&lt;b&gt;&amp;&quot;c&quot;&apos;d&apos;');
  });
});
